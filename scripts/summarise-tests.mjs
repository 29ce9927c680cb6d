// Adds up Vitest's JSON reports into the one closing line CI reads: "N passed, N failed, N skipped".
// A file that failed without a failing test (an import error, a failing hook) counts as one failure.
import { existsSync, readFileSync } from 'node:fs';

let passed = 0;
let failed = 0;
let skipped = 0;
for (const file of process.argv.slice(2)) {
  if (!existsSync(file)) {
    console.log(`(no report at ${file}: that suite did not run)`);
    failed += 1;
    continue;
  }
  const report = JSON.parse(readFileSync(file, 'utf8'));
  passed += report.numPassedTests ?? 0;
  failed += report.numFailedTests ?? 0;
  skipped += (report.numPendingTests ?? 0) + (report.numTodoTests ?? 0);
  for (const suite of report.testResults ?? []) {
    const failingTests = (suite.assertionResults ?? []).filter((test) => test.status === 'failed').length;
    if (suite.status === 'failed' && failingTests === 0) failed += 1;
  }
}
console.log(`${passed} passed, ${failed} failed, ${skipped} skipped`);
