// Merge seam: replaced by the inspections issue's real implementation.
import "server-only";
import type { Executor } from "./press-access";

export type InspectionDueItem = { templateId: string; name: string; state: "due-soon" | "overdue"; dueAt: Date | null };

/** Inspections due soon or overdue per press (callers have already authorized the press ids). */
export async function listInspectionDueByPress(executor: Executor, pressIds: readonly string[], now: Date): Promise<Map<string, InspectionDueItem[]>> {
  void executor;
  void pressIds;
  void now;
  return new Map();
}
