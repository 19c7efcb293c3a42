import { describe, expect, it } from 'vitest';
import {
  ICE_SPECIFIC_HEAT_J_PER_G_K,
  LATENT_HEAT_OF_FUSION_J_PER_G,
  WATER_SPECIFIC_HEAT_J_PER_G_K,
  iceForWater,
} from './ice.js';

// Standard physics, constants from memory: L ≈ 334 J/g (≈ 80 cal/g), c_water ≈ 4.18 J/(g·K),
// c_ice ≈ 2.09 J/(g·K). The checks are energy balances, so they hold whatever the constants.
describe('ice to cool the water', () => {
  it('balances heat: tap water cooling = ice warming to 0 °C, melting and warming to the target', () => {
    for (const [waterG, tapC, targetC, iceC] of [
      [700, 20, 8, 0],
      [650, 27, 2, 0],
      [500, 24, 10, -18],
    ] as const) {
      const { iceG, tapWaterG } = iceForWater({ waterG, tapC, targetC, iceC });
      const lost = tapWaterG * WATER_SPECIFIC_HEAT_J_PER_G_K * (tapC - targetC);
      const gained =
        iceG *
        (ICE_SPECIFIC_HEAT_J_PER_G_K * (0 - iceC) +
          LATENT_HEAT_OF_FUSION_J_PER_G +
          WATER_SPECIFIC_HEAT_J_PER_G_K * targetC);
      expect(gained).toBeCloseTo(lost, 9);
      expect(iceG + tapWaterG).toBeCloseTo(waterG, 9);
    }
  });

  it('matches the bakers’ shortcut ice = W·(tap − T)/(tap + 80) in °C within 0.2 %', () => {
    const { iceG } = iceForWater({ waterG: 700, tapC: 20, targetC: 8 });
    const shortcut = (700 * (20 - 8)) / (20 + 80);
    expect(Math.abs(iceG / shortcut - 1)).toBeLessThan(0.002);
    expect(LATENT_HEAT_OF_FUSION_J_PER_G / WATER_SPECIFIC_HEAT_J_PER_G_K).toBeCloseTo(80, 0);
  });

  it('needs less freezer ice than ice-water ice', () => {
    const atZero = iceForWater({ waterG: 500, tapC: 24, targetC: 10 }).iceG;
    expect(iceForWater({ waterG: 500, tapC: 24, targetC: 10, iceC: -18 }).iceG).toBeLessThan(atZero);
  });

  it('needs none when the tap is already cold enough, and refuses targets below 0 °C', () => {
    expect(iceForWater({ waterG: 500, tapC: 10, targetC: 12 })).toEqual({ iceG: 0, tapWaterG: 500 });
    expect(() => iceForWater({ waterG: 500, tapC: 20, targetC: -2 })).toThrow(
      expect.objectContaining({ path: 'targetC' }) as Error,
    );
    expect(() => iceForWater({ waterG: 0, tapC: 20, targetC: 2 })).toThrow(
      expect.objectContaining({ path: 'waterG' }) as Error,
    );
    expect(() => iceForWater({ waterG: 5, tapC: 20, targetC: 2, iceC: 3 })).toThrow(
      expect.objectContaining({ path: 'iceC' }) as Error,
    );
  });
});
