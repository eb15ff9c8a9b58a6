/**
 * The demo scenario — invented for the demo only: Millrace Community Forge, a shared workshop
 * with four presses, and Lena, a home builder planning her first press in her own garage.
 * Rated force = cap-end area × relief pressure (hydraulics-reference.md §1, common practice).
 */
import type { FRAME_TYPES, LIFECYCLES } from "./schema/presses";

export const DEMO_PASSWORD = "anvil-quench-2026";

export type DemoUser = { key: string; email: string; displayName: string; unitSystem: "metric" | "imperial" };
export type DemoPress = {
  name: string;
  frameType: (typeof FRAME_TYPES)[number];
  lifecycle: (typeof LIFECYCLES)[number];
  boreMm: number;
  /** Rams in parallel (default 1). */
  cylinders?: number;
  strokeMm: number;
  daylightMm: number;
  bedWidthMm: number;
  bedDepthMm: number;
  workingPressureBar: number;
  reliefPressureBar: number;
  hourMeter: number;
  location: string;
  notes: string;
};

export const DEMO_USERS: DemoUser[] = [
  { key: "manager", email: "dana@millrace-forge.example", displayName: "Dana Okafor", unitSystem: "metric" },
  { key: "inspector", email: "ravi@millrace-forge.example", displayName: "Ravi Lindqvist", unitSystem: "metric" },
  { key: "member1", email: "tess@millrace-forge.example", displayName: "Tess Moreau", unitSystem: "imperial" },
  { key: "member2", email: "owen@millrace-forge.example", displayName: "Owen Baptiste", unitSystem: "metric" },
  { key: "builder", email: "lena@garage-build.example", displayName: "Lena Varga", unitSystem: "imperial" },
];

export const WORKSHOP = {
  name: "Millrace Community Forge",
  timeZone: "Europe/London",
  currency: "GBP",
  roles: { manager: "manager", inspector: "inspector", member1: "member", member2: "member" } as const,
};

export const WORKSHOP_PRESSES: DemoPress[] = [
  {
    name: "Bay 1 H-frame",
    frameType: "h-frame",
    lifecycle: "in-service",
    boreMm: 152.4,
    strokeMm: 250,
    daylightMm: 420,
    bedWidthMm: 300,
    bedDepthMm: 250,
    workingPressureBar: 180,
    reliefPressureBar: 200,
    hourMeter: 412.5,
    location: "Bay 1, by the gas forge",
    notes: "Main drawing-out press. Two-stage pump, 5.5 kW motor.",
  },
  {
    name: "Bench C-frame",
    frameType: "c-frame",
    lifecycle: "in-service",
    boreMm: 80,
    strokeMm: 150,
    daylightMm: 200,
    bedWidthMm: 180,
    bedDepthMm: 150,
    workingPressureBar: 220,
    reliefPressureBar: 250,
    hourMeter: 96,
    location: "Bench room",
    notes: "Small press for stamping makers' marks and light fullering.",
  },
  {
    name: "Four-post 60",
    frameType: "four-post",
    lifecycle: "building",
    boreMm: 140,
    cylinders: 2,
    strokeMm: 300,
    daylightMm: 500,
    bedWidthMm: 450,
    bedDepthMm: 450,
    workingPressureBar: 190,
    reliefPressureBar: 210,
    hourMeter: 0,
    location: "Bay 2",
    notes: "Damascus welding press under construction: two 140 mm rams under one platen; tie rods on order.",
  },
  {
    name: "Old splitter conversion",
    frameType: "other",
    lifecycle: "retired",
    boreMm: 101.6,
    strokeMm: 600,
    daylightMm: 650,
    bedWidthMm: 200,
    bedDepthMm: 200,
    workingPressureBar: 160,
    reliefPressureBar: 172,
    hourMeter: 1288,
    location: "Yard store",
    notes: "Retired after the frame flexed visibly under load.",
  },
];

export const BUILDER_PRESSES: DemoPress[] = [
  {
    name: "Garage press (planned)",
    frameType: "h-frame",
    lifecycle: "planned",
    boreMm: 127,
    strokeMm: 200,
    daylightMm: 350,
    bedWidthMm: 250,
    bedDepthMm: 200,
    workingPressureBar: 190,
    reliefPressureBar: 200,
    hourMeter: 0,
    location: "Garage",
    notes: "First build: 5 in cylinder, single-stage pump to start.",
  },
];

/** Cap-end area (mm²) × pressure (bar ⇒ 0.1 N/mm²) in kN. */
export function ratedForceKn(boreMm: number, reliefBar: number, cylinders = 1): number {
  return cylinders * ((Math.PI * boreMm ** 2) / 4) * (reliefBar / 10) / 1000;
}

/**
 * Demo bookings of the workshop's presses, relative to the day the seed runs (in the workshop's
 * zone): [press name, member key, days from today, start hour, hours long]. Invented scenario.
 */
export const DEMO_BOOKINGS: [string, keyof typeof WORKSHOP.roles, number, number, number][] = [
  ["Bay 1 H-frame", "member1", 1, 10, 2],
  ["Bay 1 H-frame", "member2", 1, 14, 3],
  ["Bay 1 H-frame", "member1", 3, 18, 2],
  ["Bench C-frame", "member2", 2, 9, 1],
  ["Bench C-frame", "inspector", 4, 16, 2],
];
