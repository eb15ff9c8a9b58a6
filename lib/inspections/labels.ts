import type { Cadence, InspectionArea, Outcome } from "@/db/schema/inspections";

export const AREA_LABELS: Record<InspectionArea, string> = {
  hydraulics: "Hydraulics",
  "hoses-fittings": "Hoses and fittings",
  "frame-welds": "Frame and welds",
  "dies-tooling": "Dies and tooling",
  "controls-guards": "Controls and guards",
  electrical: "Electrical",
};

export const CADENCE_LABELS: Record<Cadence, string> = {
  "pre-use": "Before each use",
  weekly: "Weekly",
  monthly: "Monthly",
  yearly: "Yearly",
  "after-modification": "After a modification",
};

export const OUTCOME_LABELS: Record<Outcome, string> = { pass: "Pass", fail: "Fail", na: "N/A" };

/** Lockout steps for a press (29 CFR 1910.147(d)(5)(i) asks that stored energy be relieved). */
export const LOCKOUT_STEPS = "Stop the pump and lock the isolator off, lower the ram or block it, bleed the pressure, and check the gauge reads zero.";
