// Merge seam: replaced by the service issue's real implementation.
import "server-only";
import type { Executor } from "./press-access";

export type ServiceDueItem = { taskId: string; title: string; state: "due-soon" | "overdue"; dueDate: Date | null; dueHours: number | null };

/** Service tasks due soon or overdue per press (callers have already authorized the press ids). */
export async function listServiceDueByPress(executor: Executor, pressIds: readonly string[], now: Date): Promise<Map<string, ServiceDueItem[]>> {
  void executor;
  void pressIds;
  void now;
  return new Map();
}
