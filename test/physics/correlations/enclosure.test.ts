import { describe, it, expect } from 'vitest';
import {
  effectiveConductivityRatioAnnulusRaithbyHollands,
  rayleighAnnulusRaithbyHollands,
} from '../../../src/physics/correlations/enclosure.ts';

describe('rayleighAnnulusRaithbyHollands', () => {
  it('matches the modified Rayleigh number worked by hand for a 1.0/1.1 m annulus', () => {
    // Raithby & Hollands (1975), Incropera eq. 9.60: L = 0.05 m, [ln 1.1]⁴ = 8.25196e-5,
    // (1 + 1.1^−0.6)⁵ = (1.944418)⁵ = 27.7953; Ra_c = 8.25196e-5·10⁶/(1.25e-4·27.7953) = 23751.
    // Tolerance 1e-4 relative: six-figure hand arithmetic.
    expect(Math.abs(rayleighAnnulusRaithbyHollands(1, 1.1, 1e6) / 23751 - 1)).toBeLessThan(1e-4);
  });
});

describe('effectiveConductivityRatioAnnulusRaithbyHollands', () => {
  it('matches the published correlation worked by hand', () => {
    // k_eff/k = 0.386 (Pr/(0.861 + Pr))^¼ Ra_c^¼ (Incropera eq. 9.58): (0.7/1.561)^¼ = 0.818321,
    // 23751^¼ = 12.4142; 0.386·0.818321·12.4142 = 3.92131. Tolerance 5e-4: hand arithmetic.
    expect(effectiveConductivityRatioAnnulusRaithbyHollands(1, 1.1, 1e6, 0.7)).toBeCloseTo(3.9213, 3);
  });

  it('scales with Ra^¼ in the convective regime', () => {
    // 16× Ra → 2× k_eff/k exactly (power law of the correlation). Tolerance: round-off.
    const a = effectiveConductivityRatioAnnulusRaithbyHollands(1, 1.1, 1e6, 0.7);
    const b = effectiveConductivityRatioAnnulusRaithbyHollands(1, 1.1, 16e6, 0.7);
    expect(b / a).toBeCloseTo(2, 12);
  });

  it('falls back to pure conduction (ratio 1) below the onset and at Ra = 0', () => {
    // Raithby & Hollands: k_eff/k < 1 has no meaning; conduction governs.
    expect(effectiveConductivityRatioAnnulusRaithbyHollands(1, 1.1, 0, 0.7)).toBe(1);
    // Ra_L = 100 → Ra_c ≈ 2.4 → 0.386·0.818·1.24 ≈ 0.39 < 1.
    expect(effectiveConductivityRatioAnnulusRaithbyHollands(1, 1.1, 100, 0.7)).toBe(1);
  });

  it('treats a negative Rayleigh number (outer surface hotter) like its magnitude', () => {
    expect(effectiveConductivityRatioAnnulusRaithbyHollands(1, 1.1, -1e6, 0.7)).toBe(
      effectiveConductivityRatioAnnulusRaithbyHollands(1, 1.1, 1e6, 0.7),
    );
  });
});
