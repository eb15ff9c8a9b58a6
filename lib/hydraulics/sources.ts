/**
 * Where each rule comes from, keyed as in shared/design/hydraulics-reference.md. Checks carry the
 * text so a builder can look the rule up; a rule with no published source says "common practice".
 */
export const SOURCES = {
  ETB: "engineeringtoolbox.com, hydraulic power",
  PEN: "peninsularcylinders.com, common hydraulic formulas",
  HO: "hydraulicsonline.com, hydraulic calculations",
  LC: "learnchannel-tv.com, hydraulics",
  HT: "hydrotech.com, hydraulic tools",
  HP: "Hydraulics & Pneumatics, log splitter two-stage pump article",
  CD: "carldyke.com, unloading valve",
  HYT: "hytec-hydraulik.com, nominal width",
  EZ: "hydraulics.ezvirtualtools.com, rod buckling",
  HAE: "haenchen-hydraulic.com, buckling",
  HAT: "hoseassemblytips.com",
  J517: "SAE J517 (2003)",
  KURT: "kurthydraulics.com, SAE specifications",
  JAS: "jasonindustrial.com, SAE J1273 guidelines",
  FIR: "firgelliauto.com, reservoir sizing",
  HL: "hydrauliclearning.com, reservoir sizing",
  MC: "machinecalcs.com, reservoir sizing",
  PD: "piping-designer.com, simple beam centre load",
  A36: "steelcalculator.app, A36 properties",
  EN: "readle.co.uk, steel grades (EN 10025)",
  ITI: "itidirect.co.uk, ram gauges",
  TF: "Wikipedia, Ton-force",
  JOH: "Wikipedia, Johnson's parabolic formula",
  PLY: "University of Plymouth design notes, buckling load calculator (D. J. Grieve, 1999)",
  AISC: "AISC 360-22 Commentary, Table C-A-7.1, recommended design values of K",
  CSG: "control-specialties.com, pressure gauges (reading at 50–75 % of full scale)",
  B40: "ASME B40.100 (accuracy grades over the middle half of the scale)",
} as const;

export type SourceKey = keyof typeof SOURCES;

export const COMMON_PRACTICE = "common practice (no published source)";
export const FROM_FORMULA = "computed from the formula";

/** "[HYT] hytec-hydraulik.com, nominal width; [HT] …" */
export function cite(...keys: readonly SourceKey[]): string {
  const memoKey = keys.join();
  let text = CITED.get(memoKey);
  if (text === undefined) {
    text = keys.map((key) => `[${key}] ${SOURCES[key]}`).join("; ");
    CITED.set(memoKey, text);
  }
  return text;
}

/** The same few citations are built on every evaluation; keep each once (a handful of entries). */
const CITED = new Map<string, string>();
