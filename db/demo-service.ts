/**
 * Invented service history and plans for the demo presses: on "Bay 1 H-frame" the filter change
 * is overdue and the relief check is due soon; on "Bench C-frame" the filter is due soon by hours.
 * Days are counted back from the day the seed runs, so the demo always shows the same picture.
 */
import type { ServiceKind } from "./schema/service";

export type DemoEntry = { kind: ServiceKind; daysAgo: number; hours: number | null; by: "manager" | "inspector"; parts?: { description: string; quantity: number }[]; costCents?: number; iso4406?: string; reliefFoundBar?: number; reliefSetBar?: number; notes?: string };
export type DemoTask = { title: string; kind: ServiceKind; intervalDays: number | null; intervalHours: number | null; fromStartingPlan: boolean; lastDaysAgo: number; lastHours: number };

export const DEMO_SERVICE: Record<string, { entries: DemoEntry[]; tasks: DemoTask[] }> = {
  "Bay 1 H-frame": {
    entries: [
      { kind: "filter-changed", daysAgo: 200, hours: 160, by: "manager", parts: [{ description: "Return-line filter element, 10 µm", quantity: 1 }], costCents: 2450, notes: "Indicator was in the yellow after the winter open days." },
      { kind: "oil-changed", daysAgo: 120, hours: 300, by: "manager", parts: [{ description: "ISO VG 46 hydraulic oil, 20 L", quantity: 3 }], costCents: 16500, notes: "Drained warm; tank wiped out, breather cleaned." },
      { kind: "oil-sample", daysAgo: 60, hours: 380, by: "inspector", iso4406: "17/15/12", notes: "Bottle sample from the return line, posted to the lab." },
      { kind: "leak-fixed", daysAgo: 45, hours: 386, by: "inspector", notes: "Weep at the pump outlet fitting. Pressure relieved and locked out, joint re-made, run to pressure and checked with cardboard." },
      { kind: "relief-checked", daysAgo: 28, hours: 398, by: "inspector", reliefFoundBar: 205, reliefSetBar: 200, notes: "Had crept up; set back to 200 bar against the test gauge." },
    ],
    tasks: [
      { title: "Change the filter element", kind: "filter-changed", intervalDays: 180, intervalHours: 250, fromStartingPlan: true, lastDaysAgo: 200, lastHours: 160 },
      { title: "Check the relief valve setting", kind: "relief-checked", intervalDays: 30, intervalHours: null, fromStartingPlan: true, lastDaysAgo: 28, lastHours: 398 },
      { title: "Change the hydraulic oil", kind: "oil-changed", intervalDays: 365, intervalHours: 1000, fromStartingPlan: true, lastDaysAgo: 120, lastHours: 300 },
      { title: "Take an oil sample", kind: "oil-sample", intervalDays: 180, intervalHours: 500, fromStartingPlan: false, lastDaysAgo: 60, lastHours: 380 },
    ],
  },
  "Bench C-frame": {
    entries: [{ kind: "die-changed", daysAgo: 20, hours: 93, by: "manager", notes: "Swapped the fullering dies for the stamp holder for the makers' mark session." }],
    tasks: [{ title: "Change the filter element", kind: "filter-changed", intervalDays: 365, intervalHours: 100, fromStartingPlan: false, lastDaysAgo: 300, lastHours: 0 }],
  },
};
