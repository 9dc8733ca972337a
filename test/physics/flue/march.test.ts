import { describe, expect, it } from 'vitest';
import { gasOutletTemperature, heatToWall, segmentNtu } from '../../../src/physics/flue/march.ts';

/** Fine RK4 integration of ṁ c_p dT/dz = −h π D (T − T_w), accumulating ∫ h π D (T − T_w) dz by Simpson's rule. */
function integrateIndependently(Tin: number, Tw: number, h: number, D: number, L: number, mdot: number, cp: number, steps: number) {
  const f = (T: number) => (-h * Math.PI * D * (T - Tw)) / (mdot * cp);
  const dz = L / steps;
  const T = new Float64Array(steps + 1);
  T[0] = Tin;
  for (let i = 0; i < steps; i++) {
    const y = T[i];
    const k1 = f(y);
    const k2 = f(y + 0.5 * dz * k1);
    const k3 = f(y + 0.5 * dz * k2);
    const k4 = f(y + dz * k3);
    T[i + 1] = y + (dz / 6) * (k1 + 2 * k2 + 2 * k3 + k4);
  }
  let q = 0; // Simpson, steps even
  for (let i = 0; i <= steps; i++) {
    const w = i === 0 || i === steps ? 1 : i % 2 ? 4 : 2;
    q += w * h * Math.PI * D * (T[i] - Tw);
  }
  return { Tout: T[steps], heat: (q * dz) / 3 };
}

describe('gas march through one segment', () => {
  const cases = [
    { Tin: 500, Tw: 400, h: 10, D: 2, L: 5, mdot: 10, cp: 1100 }, // weak cooling, NTU 0.029
    { Tin: 900, Tw: 350, h: 25, D: 1.2, L: 20, mdot: 2, cp: 1150 }, // strong cooling, NTU 1.0
    { Tin: 320, Tw: 360, h: 5, D: 3, L: 10, mdot: 0.5, cp: 1050 }, // gas heated by a warmer wall
  ];

  for (const c of cases) {
    it(`matches a fine numerical integration of the gas ODE (T_in ${c.Tin} K, T_w ${c.Tw} K)`, () => {
      // Independent reference: RK4 with 2000 steps (error ~1e-12 K here).
      const ref = integrateIndependently(c.Tin, c.Tw, c.h, c.D, c.L, c.mdot, c.cp, 2000);
      const Tout = gasOutletTemperature(c.Tin, c.Tw, c.h, c.D, c.L, c.mdot, c.cp);
      expect(Math.abs(Tout - ref.Tout)).toBeLessThan(1e-8);
    });

    it(`conserves energy: ṁ c_p ΔT equals ∫ h π D (T − T_w) dz (T_in ${c.Tin} K)`, () => {
      // Independent reference: Simpson quadrature of the RK4 profile; 0.1 % as required by the design,
      // actual agreement is ~1e-10.
      const ref = integrateIndependently(c.Tin, c.Tw, c.h, c.D, c.L, c.mdot, c.cp, 2000);
      const Q = heatToWall(c.Tin, c.Tw, c.h, c.D, c.L, c.mdot, c.cp);
      expect(Math.abs(Q - ref.heat) / Math.abs(ref.heat)).toBeLessThan(1e-3);
      const Tout = gasOutletTemperature(c.Tin, c.Tw, c.h, c.D, c.L, c.mdot, c.cp);
      expect(Q).toBeCloseTo(c.mdot * c.cp * (c.Tin - Tout), 6);
    });
  }

  it('gives the same outlet for one long segment as for many short ones', () => {
    // Analytic: exp(−a) exp(−b) = exp(−(a + b)) at constant wall temperature.
    let T = 800;
    for (let i = 0; i < 10; i++) T = gasOutletTemperature(T, 420, 12, 1.5, 3, 4, 1120);
    expect(T).toBeCloseTo(gasOutletTemperature(800, 420, 12, 1.5, 30, 4, 1120), 9);
  });

  it('reproduces the worked example in the doc comment', () => {
    // Hand calculation: NTU = 10·π·2·5 / (10·1100) = 0.0285599; T_out = 400 + 100·e^(−NTU) = 497.1844 K.
    expect(segmentNtu(10, 2, 5, 10, 1100)).toBeCloseTo(0.0285599, 7);
    expect(gasOutletTemperature(500, 400, 10, 2, 5, 10, 1100)).toBeCloseTo(497.1844, 4);
  });

  it('leaves the gas at the wall temperature with vanishing flow, without NaN', () => {
    for (const mdot of [0, 1e-300, 1e-12]) {
      expect(gasOutletTemperature(600, 400, 10, 2, 5, mdot, 1100)).toBeCloseTo(400, 9);
      const q = heatToWall(600, 400, 10, 2, 5, mdot, 1100);
      expect(Number.isNaN(q)).toBe(false);
      // Limit: Q → ṁ c_p (T_in − T_w) → 0.
      expect(q).toBeCloseTo(mdot * 1100 * 200, 9);
    }
  });

  it('exchanges nothing when the film coefficient is zero, even with zero flow', () => {
    expect(gasOutletTemperature(600, 400, 0, 2, 5, 0, 1100)).toBe(600);
    expect(heatToWall(600, 400, 0, 2, 5, 0, 1100)).toBe(0);
  });

  it('keeps full precision for tiny NTU: Q → h π D Δz (T_in − T_w)', () => {
    // Analytic limit of 1 − e^(−NTU) ≈ NTU for NTU = 1e-10; relative error ~NTU/2.
    const Q = heatToWall(600, 400, 1e-8, 1, 1, 100, 1000);
    expect(Math.abs(Q / (1e-8 * Math.PI * 200) - 1)).toBeLessThan(1e-9);
  });
});
