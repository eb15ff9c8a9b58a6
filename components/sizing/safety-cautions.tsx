/** The usual cautions (product brief, Safety), shown wherever a sizing result could be trusted blindly. */
export const SAFETY_CAUTIONS: readonly string[] = [
  "Pressurised oil can inject through skin — a surgical emergency. Never search for a leak with a hand; use cardboard.",
  "Relieve stored pressure, lower or block the ram and lock out before any service.",
  "Never set the relief valve above the lowest-rated component in the circuit.",
  "Frame and plate results are estimates from simple beam formulas, not a stress analysis.",
  "A home-built press is not certified: defer to local codes, the component makers' ratings and a licensed engineer.",
];

export function SafetyCautions({ compact = false }: { compact?: boolean }) {
  return (
    <aside aria-labelledby="safety-heading" className="rounded-lg bg-warn-soft p-4 ring-1 ring-warn/30">
      <h2 id="safety-heading" className="flex items-center gap-2 text-sm font-bold uppercase tracking-wide text-warn">
        <svg viewBox="0 0 16 16" className="h-4 w-4" aria-hidden="true" fill="none" stroke="currentColor" strokeWidth="2">
          <path d="M8 2L15 14H1z" strokeLinejoin="round" />
          <path d="M8 6.5v3.5M8 12v.5" strokeLinecap="round" />
        </svg>
        Before you trust these numbers
      </h2>
      <ul className={`mt-2 list-disc space-y-1 pl-5 text-ink ${compact ? "text-xs" : "text-sm"}`}>
        {SAFETY_CAUTIONS.map((caution) => (
          <li key={caution}>{caution}</li>
        ))}
      </ul>
    </aside>
  );
}
