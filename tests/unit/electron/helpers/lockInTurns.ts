// Child process for the lock test: saves the target `count` times through saveWithBackup,
// logging "<name> in" / "<name> out" around a slow critical section held with withFileLock.
// Arguments: target path, name, count, log path.
import { appendFileSync } from 'node:fs';
import { setTimeout as sleep } from 'node:timers/promises';
import { withFileLock } from '../../../../core/io/withFileLock.node.ts';
import { saveWithBackup } from '../../../../electron/saveWithBackup.ts';

const [target, name, count, log] = process.argv.slice(2);
for (let i = 0; i < Number(count); i++) {
  await withFileLock(`${target}.section`, async () => {
    appendFileSync(log!, `${name} in\n`);
    await sleep(3);
    appendFileSync(log!, `${name} out\n`);
  });
  await saveWithBackup(target!, `${name}-${i}`);
}
