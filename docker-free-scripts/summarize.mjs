// Adds up the type check, vitest and Playwright results into one closing line: "N passed, N failed".
import { existsSync, readFileSync } from "node:fs";
import { join } from "node:path";

const dir = process.argv[2];
const read = (name) => (existsSync(join(dir, name)) ? readFileSync(join(dir, name), "utf8") : null);
const rc = (name) => Number.parseInt(read(`${name}.rc`) ?? "1", 10);

let passed = 0;
let failed = 0;
let skipped = 0;
const problems = [];

if (rc("typecheck") === 0) passed += 1;
else (failed += 1), problems.push("type check failed");

const vitest = read("vitest.json");
if (vitest) {
  const v = JSON.parse(vitest);
  passed += v.numPassedTests;
  failed += v.numFailedTests;
  skipped += v.numPendingTests + (v.numTodoTests ?? 0);
  // A suite that fails to load counts as a failure even when it holds no test.
  const broken = v.testResults.filter((r) => r.status === "failed" && r.assertionResults.length === 0);
  failed += broken.length;
  if (broken.length) problems.push(`${broken.length} test file(s) failed to load`);
} else (failed += 1), problems.push("vitest wrote no report");
if (rc("vitest") !== 0 && !problems.length && failed === 0) (failed += 1), problems.push("vitest exited non-zero");

const pw = read("playwright.json");
if (pw) {
  const s = JSON.parse(pw).stats;
  passed += s.expected + s.flaky;
  failed += s.unexpected;
  skipped += s.skipped;
  if ((JSON.parse(pw).errors ?? []).length) (failed += 1), problems.push("Playwright reported errors outside tests");
} else (failed += 1), problems.push("Playwright wrote no report");
if (rc("playwright") !== 0 && failed === 0) (failed += 1), problems.push("Playwright exited non-zero");

for (const p of problems) console.log(`problem: ${p}`);
console.log(`${passed} passed, ${failed} failed${skipped ? `, ${skipped} skipped` : ""}`);
process.exit(failed === 0 && passed > 0 ? 0 : 1);
