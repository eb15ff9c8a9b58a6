/**
 * The throat of an open (C) frame. The force acts at a distance e (ram axis to the throat's
 * neutral axis) from the back, so the back carries tension F and bending M = F·e; the inner edge
 * sees σ = F/A + F·e/S. The bending also turns the jaws apart: over a back of length H the angle
 * is θ = M·H / (E·I), and the gap at the ram's axis opens by θ·e (the jaws' own bending adds to it
 * and is left out). Common practice; factor on yield ≥ 2 at relief force as for the frame.
 */
import type { Fmt } from "./checks";
import { strengthCheck } from "./frame";
import { formatNumber } from "@/lib/units";
import { STEEL_E_N_MM2, yieldStrength } from "./steel";
import type { Check, ThroatInput, ThroatResult } from "./types";

const N_PER_KN = 1000;
const NMM_PER_KNM = 1e6;
const DEG_PER_RAD = 180 / Math.PI;

export interface ThroatSection {
  areaMm2: number;
  sectionModulusMm3: number;
  inertiaMm4: number;
}

/** Solid back: A = h·t, S = t·h²/6, I = t·h³/12; a built-up section brings its own figures. */
export function throatSection(throat: ThroatInput): ThroatSection {
  if (throat.sectionDepthMm === undefined) {
    return { areaMm2: throat.areaMm2, sectionModulusMm3: throat.sectionModulusMm3, inertiaMm4: throat.inertiaMm4 };
  }
  const h = throat.sectionDepthMm;
  const t = throat.thicknessMm;
  return { areaMm2: h * t, sectionModulusMm3: (t * h * h) / 6, inertiaMm4: (t * h ** 3) / 12 };
}

export function evaluateThroat(throat: ThroatInput, forceKn: number): ThroatResult {
  const section = throatSection(throat);
  const forceN = forceKn * N_PER_KN;
  const momentNmm = forceN * throat.depthMm;
  const tensionStressMpa = forceN / section.areaMm2;
  const bendingStressMpa = momentNmm / section.sectionModulusMm3;
  const stressMpa = tensionStressMpa + bendingStressMpa;
  const { yieldMpa, covered } = yieldStrength(throat.grade, throat.thicknessMm);
  const openingRad = (momentNmm * throat.heightMm) / (STEEL_E_N_MM2 * section.inertiaMm4);
  return {
    momentKnM: momentNmm / NMM_PER_KNM,
    tensionStressMpa,
    bendingStressMpa,
    stressMpa,
    yieldMpa,
    safetyFactor: yieldMpa / stressMpa,
    yieldTableCovers: covered,
    openingDeg: openingRad * DEG_PER_RAD,
    gapOpeningMm: openingRad * throat.depthMm,
  };
}

export function throatCheck(throat: ThroatInput, result: ThroatResult, fmt: Fmt): Check {
  const what = `Open-frame throat, ${fmt("length", throat.depthMm)} deep, tension ${fmt("stress", result.tensionStressMpa)} plus bending ${fmt("stress", result.bendingStressMpa)}`;
  const check = strengthCheck("throat", what, result, throat.grade, fmt);
  check.message += ` Under full force the jaws open about ${formatNumber(result.openingDeg, 2)}° and the gap at the ram about ${fmt("length", result.gapOpeningMm)} (estimate, jaws' own bending not included): an open-throat frame tilts the dies, so keep the work under the ram's axis.`;
  check.rule = `${check.rule} Throat stress = F/A + F·e/S; opening angle = F·e·H/(E·I).`;
  return check;
}
