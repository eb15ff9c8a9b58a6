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
} as const;

export type SourceKey = keyof typeof SOURCES;

export const COMMON_PRACTICE = "common practice (no published source)";
export const FROM_FORMULA = "computed from the formula";

/** "[HYT] hytec-hydraulik.com, nominal width; [HT] …" */
export function cite(...keys: readonly SourceKey[]): string {
  return keys.map((key) => `[${key}] ${SOURCES[key]}`).join("; ");
}
