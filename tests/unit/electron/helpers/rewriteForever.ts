// Child process for the crash tests: rewrites the target with versions A and B, alternately,
// until it is killed. Arguments: target path, bytes per version, and "backup" to save the
// way documents are saved (keeping the previous version) instead of a plain atomic write.
import { atomicWrite } from '../../../../core/io/atomicWrite.node.ts';
import { saveWithBackup } from '../../../../electron/saveWithBackup.ts';

const [target, size, mode] = process.argv.slice(2);
const versions = ['A', 'B'].map((c) => c.repeat(Number(size)));
const write = mode === 'backup' ? saveWithBackup : atomicWrite;
process.stdout.write('ready\n');
for (let i = 0; ; i++) await write(target!, versions[i % 2]!);
