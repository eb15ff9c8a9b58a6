/**
 * Which safety checks have not run. A design is "ok" only when every check that makes a press safe
 * has run: the ratings of hose, valve, pump and cylinder against the relief; the frame — a closed
 * frame's crosshead, bolster and columns, or an open frame's throat; the platen when several rams
 * push one plate; and rod buckling. Line sizes, reservoir, motor and gauge are useful but not on
 * this list: getting them wrong wastes money or oil, not fingers.
 */
import type { MissingCheck, SizingInput } from "./types";

const RATINGS = [
  { key: "hoseBar", id: "rating-hose", label: "Hose assembly rating" },
  { key: "valveBar", id: "rating-valve", label: "Directional valve rating" },
  { key: "pumpBar", id: "rating-pump", label: "Pump rating" },
  { key: "cylinderBar", id: "rating-cylinder", label: "Cylinder rating" },
] as const;

export function missingChecks(input: SizingInput, plateRoles: ReadonlySet<string>): MissingCheck[] {
  const missing: MissingCheck[] = [];
  for (const r of RATINGS) if (input.ratings?.[r.key] === undefined) missing.push({ id: r.id, label: r.label });
  if (!input.throat) {
    if (!plateRoles.has("crosshead")) missing.push({ id: "plate-crosshead", label: "Crosshead (or, for an open frame, the throat)" });
    if (!plateRoles.has("bolster")) missing.push({ id: "plate-bolster", label: "Bolster (or, for an open frame, the throat)" });
    if (!input.columns) missing.push({ id: "columns", label: "Side columns or tie rods (or, for an open frame, the throat)" });
  }
  if (input.cylinders.count > 1 && !input.platen) missing.push({ id: "platen", label: "Platen between the rams" });
  if (!input.buckling) missing.push({ id: "rod-buckling", label: "Rod buckling" });
  return missing;
}
