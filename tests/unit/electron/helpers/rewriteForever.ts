// Child process for the crash test: rewrites the target with versions A and B, alternately,
// until it is killed. Arguments: target path, bytes per version.
import { atomicWrite } from '../../../../electron/atomicWrite.ts';

const [target, size] = process.argv.slice(2);
const versions = ['A', 'B'].map((c) => c.repeat(Number(size)));
process.stdout.write('ready\n');
for (let i = 0; ; i++) await atomicWrite(target!, versions[i % 2]!);
