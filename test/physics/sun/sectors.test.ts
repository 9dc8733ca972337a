/** The beam on the sectors of a vertical cylinder. */
import { describe, it, expect } from 'vitest';
import { beamOnSector, sectorAzimuthDeg } from '../../../src/physics/sun/sectors.ts';

describe('beam on sectors', () => {
  it.each([1, 2, 3, 8, 16, 36])('summed round the circumference gives the projected-width total G_bn D cos h (%i sectors)', (n) => {
    // geometry: a cylinder of radius r intercepts the beam over its projected width 2r (exact, any n)
    const g = 800;
    const alt = 30;
    const r = 0.8;
    for (const sunAz of [0, 17, 135.5, 250, 359]) {
      let total = 0;
      for (let j = 0; j < n; j++) total += beamOnSector(g, alt, sunAz, j, n) * r * ((2 * Math.PI) / n);
      expect(total / (g * Math.cos((alt * Math.PI) / 180) * 2 * r)).toBeCloseTo(1, 12);
    }
  });

  it('is largest on the sector facing the sun and zero on the one facing away (worked example in the doc comment)', () => {
    // 4 sectors, sun due east (90°): sector 1 (east) gets 800 cos30° · 2 sin45° / (π/2) = 623.8 W/m²
    expect(beamOnSector(800, 30, 90, 1, 4)).toBeCloseTo((800 * Math.cos(Math.PI / 6) * 2 * Math.SQRT1_2) / (Math.PI / 2), 9);
    expect(beamOnSector(800, 30, 90, 3, 4)).toBe(0);
    expect(sectorAzimuthDeg(1, 4)).toBe(90);
  });

  it('is zero at night', () => {
    expect(beamOnSector(800, -2, 90, 1, 4)).toBe(0);
  });
});
