import { describe, it, expect } from 'vitest';
import {
  frictionFactorPetukhov,
  nuPipeGnielinski,
  nuPipeBlended,
  NU_PIPE_LAMINAR_CONSTANT_WALL,
  naturalConvectionLiningCoefficient,
  mixedConvectionChurchill,
  isBuoyancyAidingUpwardFlow,
} from '../../../src/physics/correlations/internal.ts';
import { makeAirGasPropertyLookup } from '../../../src/physics/properties/airGasLookup.ts';

describe('frictionFactorPetukhov', () => {
  it('matches the formula worked by hand at Re = 10⁴', () => {
    // Petukhov (1970): ln 10⁴ = 9.210340, 0.790·9.210340 − 1.64 = 5.636169, f = 1/5.636169² = 0.0314798.
    // Tolerance 5e-7: seven-figure hand arithmetic.
    expect(frictionFactorPetukhov(1e4)).toBeCloseTo(0.0314798, 6);
  });

  it('agrees with the Blasius smooth-pipe law within 1 % at Re = 10⁴', () => {
    // Blasius (1913): f = 0.316 Re^−¼ = 0.0316 at Re = 10⁴ (independent correlation, valid to 10⁵).
    // Tolerance 1 %: the two fits to smooth-pipe data differ by about 0.4 % here.
    expect(Math.abs(frictionFactorPetukhov(1e4) / 0.0316 - 1)).toBeLessThan(0.01);
  });
});

describe('nuPipeGnielinski', () => {
  it('matches the formula worked by hand at Re = 10⁵, Pr = 0.7', () => {
    // Gnielinski (1976) with Petukhov f: ln 10⁵ = 11.512925, bracket = 7.455211, f = 0.0179920,
    // f/8 = 0.00224900; numerator = 0.002249·99000·0.7 = 155.8559;
    // 0.7^⅔ − 1 = −0.2116265; denominator = 1 + 12.7·√0.002249·(−0.2116265) = 0.8725415;
    // Nu = 155.8559/0.8725415 = 178.6230. Tolerance 1e-3: seven-figure hand arithmetic.
    expect(nuPipeGnielinski(1e5, 0.7)).toBeCloseTo(178.623, 3);
  });

  it('agrees with Dittus–Boelter within 15 % for heated gas at Re = 10⁵', () => {
    // Dittus–Boelter (heating, n = 0.4): 0.023·10⁵^0.8·0.7^0.4 = 199.42 (Incropera eq. 8.60).
    // Tolerance 15 %: the textbooks quote errors up to 25 % for Dittus–Boelter and about 10 % for
    // Gnielinski; they differ by about 10 % here.
    expect(Math.abs(nuPipeGnielinski(1e5, 0.7) / 199.42 - 1)).toBeLessThan(0.15);
  });

  it('uses a supplied friction factor instead of Petukhov', () => {
    // With f = 0.02 at Re = 10⁵, Pr = 1: Pr^⅔ − 1 = 0 → Nu = (0.02/8)·99000·1 = 247.5 exactly.
    expect(nuPipeGnielinski(1e5, 1, 0.02)).toBeCloseTo(247.5, 9);
    expect(nuPipeGnielinski(1e5, 0.7, frictionFactorPetukhov(1e5))).toBe(nuPipeGnielinski(1e5, 0.7));
  });
});

describe('nuPipeBlended', () => {
  it('gives the laminar constant-wall value 3.66 up to Re = 2300', () => {
    // Graetz solution, Nu = 3.66 (Incropera eq. 8.55).
    expect(NU_PIPE_LAMINAR_CONSTANT_WALL).toBe(3.66);
    for (const re of [0, 1, 7.98, 100, 2000, 2300]) expect(nuPipeBlended(re, 0.7)).toBe(3.66);
  });

  it('equals Gnielinski from Re = 10⁴ upward', () => {
    for (const re of [1e4, 5e4, 1e6]) expect(nuPipeBlended(re, 0.7)).toBe(nuPipeGnielinski(re, 0.7));
  });

  it('interpolates linearly in Re between 2300 and 10⁴ (Gnielinski 2013)', () => {
    // Midpoint Re = 6150 (γ = ½): (3.66 + Nu_G(10⁴, 0.7))/2; Nu_G(10⁴, 0.7) by hand = 29.8174
    // (f = 0.0314798, f/8 = 0.00393497, num = 24.7903, den = 1 + 12.7·0.0627294·(−0.2116265) = 0.831404),
    // → 16.7387. Tolerance 1e-3: hand arithmetic.
    expect(nuPipeBlended(6150, 0.7)).toBeCloseTo(16.7387, 3);
  });

  it('is continuous across both ends of the transition', () => {
    // A jump would show as a difference not shrinking with ε; with ε = 10⁻⁶ in Re the slope
    // (≤ 0.004 per unit Re here) allows at most ~1e-8.
    const eps = 1e-6;
    for (const pr of [0.7, 1, 5]) {
      expect(Math.abs(nuPipeBlended(2300 + eps, pr) - nuPipeBlended(2300 - eps, pr))).toBeLessThan(1e-7);
      expect(Math.abs(nuPipeBlended(1e4 + eps, pr) - nuPipeBlended(1e4 - eps, pr))).toBeLessThan(1e-7);
    }
  });

  it('never decreases with Re through the transition for gases', () => {
    let previous = 0;
    for (let re = 0; re <= 2e4; re += 50) {
      const nu = nuPipeBlended(re, 0.7);
      expect(nu).toBeGreaterThanOrEqual(previous);
      previous = nu;
    }
  });

  it('never returns NaN for Re ≥ 0', () => {
    for (const re of [0, 1e-9, 7.98, 2300, 2300.0001, 3000, 9999.999, 1e4, 5e6, 1e8]) {
      expect(Number.isNaN(nuPipeBlended(re, 0.7))).toBe(false);
    }
  });
});

describe('natural convection on the flue lining and its combination with the forced flow', () => {
  // A 1.4 m flue, 60 m tall, gas 200 °C, lining 150 °C, air properties from the outside air table
  // (Incropera Table A.4, from memory) at 1 atm.
  const D = 1.4;
  const H = 60;
  const gasK = 473.15;
  const wallK = 423.15;
  const air = makeAirGasPropertyLookup(101325);
  const bulk = air(gasK);
  const hForced = (massFlow: number) => {
    const re = (4 * massFlow) / (Math.PI * D * bulk.dynamicViscosity);
    return (nuPipeBlended(re, bulk.prandtl) * bulk.conductivity) / D;
  };
  const natural = naturalConvectionLiningCoefficient(wallK, gasK, H, air((wallK + gasK) / 2));

  it('gives about 3.6 W/(m² K) on a 60 m lining at 50 K, as a hand computation does', () => {
    // Hand computation (independent script): film 448.15 K, Table A.4 between 400 and 450 K →
    // k 0.0371705, μ 2.499378e-5, cp 1020.741, Pr 0.686355; ρ = 101325/(287.0500·448.15) = 0.787632;
    // ν = 3.173280e-5; Ra = 9.80665·50·60³·0.686355/(448.15·ν²) = 1.610844e14;
    // Nu = {0.825 + 0.387 Ra^(1/6)/[1 + (0.492/Pr)^(9/16)]^(8/27)}² = 5822.79; h = Nu k / L = 3.60727.
    // Tolerance 1e-5 relative: double-precision script, table rows exact.
    expect(Math.abs(natural.rayleigh / 1.610844e14 - 1)).toBeLessThan(1e-5);
    expect(Math.abs(natural.h / 3.607266 - 1)).toBeLessThan(1e-5);
  });

  it('is about ten times the forced film of a low-fire 0.15 kg/s flow, which it then sets', () => {
    // Forced: Re = 4·0.15/(π·1.4·2.596822e-5) = 5253 → blend 13.5685 → h_F = 0.376760 W/(m² K)
    // (hand script as above, bulk 473.15 K). Tolerance 1e-5 relative.
    const hF = hForced(0.15);
    expect(Math.abs(hF / 0.376760 - 1)).toBeLessThan(1e-5);
    expect(natural.h / hF).toBeGreaterThan(9);
    // Combined, the natural film sets the value: within 0.1 % of h_N either way (hand: 3.60864
    // aiding, 3.60590 opposing).
    expect(Math.abs(mixedConvectionChurchill(hF, natural.h, true) / 3.608635 - 1)).toBeLessThan(1e-5);
    expect(Math.abs(mixedConvectionChurchill(hF, natural.h, false) / 3.605895 - 1)).toBeLessThan(1e-5);
  });

  it('returns the natural value exactly with no forced flow, and the forced value with no ΔT', () => {
    expect(mixedConvectionChurchill(0, natural.h, true)).toBe(natural.h);
    expect(mixedConvectionChurchill(0, natural.h, false)).toBe(natural.h);
    const none = naturalConvectionLiningCoefficient(450, 450, H, air(450));
    expect(none).toEqual({ h: 0, rayleigh: 0, nusselt: 0 });
    expect(mixedConvectionChurchill(5.3, none.h, false)).toBe(5.3);
  });

  it('leaves the forced value dominant at full fire (3.2 kg/s)', () => {
    // Forced: Re = 112 070 → Gnielinski 192.571 → h_F = 5.34717 W/(m² K) (hand script).
    // Combined: aiding (5.34717³ + 3.60727³)^(1/3) = 5.84635; opposing (… − …)^(1/3) = 4.73186.
    // Tolerance 1e-5 relative.
    const hF = hForced(3.2);
    expect(Math.abs(hF / 5.347172 - 1)).toBeLessThan(1e-5);
    expect(hF).toBeGreaterThan(natural.h);
    expect(Math.abs(mixedConvectionChurchill(hF, natural.h, true) / 5.846346 - 1)).toBeLessThan(1e-5);
    expect(Math.abs(mixedConvectionChurchill(hF, natural.h, false) / 4.731858 - 1)).toBeLessThan(1e-5);
  });

  it('hardly depends on the length in the turbulent range (stack against segment height)', () => {
    // Hand script: a 5 m segment gives Ra = 9.32e10, Nu = 511.43, h = 3.80203 W/(m² K), 5 % above
    // the 60 m value. Tolerance 1e-5 relative.
    const segment = naturalConvectionLiningCoefficient(wallK, gasK, 5, air((wallK + gasK) / 2));
    expect(Math.abs(segment.h / 3.802027 - 1)).toBeLessThan(1e-5);
  });

  it('is symmetric in the sign of ΔT, and says which way buoyancy acts on the upward flow', () => {
    const reversed = naturalConvectionLiningCoefficient(gasK, wallK, H, air((wallK + gasK) / 2));
    expect(reversed.h).toBe(natural.h);
    expect(isBuoyancyAidingUpwardFlow(480, 450)).toBe(true); // warm lining, cooler gas: aiding
    expect(isBuoyancyAidingUpwardFlow(420, 470)).toBe(false); // firing: gas hotter, opposing
  });

  it('never goes negative or NaN, and aiding never falls below the larger part', () => {
    for (const [f, n] of [[1, 1], [2, 1], [1, 2], [0, 0], [1e-300, 1e-300], [1e200, 1], [3, 1e200]]) {
      const a = mixedConvectionChurchill(f, n, true);
      const o = mixedConvectionChurchill(f, n, false);
      expect(Number.isNaN(a) || Number.isNaN(o)).toBe(false);
      expect(o).toBeGreaterThanOrEqual(0);
      expect(a).toBeGreaterThanOrEqual(Math.max(f, n));
      expect(o).toBeLessThanOrEqual(Math.max(f, n));
    }
    // Equal parts in opposing flow: the published rule gives 0 (see MIXED_CONVECTION_RANGE).
    expect(mixedConvectionChurchill(2, 2, false)).toBe(0);
  });
});
