/**
 * Parts of the demo presses — invented for the demo only, with plausible catalogue-like figures.
 * Garage press: its pressure hose is rated below the planned relief setting, so the as-built check
 * shows a builder what it catches before money is spent. Four-post 60: two rams under one platen,
 * and welding dies whose own limit sits below the press's force at relief (the gauge card says so).
 */
import type { ComponentSpec } from "@/lib/validation/component-spec";

export type DemoPart = {
  label: string;
  spec: ComponentSpec;
  maker?: string;
  partNumber?: string;
  supplier?: string;
  costCents?: number;
  purchased?: boolean;
  installedOn?: string;
};

const hose = (label: string, line: "pressure" | "return" | "suction", idMm: number, standard: string, ratedBar: number, lengthMm: number, extra: Partial<DemoPart> = {}): DemoPart => ({
  label,
  spec: { kind: "hose", line, insideDiameterMm: idMm, standard, ratedPressureBar: ratedBar, lengthMm },
  ...extra,
});

export const DEMO_PARTS: Record<string, DemoPart[]> = {
  "Bay 1 H-frame": [
    { label: "Main cylinder", spec: { kind: "cylinder", boreMm: 152.4, rodMm: 76.2, strokeMm: 250, ratedPressureBar: 207, endFixity: "fixed-pinned", exposedRodMm: 80 }, maker: "Northgate Fluid Power", partNumber: "NG-6x10-TM", supplier: "Hydraulic Depot", costCents: 48500, installedOn: "2023-04-02" },
    { label: "Two-stage pump", spec: { kind: "pump", pumpKind: "two-stage", approachFlowLpm: 41.6, pressingFlowLpm: 8.3, unloadBar: 50, ratedPressureBar: 207 }, supplier: "Hydraulic Depot", costCents: 21000, installedOn: "2023-04-02" },
    { label: "Motor", spec: { kind: "motor", powerKw: 5.5, speedRpm: 1450, supply: "three-phase" }, supplier: "Motor Mart", costCents: 26000, installedOn: "2023-04-02" },
    { label: "Control valve", spec: { kind: "directional-valve", ratedFlowLpm: 80, ratedPressureBar: 250 }, costCents: 9500, installedOn: "2023-04-02" },
    { label: "Relief valve", spec: { kind: "relief-valve", settingBar: 200, ratedPressureBar: 250 }, costCents: 4200, installedOn: "2023-04-02" },
    hose("Pump to valve", "pressure", 12.7, "SAE 100R2AT", 276, 900, { installedOn: "2023-04-02", costCents: 3800 }),
    hose("Valve to cap end", "pressure", 12.7, "SAE 100R2AT", 276, 1500, { installedOn: "2023-04-02", costCents: 4600 }),
    hose("Valve to rod end", "pressure", 12.7, "SAE 100R2AT", 276, 1500, { installedOn: "2023-04-02", costCents: 4600 }),
    hose("Return to tank", "return", 19, "SAE 100R1AT", 105, 1200, { installedOn: "2023-04-02", costCents: 4100 }),
    { label: "Return filter", spec: { kind: "filter", location: "return", ratingMicron: 10, elementPart: "RF-10-160" }, costCents: 3500, installedOn: "2023-04-02" },
    { label: "Tank", spec: { kind: "reservoir", volumeL: 80, oilGrade: "ISO VG 46" }, costCents: 12000, installedOn: "2023-04-02" },
    { label: "Gauge", spec: { kind: "gauge", rangeBar: 250 }, costCents: 2600, installedOn: "2023-04-02" },
    { label: "Crosshead", spec: { kind: "crosshead", spanMm: 400, widthMm: 400, thicknessMm: 60, grade: "S355JR" }, costCents: 17000, installedOn: "2023-03-10" },
    { label: "Bolster", spec: { kind: "bolster", spanMm: 400, widthMm: 300, thicknessMm: 50, grade: "S355JR" }, costCents: 11000, installedOn: "2023-03-10" },
    { label: "Flat dies 100 mm", spec: { kind: "die", purpose: "Drawing out and flattening", widthMm: 100, lengthMm: 150 }, installedOn: "2023-05-20" },
  ],
  "Bench C-frame": [
    { label: "Cylinder", spec: { kind: "cylinder", boreMm: 80, rodMm: 45, strokeMm: 150, ratedPressureBar: 300, endFixity: "fixed-fixed", exposedRodMm: 40 }, costCents: 16000, installedOn: "2024-02-11" },
    { label: "Pump", spec: { kind: "pump", pumpKind: "single", flowLpm: 4, ratedPressureBar: 280 }, costCents: 9000, installedOn: "2024-02-11" },
    { label: "Motor", spec: { kind: "motor", powerKw: 2.2, speedRpm: 1450, supply: "single-phase" }, costCents: 14000, installedOn: "2024-02-11" },
    { label: "Hand valve", spec: { kind: "directional-valve", ratedFlowLpm: 40, ratedPressureBar: 315 }, costCents: 6000, installedOn: "2024-02-11" },
    { label: "Relief valve", spec: { kind: "relief-valve", settingBar: 250, ratedPressureBar: 315 }, costCents: 3500, installedOn: "2024-02-11" },
    hose("Cap-end hose", "pressure", 6.4, "SAE 100R2AT", 400, 800, { installedOn: "2024-02-11" }),
    hose("Rod-end hose", "pressure", 6.4, "SAE 100R2AT", 400, 800, { installedOn: "2024-02-11" }),
    { label: "Tank", spec: { kind: "reservoir", volumeL: 15, oilGrade: "ISO VG 46" }, installedOn: "2024-02-11" },
    { label: "Gauge", spec: { kind: "gauge", rangeBar: 315 }, costCents: 2400, installedOn: "2024-02-11" },
    { label: "Touchmark die", spec: { kind: "die", purpose: "Stamping the workshop's mark" }, installedOn: "2024-03-01" },
  ],
  "Four-post 60": [
    // Two rams side by side push one platen: the platen between them is the part most likely to bend.
    ...[1, 2].map((n): DemoPart => ({ label: `Ram ${n}`, spec: { kind: "cylinder", boreMm: 140, rodMm: 70, strokeMm: 300, ratedPressureBar: 250, endFixity: "fixed-fixed", exposedRodMm: 60 }, costCents: 61000, purchased: true })),
    { label: "Platen", spec: { kind: "platen", rodSpacingMm: 250, dieWidthMm: 100, widthMm: 400, thicknessMm: 60, grade: "S355JR" }, supplier: "Steel stockholder", costCents: 19500, purchased: true },
    { label: "Welding dies", spec: { kind: "die", purpose: "Damascus billet welding, 100 mm flat", widthMm: 100, lengthMm: 200, maxForceKn: 450 }, costCents: 8000, purchased: false },
    { label: "Two-stage pump", spec: { kind: "pump", pumpKind: "two-stage", approachFlowLpm: 60, pressingFlowLpm: 12, unloadBar: 40, ratedPressureBar: 250 }, costCents: 38000, purchased: true },
    { label: "Motor", spec: { kind: "motor", powerKw: 7.5, speedRpm: 1450, supply: "three-phase" }, costCents: 41000, purchased: true },
    { label: "Relief valve", spec: { kind: "relief-valve", settingBar: 210, ratedPressureBar: 315 }, costCents: 5200, purchased: true },
    { label: "Control valve", spec: { kind: "directional-valve", ratedFlowLpm: 100, ratedPressureBar: 315 }, costCents: 14500, purchased: false },
    ...[1, 2, 3, 4].map((n): DemoPart => ({ label: `Tie rod ${n}`, spec: { kind: "frame-member", role: "tie-rod", lengthMm: 1400, diameterMm: 45, grade: "S355JR" }, supplier: "Steel stockholder", costCents: 6800, purchased: false })),
    { label: "Tank", spec: { kind: "reservoir", volumeL: 200, oilGrade: "ISO VG 46" }, costCents: 22000, purchased: false },
  ],
  "Old splitter conversion": [
    { label: "Splitter cylinder", spec: { kind: "cylinder", boreMm: 101.6, rodMm: 50.8, strokeMm: 600, ratedPressureBar: 207, endFixity: "pinned-pinned", exposedRodMm: 120 }, installedOn: "2019-06-01" },
    { label: "Splitter pump", spec: { kind: "pump", pumpKind: "two-stage", approachFlowLpm: 49, pressingFlowLpm: 11, unloadBar: 45, ratedPressureBar: 207 }, installedOn: "2019-06-01" },
    { label: "Relief valve", spec: { kind: "relief-valve", settingBar: 172 }, installedOn: "2019-06-01" },
  ],
  "Garage press (planned)": [
    { label: "Cylinder", spec: { kind: "cylinder", boreMm: 127, rodMm: 63.5, strokeMm: 200, ratedPressureBar: 207, endFixity: "fixed-pinned", exposedRodMm: 60 }, supplier: "Surplus dealer", costCents: 31000, purchased: true },
    { label: "Pump", spec: { kind: "pump", pumpKind: "single", flowLpm: 8, ratedPressureBar: 210 }, costCents: 16500, purchased: false },
    { label: "Motor", spec: { kind: "motor", powerKw: 3.7, speedRpm: 1750, supply: "single-phase" }, costCents: 28900, purchased: false },
    { label: "Relief valve", spec: { kind: "relief-valve", settingBar: 200, ratedPressureBar: 210 }, costCents: 4500, purchased: false },
    hose("Pressure hose", "pressure", 12.7, "SAE 100R1AT", 160, 1200, { costCents: 3900, purchased: false }),
    { label: "Gauge", spec: { kind: "gauge", rangeBar: 250 }, costCents: 2900, purchased: false },
    { label: "Frame steel", spec: { kind: "frame-member", role: "side-plate", lengthMm: 1200, widthMm: 150, thicknessMm: 25, grade: "A36" }, costCents: 24000, purchased: false },
  ],
};

/** Hour-meter readings of the demo presses (hours, days ago). */
export const DEMO_READINGS: Record<string, [number, number][]> = {
  "Bay 1 H-frame": [[380, 60], [398, 30], [412.5, 3]],
  "Bench C-frame": [[90, 40], [96, 5]],
};
