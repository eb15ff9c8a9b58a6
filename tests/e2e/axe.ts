// axe-core in the browser tests: every rule axe ships (WCAG 2.x A/AA and best practice), run on
// the page as a user sees it at a phone's and a desk's width. Serious and critical findings fail
// the test; moderate and minor ones are counted in the summary each file prints.
import { readFileSync } from "node:fs";
import { createRequire } from "node:module";
import type { AxeResults, ImpactValue } from "axe-core";
import type { Page } from "playwright-core";

// Evaluated rather than added as a <script>: the page's CSP would refuse an unknown script.
const AXE_SOURCE = readFileSync(createRequire(import.meta.url).resolve("axe-core/axe.min.js"), "utf8");

/** A phone (iPhone 12–15 class) and a laptop. */
export const WIDTHS = [390, 1280] as const;
const HEIGHT: Record<(typeof WIDTHS)[number], number> = { 390: 844, 1280: 800 };

export type Finding = { where: string; rule: string; impact: ImpactValue; help: string; targets: string[] };

const FAILING: ImpactValue[] = ["serious", "critical"];
export const isFailing = (f: Finding): boolean => FAILING.includes(f.impact);

/** Runs axe on the page as it is now. `where` names the page and state in messages. */
export async function axeFindings(page: Page, where: string): Promise<Finding[]> {
  await page.waitForLoadState("networkidle");
  if (!(await page.evaluate(() => "axe" in window))) await page.evaluate(AXE_SOURCE);
  const violations = await page.evaluate(async () => {
    const { axe } = window as unknown as { axe: { run: (context: Document, options: object) => Promise<AxeResults> } };
    const results = await axe.run(document, { resultTypes: ["violations"] });
    return results.violations.map((v) => ({ rule: v.id, impact: v.impact ?? "minor", help: v.help, targets: v.nodes.map((n) => n.target.join(" ")) }));
  });
  return violations.map((v) => ({ where, ...v }));
}

/**
 * Loads `url` (or re-runs `prepare`, which must leave the page in the state to check) at each width,
 * runs axe after `prepare`, and returns every finding. The page is reloaded per width so layout that
 * depends on the width at load is the phone's or the desk's.
 */
export async function axeAtEachWidth(page: Page, where: string, prepare: (page: Page) => Promise<void>): Promise<Finding[]> {
  const found: Finding[] = [];
  for (const width of WIDTHS) {
    await page.setViewportSize({ width, height: HEIGHT[width] });
    await prepare(page);
    found.push(...(await axeFindings(page, `${where} @${width}px`)));
  }
  return found;
}

/** Opens every disclosure in the page's content (panels, "more" sections), not the header's menus. */
export async function openDisclosures(page: Page): Promise<void> {
  await page.evaluate(() => document.querySelectorAll("main details:not([open])").forEach((d) => ((d as HTMLDetailsElement).open = true)));
}

/** "where: rule (impact) — help — targets", one line a finding, for failure messages. */
export function describeFindings(findings: Finding[]): string[] {
  return findings.map((f) => `${f.where}: ${f.rule} (${f.impact}) — ${f.help} — ${f.targets.slice(0, 4).join(", ")}${f.targets.length > 4 ? ` (+${f.targets.length - 4})` : ""}`);
}

/** Counts per rule and impact: checks × affected elements, for the log and the report. */
export function summarize(findings: Finding[]): string {
  const rows = new Map<string, { checks: number; nodes: number }>();
  for (const f of findings) {
    const key = `${f.rule} (${f.impact})`;
    const row = rows.get(key) ?? { checks: 0, nodes: 0 };
    rows.set(key, { checks: row.checks + 1, nodes: row.nodes + f.targets.length });
  }
  if (rows.size === 0) return "no violations";
  return [...rows].sort(([a], [b]) => a.localeCompare(b)).map(([key, { checks, nodes }]) => `${key}: ${checks} page states, ${nodes} elements`).join("\n");
}
