/** The thermal-stress indicator against its closed form. */
import { describe, it, expect } from 'vitest';
import { thermalStressIndicator } from '../../../src/physics/wall/stress.ts';

describe('thermal-stress indicator', () => {
  it('is E·α·ΔT / (2(1 − ν)) (Timoshenko & Goodier, Theory of Elasticity, §§150–151: thin cylinder, linear gradient)', () => {
    // 200 GPa · 12e-6 /K · 10 K / (2 · 0.7) = 17.142857 MPa, by hand
    expect(thermalStressIndicator(200e9, 12e-6, 0.3, 10)).toBeCloseTo(17.142857e6, 0);
    expect(thermalStressIndicator(30e9, 6e-6, 0.2, -40)).toBeCloseTo((30e9 * 6e-6 * 40) / 1.6, 0); // sign of ΔT does not matter
  });
});
