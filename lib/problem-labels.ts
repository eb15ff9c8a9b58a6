import type { ProblemSeverity } from "@/db/schema/problems";

/** Our words for how serious a reported problem is. */
export const SEVERITY_LABELS: Record<ProblemSeverity, string> = { low: "Minor", medium: "Needs attention soon", high: "Dangerous" };

export const SEVERITY_OPTIONS: readonly { value: ProblemSeverity; label: string }[] = (Object.keys(SEVERITY_LABELS) as ProblemSeverity[]).map((value) => ({
  value,
  label: SEVERITY_LABELS[value],
}));
