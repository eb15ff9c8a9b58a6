import type { SizingResult } from "@/lib/hydraulics/types";
import type { UnitSystem } from "@/lib/units";
import { LevelIcon } from "./check-list";
import { forceInThree } from "./format";

const WORD = { ok: "all checks ok", warn: "warnings", incomplete: "incomplete", fail: "a check fails" } as const;

/**
 * On phones the results sit below a long form; this bar sticks to the bottom of the screen while
 * the form scrolls, so the force and the worst check stay in sight as you type.
 */
export function PhoneSummary({ result, system, stale }: { result: SizingResult; system: UnitSystem; stale: boolean }) {
  const [main] = forceInThree(result.forceKn, system);
  const tone = { ok: "text-ok-soft", warn: "text-warn-soft", incomplete: "text-steel-200", fail: "text-fail-soft" }[result.overall];
  return (
    <a
      href="#results"
      className={`no-print sticky bottom-0 z-10 mt-4 flex min-h-12 items-center justify-between gap-3 rounded-t-lg bg-steel-900 px-4 py-2 text-white shadow-lg lg:hidden ${stale ? "opacity-70" : ""}`}
    >
      <span className="font-mono text-lg font-semibold">{main?.text}</span>
      <span className={`inline-flex items-center gap-1 text-sm font-semibold ${tone}`}>
        <LevelIcon level={result.overall} />
        {stale ? "fix the marked inputs" : WORD[result.overall]}
      </span>
      <span className="text-sm underline">Results</span>
    </a>
  );
}
