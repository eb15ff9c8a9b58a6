import type { FieldId } from "./form-model";

/**
 * An imperial builder's defaults in round inch/psi/gpm figures (also invented, about 26.5 US tons)
 * rather than the metric press converted to 4.92126 in. Values in imperial display units.
 */
export const IMPERIAL_DEFAULTS: Partial<Record<FieldId, number>> = {
  boreMm: 5,
  rodMm: 2.5,
  strokeMm: 10,
  flowLpm: 3,
  approachFlowLpm: 11,
  pressingFlowLpm: 2.2,
  unloadBar: 650,
  pressureBar: 2700,
  reliefBar: 2800,
  motorKw: 7.5,
  pressDistanceMm: 2,
  suctionIdMm: 1,
  pressureIdMm: 0.5,
  returnIdMm: 0.75,
  exposedRodMm: 4,
  hoseBar: 4000,
  valveBar: 3000,
  pumpBar: 3000,
  cylinderBar: 3000,
  gaugeBar: 5000,
  volumeL: 40,
  plateSpanMm: 12,
  plateWidthMm: 12,
  plateThicknessMm: 2.25,
  columnsDiameterMm: 1.5,
};
