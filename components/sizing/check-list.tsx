import type { Check, CheckLevel, MissingCheck, OverallLevel } from "@/lib/hydraulics/types";

const LEVELS: Record<CheckLevel, { label: string; box: string; badge: string }> = {
  fail: { label: "Fail", box: "bg-fail-soft ring-fail/30", badge: "bg-fail text-white" },
  warn: { label: "Warning", box: "bg-warn-soft ring-warn/30", badge: "bg-warn text-white" },
  ok: { label: "OK", box: "bg-white ring-steel-200", badge: "bg-ok text-white" },
};

const ORDER: Record<CheckLevel, number> = { fail: 0, warn: 1, ok: 2 };

/** Shape and word carry the level too, so colour is never the only signal. */
export function LevelIcon({ level }: { level: OverallLevel }) {
  const common = { viewBox: "0 0 16 16", className: "h-4 w-4 shrink-0", "aria-hidden": true, fill: "none", stroke: "currentColor", strokeWidth: 2 } as const;
  if (level === "incomplete") {
    // A dashed circle with a question mark: "not known yet", distinct from the warning triangle.
    return (
      <svg {...common}>
        <circle cx="8" cy="8" r="6.5" strokeDasharray="2.5 2" />
        <path d="M6.2 6.3a1.9 1.9 0 1 1 2.6 1.8c-.5.2-.8.6-.8 1.1v.4M8 11.6v.4" strokeLinecap="round" />
      </svg>
    );
  }
  if (level === "ok") {
    return (
      <svg {...common}>
        <path d="M3 8.5l3 3 7-7" strokeLinecap="round" strokeLinejoin="round" />
      </svg>
    );
  }
  if (level === "warn") {
    return (
      <svg {...common}>
        <path d="M8 2L15 14H1z" strokeLinejoin="round" />
        <path d="M8 6.5v3.5M8 12v.5" strokeLinecap="round" />
      </svg>
    );
  }
  return (
    <svg {...common}>
      <path d="M4 4l8 8M12 4l-8 8" strokeLinecap="round" />
    </svg>
  );
}

export function CheckCard({ check }: { check: Check }) {
  const style = LEVELS[check.level];
  return (
    <li className={`rounded-lg p-3 ring-1 ${style.box}`} data-level={check.level} data-check-id={check.id}>
      <div className="flex items-start gap-2">
        <span className={`mt-0.5 inline-flex shrink-0 items-center gap-1 rounded px-1.5 py-0.5 text-xs font-bold uppercase ${style.badge}`}>
          <LevelIcon level={check.level} />
          {style.label}
        </span>
        <p className="min-w-0 text-sm text-ink">{check.message}</p>
      </div>
      <dl className="mt-2 grid gap-1 text-xs text-steel-600 sm:grid-cols-[auto_1fr] sm:gap-x-2">
        <dt className="font-semibold">Rule</dt>
        <dd>{check.rule}</dd>
        <dt className="font-semibold">Source</dt>
        <dd className="break-words">{check.source}</dd>
      </dl>
    </li>
  );
}

/**
 * Failures and warnings in full; the passing checks folded below them (still with rule and
 * source) so a long list of "ok" never hides the one that matters.
 */
export function CheckList({ checks }: { checks: readonly Check[] }) {
  const sorted = [...checks].sort((a, b) => ORDER[a.level] - ORDER[b.level]);
  const problems = sorted.filter((c) => c.level !== "ok");
  const passing = sorted.filter((c) => c.level === "ok");
  const count = (level: CheckLevel): number => checks.filter((c) => c.level === level).length;
  return (
    <div>
      <p className="mb-3 flex flex-wrap gap-2 text-sm" aria-label="Check summary">
        {(["fail", "warn", "ok"] as const).map((level) => (
          <span
            key={level}
            className={`inline-flex items-center gap-1 rounded px-2 py-0.5 font-semibold ${count(level) ? LEVELS[level].badge : "bg-steel-100 text-steel-600"}`}
          >
            <LevelIcon level={level} />
            {count(level)} {LEVELS[level].label.toLowerCase()}
          </span>
        ))}
      </p>
      {problems.length ? (
        <ul className="flex flex-col gap-2">
          {problems.map((check) => (
            <CheckCard key={check.id} check={check} />
          ))}
        </ul>
      ) : (
        <p className="text-sm text-ok">Every check that ran passes for these inputs.</p>
      )}
      {passing.length ? (
        <details className="group mt-3">
          <summary className="flex min-h-11 cursor-pointer items-center text-sm font-semibold text-oil-700 underline">
            <span className="group-open:hidden">Show the {passing.length} passing checks, with their rules and sources</span>
            <span className="hidden group-open:inline">Hide the passing checks</span>
          </summary>
          <ul className="mt-2 flex flex-col gap-2">
            {passing.map((check) => (
              <CheckCard key={check.id} check={check} />
            ))}
          </ul>
        </details>
      ) : null}
    </div>
  );
}

const VERDICT: Record<OverallLevel, { word: string; box: string }> = {
  ok: { word: "OK — every safety check ran and passes", box: "bg-ok-soft text-ok ring-ok/30" },
  warn: { word: "Warnings — every safety check ran; read the warnings", box: "bg-warn-soft text-warn ring-warn/30" },
  incomplete: { word: "Incomplete — not every safety check has run", box: "bg-steel-100 text-steel-800 ring-steel-400 border-dashed" },
  fail: { word: "Fail — a check fails", box: "bg-fail-soft text-fail ring-fail/30" },
};

/**
 * The design's verdict in words and an icon, with what is still missing: a design is never called
 * ok while a check that makes a press safe has not run.
 */
export function OverallVerdict({ overall, missing }: { overall: OverallLevel; missing: readonly MissingCheck[] }) {
  const v = VERDICT[overall];
  return (
    <div className={`mb-3 rounded-lg p-3 ring-1 ${v.box}`} data-overall={overall} data-testid="overall-verdict">
      <p className="flex items-center gap-2 text-sm font-bold">
        <LevelIcon level={overall} />
        {v.word}
      </p>
      {missing.length > 0 ? (
        <div className="mt-2 text-sm text-ink">
          <p>Not checked yet — fill these in to complete the design:</p>
          <ul className="mt-1 list-disc pl-5" data-testid="missing-checks">
            {missing.map((m) => (
              <li key={m.id} data-missing-id={m.id}>
                {m.label}
              </li>
            ))}
          </ul>
        </div>
      ) : null}
    </div>
  );
}
