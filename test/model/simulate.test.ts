/**
 * The wall model end to end against analytic solutions: the steady layered cylinder (series
 * resistances), the periodic solution for a semi-infinite solid under a sinusoidal surface
 * temperature (Carslaw & Jaeger), the lumped-capacitance exponential, mesh convergence, and the
 * two integrators against each other. Energy closure is checked on every run.
 */
import { describe, it, expect } from 'vitest';
import { simulate } from '../../src/model/simulate.ts';
import type { RunResult } from '../../src/model/timeseries.ts';
import { baseInputs, constantMaterial, layer, airSource, fixedFilmInputs } from './fixtures.ts';

const DAY = 86400;

function expectEnergyClosed(r: RunResult) {
  // docs/model.md "Time integration": heat from the gas = stored + lost outside; issue: residual below 0.1 %
  expect(Math.abs(r.energy.run.residualPercent)).toBeLessThan(0.1);
}

/** Temperature of node i in segment 0 at output instant k. */
const temp = (r: RunResult, k: number, i: number) => r.series.temperatureK[(k * r.series.segments) * r.series.nodes + i]!;

describe('steady layered cylinder with fixed film coefficients', () => {
  // Exact solution: series resistances per metre of height (e.g. Incropera & DeWitt, Fundamentals of
  // Heat and Mass Transfer, §3.3.1, eq. 3.33: R = ln(r2/r1)/(2πk); films 1/(2πr h); contact R''/(2πr)).
  const liner = constantMaterial('liner', 1.2, 2100, 900);
  const insulation = constantMaterial('insulation', 0.07, 250, 900);
  const shell = constantMaterial('shell', 45, 7850, 480);
  const ri = 1.0;
  const t = [0.115, 0.075, 0.006];
  const k = [1.2, 0.07, 45];
  const contact = 0.002; // m² K / W between insulation and shell
  const hIn = 20;
  const hOut = 12;
  const tGas = 473.15;
  const tAir = 283.15;

  it('matches the series-resistance heat flow within 0.1 % and interface temperatures within 0.05 K', () => {
    const inputs = fixedFilmInputs({ layers: [layer(liner, t[0]!, 6), layer(insulation, t[1]!, 6, contact), layer(shell, t[2]!, 2)], hIn, hOut, gasK: tGas, airK: tAir });
    const r = simulate(inputs);
    const radii = [ri, ri + t[0]!, ri + t[0]! + t[1]!, ri + t[0]! + t[1]! + t[2]!];
    const R = [
      1 / (2 * Math.PI * ri * hIn),
      Math.log(radii[1]! / radii[0]!) / (2 * Math.PI * k[0]!),
      Math.log(radii[2]! / radii[1]!) / (2 * Math.PI * k[1]!),
      contact / (2 * Math.PI * radii[2]!),
      Math.log(radii[3]! / radii[2]!) / (2 * Math.PI * k[2]!),
      1 / (2 * Math.PI * radii[3]! * hOut),
    ];
    const q = (tGas - tAir) / R.reduce((a, b) => a + b, 0); // W per metre
    const kLast = r.series.t.length - 1;
    const qModel = r.series.segment.gasToWallPerMetre[kLast]!;
    expect(Math.abs(qModel - q) / q).toBeLessThan(1e-3);
    // expected surface and interface temperatures, marching out through the resistances
    const expected: Record<string, number> = {};
    let tt = tGas - q * R[0]!;
    expected.inner_surface = tt;
    tt -= q * R[1]!;
    expected.interface_1 = tt;
    tt -= q * R[2]!;
    expected.interface_2_in = tt;
    tt -= q * R[3]!;
    expected.interface_2_out = tt;
    tt -= q * R[4]!;
    expected.outer_surface = tt;
    for (const [label, value] of Object.entries(expected)) {
      const i = r.series.nodeLabel.indexOf(label);
      expect(i, label).toBeGreaterThanOrEqual(0);
      expect(Math.abs(temp(r, kLast, i) - value), label).toBeLessThan(0.05);
    }
    expectEnergyClosed(r);
  });
});

describe('sinusoidal surface temperature on a thick wall', () => {
  // Carslaw & Jaeger, Conduction of Heat in Solids (2nd ed., 1959), §2.6 eq. (6): for a surface
  // temperature A cos(ωt), T(x, t) = A e^{−x/δ} cos(ωt − x/δ) with δ = √(2κ/ω).
  // A very large outside film makes the surface follow the air; a large radius and a wall of ~9 δ
  // make the cylinder behave as a semi-infinite solid (curvature changes the amplitude by < 1 %
  // over the first 0.3 m: factor √(r_o/r) ≈ 1.007).
  const k = 1.4;
  const rho = 2300;
  const cp = 880;
  const kappa = k / (rho * cp);
  const omega = (2 * Math.PI) / DAY;
  const delta = Math.sqrt((2 * kappa) / omega);
  const mean = 288.15;
  const amp = 8;
  const phase0 = 14 * 3600; // air maximum at 14:00
  const wall = constantMaterial('concrete-like', k, rho, cp);
  const startUtc = Date.UTC(2026, 2, 20);

  function periodicRun(cells: number, integrator: 'implicit' | 'rk45' = 'implicit') {
    return simulate(
      baseInputs({
        layers: [layer(wall, 1.2, cells)],
        stack: { height: 10, innerDiameter: 40, segments: 1 },
        outside: { filmCoefficient: 1e5, radiation: { kind: 'none' }, sun: false },
        weather: { kind: 'source', source: airSource((utc) => mean + amp * Math.cos(omega * ((utc - startUtc) / 1000 - phase0))) },
        flue: { ...baseInputs({ layers: [] }).flue, filmCoefficient: 1e-9 },
        run: { mode: 'cycle', length: { kind: 'until-periodic', toleranceK: 1e-3, maxDays: 30 }, outputInterval: 600, initial: 'steady-daily-mean', integrator, rtol: 1e-7, atol: 1e-5 },
      }),
    );
  }

  /** First-harmonic amplitude and time of maximum of node i over the recorded day. */
  function harmonic(r: RunResult, i: number) {
    const K = r.series.t.length - 1; // the last instant repeats the first (end of day)
    let a = 0;
    let b = 0;
    for (let k = 0; k < K; k++) {
      const th = omega * r.series.t[k]!;
      a += temp(r, k, i) * Math.cos(th);
      b += temp(r, k, i) * Math.sin(th);
    }
    a *= 2 / K;
    b *= 2 / K;
    const amplitude = Math.hypot(a, b);
    let tMax = Math.atan2(b, a) / omega;
    if (tMax < 0) tMax += DAY;
    return { amplitude, tMax };
  }

  it('reaches the periodic state and reproduces amplitude (2 %) and phase (10 min) at several depths', () => {
    const cells = 120; // 1 cm cells, δ/14
    const r = periodicRun(cells);
    expect(r.periodic?.reached).toBe(true);
    const outer = r.series.nodes - 1;
    const ro = r.series.nodeRadius[outer]!;
    for (const depth of [0, 0.05, 0.1, 0.2, 0.3]) {
      const i = outer - Math.round(depth / 0.01);
      const x = ro - r.series.nodeRadius[i]!;
      const h = harmonic(r, i);
      const expectedAmp = amp * Math.exp(-x / delta);
      let expectedT = phase0 + x / delta / omega;
      expectedT %= DAY;
      expect(Math.abs(h.amplitude - expectedAmp) / expectedAmp, `amplitude at ${x} m`).toBeLessThan(0.02);
      let dt = Math.abs(h.tMax - expectedT);
      dt = Math.min(dt, DAY - dt);
      expect(dt, `phase at ${x} m`).toBeLessThan(600);
    }
    expectEnergyClosed(r);
  });

  it('converges at second order under mesh refinement', () => {
    // Self-convergence (the observed order from three meshes, as in Roache, Verification and
    // Validation in Computational Science and Engineering, 1998): p = log2(|u_h − u_h/2| / |u_h/2 − u_h/4|)
    // at a node present in all three meshes, 0.1 m below the surface, at the settled 18:00 instant.
    const values = [10, 20, 40].map((cells) => {
      const r = periodicRun(cells * 1.2);
      const outer = r.series.nodes - 1;
      const i = outer - Math.round((0.1 * cells * 1.2) / 1.2);
      const k = r.series.t.findIndex((t) => Math.abs(t - 18 * 3600) < 1);
      return temp(r, k, i);
    });
    const p = Math.log2(Math.abs(values[0]! - values[1]!) / Math.abs(values[1]! - values[2]!));
    // second-order scheme: p ≈ 2; the band allows for time-integration noise at the finest mesh
    expect(p).toBeGreaterThan(1.7);
    expect(p).toBeLessThan(2.4);
  });
});

describe('thin steel wall heated from inside', () => {
  // Lumped capacitance (Incropera & DeWitt §5.2, eq. 5.6): ρ c V dT/dt = h A (T_g − T), so
  // T = T_g − (T_g − T_i) e^{−t/τ}, τ = ρ c (r_o² − r_i²) / (2 r_i h). Biot h t / k = 20·0.003/45 ≈ 1e-3.
  it('follows the lumped-capacitance exponential', () => {
    const steel = constantMaterial('steel', 45, 7850, 480);
    const ri = 1;
    const thickness = 0.003;
    const hIn = 20;
    const tGas = 473.15;
    const tInit = 293.15;
    const r = simulate(
      fixedFilmInputs({
        layers: [layer(steel, thickness, 2)],
        hIn,
        hOut: 1e-9, // outside practically adiabatic
        gasK: tGas,
        airK: tInit,
        run: { mode: 'cycle', length: { kind: 'days', days: 1 }, outputInterval: 300, initial: 'cold', integrator: 'implicit', rtol: 1e-7, atol: 1e-5 },
      }),
    );
    const ro = ri + thickness;
    const tau = (7850 * 480 * (ro * ro - ri * ri)) / (2 * ri * hIn);
    for (let k = 0; k < r.series.t.length; k += 12) {
      const t = r.series.t[k]!;
      const exact = tGas - (tGas - tInit) * Math.exp(-t / tau);
      // within 0.1 K: the wall's internal gradient (Bi ≈ 1e-3 of 180 K) is about 0.2 K across it; the mean node is compared
      const mean = (temp(r, k, 0) + 2 * temp(r, k, 1) + temp(r, k, 2)) / 4;
      expect(Math.abs(mean - exact), `t = ${t}`).toBeLessThan(0.1);
    }
    expectEnergyClosed(r);
  });
});

describe('integrators agree', () => {
  it('TR-BDF2 and Dormand–Prince give the same day within 0.05 K', () => {
    const brick = constantMaterial('brick', 0.72, 1920, 835);
    const insulation = constantMaterial('insulation', 0.06, 200, 900);
    const make = (integrator: 'implicit' | 'rk45') =>
      simulate(
        baseInputs({
          layers: [layer(brick, 0.1, 5), layer(insulation, 0.05, 3), layer(brick, 0.1, 5)],
          stack: { height: 20, innerDiameter: 1, segments: 3 },
          weather: { kind: 'source', source: airSource((utc) => 288 + 6 * Math.sin((2 * Math.PI * utc) / 864e5)) },
          flue: {
            ...baseInputs({ layers: [] }).flue,
            filmCoefficient: undefined,
            gasCooling: true,
            schedule: { daily: [{ clockS: 0, inletTemperatureK: 400, massFlow: 0.5 }, { clockS: 6 * 3600, inletTemperatureK: 400, massFlow: 0.5 }, { clockS: 7 * 3600, inletTemperatureK: 500, massFlow: 1.5 }] },
          },
          run: { mode: 'cycle', length: { kind: 'days', days: 1 }, outputInterval: 1800, initial: 'steady-at-start', integrator, rtol: 1e-7, atol: 1e-5 },
        }),
      );
    const a = make('implicit');
    const b = make('rk45');
    let worst = 0;
    for (let j = 0; j < a.series.temperatureK.length; j++) worst = Math.max(worst, Math.abs(a.series.temperatureK[j]! - b.series.temperatureK[j]!));
    expect(worst).toBeLessThan(0.05);
    expectEnergyClosed(a);
    expectEnergyClosed(b);
  });
});
