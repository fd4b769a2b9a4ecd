// Sums the Vitest and Playwright JSON reports into one plain "N passed, N failed" line.
// A report that is missing counts as a failure: the runner did not finish.
import { existsSync, readFileSync } from 'node:fs';

let passed = 0, failed = 0, skipped = 0, missing = 0;
for (const file of process.argv.slice(2)) {
  if (!existsSync(file)) { console.log(`(no report at ${file})`); missing++; continue; }
  const report = JSON.parse(readFileSync(file, 'utf8'));
  if ('numPassedTests' in report) {
    passed += report.numPassedTests;
    failed += report.numFailedTests;
    skipped += (report.numPendingTests ?? 0) + (report.numTodoTests ?? 0);
  } else if (report.stats) {
    passed += report.stats.expected + (report.stats.flaky ?? 0);
    failed += report.stats.unexpected;
    skipped += report.stats.skipped ?? 0;
  }
}
console.log(`${passed} passed, ${failed} failed, ${skipped} skipped`);
process.exit(failed > 0 || missing > 0 || passed === 0 ? 1 : 0);
