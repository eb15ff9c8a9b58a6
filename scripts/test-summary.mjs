// Prints one closing line over every vitest project's JSON report: "N passed, N failed".
import { existsSync, readFileSync, readdirSync } from "node:fs";

const [dir, failedChecks = "0"] = process.argv.slice(2);
let passed = 0;
let failed = 0;
let skipped = 0;
for (const file of existsSync(dir) ? readdirSync(dir).filter((f) => f.endsWith(".json")) : []) {
  const report = JSON.parse(readFileSync(`${dir}/${file}`, "utf8"));
  passed += report.numPassedTests ?? 0;
  failed += report.numFailedTests ?? 0;
  skipped += (report.numPendingTests ?? 0) + (report.numTodoTests ?? 0);
  if (report.success === false && (report.numFailedTests ?? 0) === 0) failed += 1; // a file that failed to load
}
// A check that failed outside vitest (typecheck, lint, build) counts as one failure.
const outside = Math.max(0, Number(failedChecks) - (failed > 0 ? 1 : 0));
console.log(`\n${passed} passed, ${failed + outside} failed${skipped ? `, ${skipped} skipped` : ""}`);
