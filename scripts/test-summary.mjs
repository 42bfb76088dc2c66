// Adds up the JSON reports of every suite into one closing line: "tests: N passed, N failed".
import { existsSync, readFileSync } from "node:fs";
import path from "node:path";

const [dir, failedSuites] = process.argv.slice(2);
let passed = 0;
let failed = 0;
let skipped = 0;
for (const name of ["unit", "integration"]) {
  const file = path.join(dir, `${name}.json`);
  if (!existsSync(file)) continue;
  const r = JSON.parse(readFileSync(file, "utf8"));
  passed += r.numPassedTests;
  failed += r.numFailedTests;
  skipped += r.numPendingTests + (r.numTodoTests ?? 0);
}
const browser = path.join(dir, "browser.json");
if (existsSync(browser)) {
  const { stats } = JSON.parse(readFileSync(browser, "utf8"));
  passed += stats.expected + stats.flaky;
  failed += stats.unexpected;
  skipped += stats.skipped;
}
// A suite that crashed before reporting counts as a failure even if no test reported one.
if (Number(failedSuites) > 0 && failed === 0) failed = Number(failedSuites);
console.log(`tests: ${passed} passed, ${failed} failed${skipped ? `, ${skipped} skipped` : ""}`);
