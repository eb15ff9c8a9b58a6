/**
 * Query string of the printable gauge card (/sizing/gauge-card): SI values, so a link made in
 * either unit system prints the same forces. `units` picks the gauge steps (10 bar or 100 psi).
 */
import { z } from "zod";
import "./browser-jitless";
import { INPUT_LIMITS } from "@/lib/hydraulics";

const L = INPUT_LIMITS;

function queryNumber(label: string, [min, max]: readonly [number, number], unit: string) {
  const message = `${label} must be a number from ${min} to ${max} ${unit}.`;
  return z.coerce.number({ error: message }).min(min, message).max(max, message);
}

export const gaugeCardQuerySchema = z.strictObject({
  bore: queryNumber("Bore", L.diameterMm, "mm"),
  count: z.coerce
    .number({ error: "Cylinder count must be a whole number from 1 to 8." })
    .int("Cylinder count must be a whole number from 1 to 8.")
    .min(L.cylinderCount[0], "Cylinder count must be a whole number from 1 to 8.")
    .max(L.cylinderCount[1], "Cylinder count must be a whole number from 1 to 8.")
    .default(1),
  relief: queryNumber("Relief setting", L.pressureBar, "bar"),
  units: z.enum(["metric", "imperial"], { error: 'Units must be "metric" or "imperial".' }).default("metric"),
  name: z.string().trim().max(100, "The press name is too long (at most 100 characters).").default(""),
});

export type GaugeCardQuery = z.output<typeof gaugeCardQuerySchema>;
