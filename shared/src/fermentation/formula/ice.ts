import { BakersMathError, fieldPath, requireFinite, requirePositive } from '../units/bakers-math-error.js';

/*
 * Physical constants for the ice calculation, all from memory (standard physics, not from the
 * project's sources): latent heat of fusion of ice ≈ 334 J/g (≈ 80 cal/g), specific heat of
 * liquid water ≈ 4.18 J/(g·K), of ice ≈ 2.09 J/(g·K).
 */
export const LATENT_HEAT_OF_FUSION_J_PER_G = 334;
export const WATER_SPECIFIC_HEAT_J_PER_G_K = 4.18;
export const ICE_SPECIFIC_HEAT_J_PER_G_K = 2.09;

export interface IceInput {
  /** The formula's water, all of it: ice replaces part of the tap water gram for gram. */
  waterG: number;
  /** Temperature of the water from the tap, °C. */
  tapC: number;
  /** Temperature the water must have once the ice has melted, °C (0 °C or warmer). */
  targetC: number;
  /** Temperature of the ice, °C; default 0 (ice from a bucket of ice water). Freezer ice is colder. */
  iceC?: number;
}

export interface IceResult {
  iceG: number;
  tapWaterG: number;
}

/**
 * Ice to melt into tap water so the mix lands at the target. Energy balance, heat lost by the tap
 * water = heat taken up by the ice (warming to 0 °C, melting, warming to the target):
 *   (W − I)·c_w·(T_tap − T) = I·(c_ice·(0 − T_ice) + L + c_w·T)
 *   ⇒ I = W·c_w·(T_tap − T) / (c_ice·(−T_ice) + L + c_w·T_tap)
 * With ice at 0 °C this is the familiar I = W·(T_tap − T)/(T_tap + 80) in °C, since L/c_w ≈ 80.
 * No ice is needed (0 g) when the tap is already at or below the target.
 */
export function iceForWater(input: IceInput, at = ''): IceResult {
  const waterG = requirePositive(input.waterG, fieldPath(at, 'waterG'));
  const tapC = requireFinite(input.tapC, fieldPath(at, 'tapC'));
  const targetC = requireFinite(input.targetC, fieldPath(at, 'targetC'));
  const iceC = requireFinite(input.iceC ?? 0, fieldPath(at, 'iceC'));
  if (targetC < 0) {
    throw new BakersMathError(fieldPath(at, 'targetC'), 'melted ice cannot bring water below 0 °C');
  }
  if (iceC > 0) throw new BakersMathError(fieldPath(at, 'iceC'), 'ice is at 0 °C or colder');
  if (tapC <= targetC) return { iceG: 0, tapWaterG: waterG };
  const cw = WATER_SPECIFIC_HEAT_J_PER_G_K;
  const iceG =
    (waterG * cw * (tapC - targetC)) /
    (ICE_SPECIFIC_HEAT_J_PER_G_K * -iceC + LATENT_HEAT_OF_FUSION_J_PER_G + cw * tapC);
  return { iceG, tapWaterG: waterG - iceG };
}
