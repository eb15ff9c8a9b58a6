// `npm run audit:deps`: the registry's audit of production dependencies. Exits 1 when it finds a
// high or critical advisory, 0 when clean, and 2 — saying so plainly — when the audit service
// cannot be reached (as from machines whose registry mirror answers only package downloads).
// The test command never calls it, so tests never depend on reaching the service.
import { spawnSync } from "node:child_process";

const run = spawnSync("npm", ["audit", "--omit=dev", "--json"], { encoding: "utf8", timeout: 120_000 });
let report;
try {
  report = JSON.parse(run.stdout || "{}");
} catch {
  report = {};
}

const counts = report.metadata?.vulnerabilities;
if (!counts) {
  const reason = report.message || report.error?.summary || run.stderr?.split("\n").find(Boolean) || run.error?.message || "no answer";
  console.log(`audit:deps: the audit service could not be reached (${reason.trim()}); production dependencies were NOT audited.`);
  process.exit(2);
}

const summary = ["critical", "high", "moderate", "low", "info"].map((level) => `${counts[level] ?? 0} ${level}`).join(", ");
console.log(`audit:deps: production dependencies — ${summary}`);
for (const [name, v] of Object.entries(report.vulnerabilities ?? {})) {
  if (v.severity === "high" || v.severity === "critical") console.log(`  ${v.severity}: ${name} ${v.range ?? ""}`);
}
process.exit((counts.high ?? 0) + (counts.critical ?? 0) > 0 ? 1 : 0);
