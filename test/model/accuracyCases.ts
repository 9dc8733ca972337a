/**
 * The two cases the accuracy checks of issue 10 name, and what they are measured against:
 *
 * - a three-layer wall (dense castable, mineral wool, carbon steel; library materials) under a
 *   one-hour firing ramp, against a reference the project's own solver converges to by refining
 *   mesh and tolerances together until two successive refinements agree to 0.005 K;
 * - a thick slab (a cylinder of 1 km radius) under a step of gas temperature, against the
 *   error-function solution for a semi-infinite solid with surface heat transfer (Carslaw & Jaeger,
 *   Conduction of Heat in Solids, 2nd ed. 1959, §2.7, eq. (1)) at early times.
 *
 * Invented test data.
 */
import { findMaterial } from '../../src/physics/materials/index.ts';
import { simulate, type SolveRefinement } from '../../src/model/simulate.ts';
import { largestSurfaceDifference } from '../../src/analysis/metrics/accuracy.ts';
import type { ModelInputs, RunInput } from '../../src/model/inputs.ts';
import type { RunResult } from '../../src/model/timeseries.ts';
import { DEFAULT_RELATIVE_TOLERANCE, DEFAULT_ABSOLUTE_TOLERANCE_K } from '../../src/input/scenario/schema.ts';
import { baseInputs, constantMaterial, layer, airSource } from './fixtures.ts';

const C = 273.15;
/** The scenario defaults (src/input/scenario/schema.ts), for inputs built in code. */
const DEFAULTS = { rtol: DEFAULT_RELATIVE_TOLERANCE, atol: DEFAULT_ABSOLUTE_TOLERANCE_K };

/**
 * Three-layer wall, one segment: 120 mm dense castable, 100 mm mineral wool, 6 mm carbon steel on a
 * 2 m flue. Idle at 40 °C with the natural-draft floor until 06:00, a one-hour ramp to 350 °C and
 * 4 kg/s, then firing to midnight; the Gnielinski film inside, correlations and sky radiation
 * outside (no sun, steady air at 5 °C, 4 m/s); fuel-oil flue gas with SO₃ (acid dew point near
 * 145 °C). One day from the steady state at the idle conditions; output every 10 min. With
 * `warmup`, the same ramp lights a cold wall (at the air's 5 °C) at 06:00 and firing goes on until
 * 06:00 the next day (the warm-up firing is then a step of 35 K, which the mesh resolves as such).
 */
export function threeLayerRamp(run: Partial<RunInput> = {}, warmup = false): ModelInputs {
  const base = baseInputs({
    layers: [layer(findMaterial('dense-castable')!, 0.12), layer(findMaterial('mineral-wool')!, 0.1), layer(findMaterial('carbon-steel')!, 0.006)],
  });
  return {
    ...base,
    stack: { height: 30, innerDiameter: 2, segments: 1 },
    outside: { radiation: { kind: 'sky-ground', sky: 'berdahl-martin' }, sun: false },
    weather: { kind: 'source', source: airSource(() => C + 5, 4) },
    flue: {
      ...base.flue,
      composition: { N2: 0.74, O2: 0.035, CO2: 0.115, H2O: 0.11, SO2: 0.0009, SO3: 0.00002 },
      filmCoefficient: undefined,
      offMassFlow: 0.2,
      schedule: {
        daily: [
          { clockS: 0, inletTemperatureK: C + (warmup ? 350 : 40), massFlow: warmup ? 4 : 0 },
          { clockS: 6 * 3600, inletTemperatureK: C + (warmup ? 350 : 40), massFlow: warmup ? 4 : 0 },
          ...(warmup ? [{ clockS: 6 * 3600, inletTemperatureK: C + 40, massFlow: 0 }] : []),
          { clockS: 7 * 3600, inletTemperatureK: C + 350, massFlow: 4 },
          { clockS: 24 * 3600, inletTemperatureK: C + 350, massFlow: 4 },
        ],
      },
    },
    run: {
      ...base.run,
      ...(warmup ? { mode: 'warmup' as const, firingStartClockS: 6 * 3600, initial: 'cold' as const } : { mode: 'cycle' as const, initial: 'steady-at-start' as const }),
      outputInterval: 600,
      rtol: DEFAULTS.rtol,
      atol: DEFAULTS.atol,
      ...run,
    },
  };
}


/** A reference by successive refinement: each level cuts every cell in two and divides the tolerances by 8, until two levels agree. */
export interface Reference {
  readonly result: RunResult;
  readonly refinement: SolveRefinement;
  /** Largest difference between the last two levels, K. */
  readonly agreementK: number;
}

/**
 * Refine `inputs` (mesh × 2, tolerances ÷ 8 per level: the time error of the second-order
 * integrator then falls about as fast as the mesh error, ÷ 4) from `start` until two successive
 * levels agree within `agreeK` at every surface and interface and instant.
 */
export function convergedReference(inputs: ModelInputs, agreeK = 0.005, start: SolveRefinement = { mesh: 2, tolerance: 8 }, maxLevels = 5): Reference {
  let refinement = start;
  let previous = simulate(inputs, { refinement });
  for (let level = 1; level < maxLevels; level++) {
    const next = { mesh: refinement.mesh * 2, tolerance: refinement.tolerance * 8 };
    const result = simulate(inputs, { refinement: next });
    const agreementK = largestSurfaceDifference(inputs, previous, result);
    refinement = next;
    if (agreementK < agreeK) return { result, refinement, agreementK };
    previous = result;
  }
  throw new Error(`no reference within ${maxLevels} levels`);
}

/**
 * erfc(x)·exp(x²) for x ≥ 0, fractional error below 1.2e-7 (the Chebyshev fit `erfcc` of Press,
 * Teukolsky, Vetterling & Flannery, Numerical Recipes in C, 2nd ed. 1992, §6.2, without its exp(−x²)).
 */
export function erfcx(x: number): number {
  const t = 1 / (1 + 0.5 * x);
  return (
    t *
    Math.exp(
      -1.26551223 +
        t * (1.00002368 + t * (0.37409196 + t * (0.09678418 + t * (-0.18628806 + t * (0.27886807 + t * (-1.13520398 + t * (1.48851587 + t * (-0.82215223 + t * 0.17087277)))))))),
    )
  );
}

/**
 * Temperature rise over the initial temperature, as a fraction of the step of the surroundings, at
 * depth x (m) and time t (s) in a semi-infinite solid of diffusivity κ (m²/s) with surface heat
 * transfer h/k (1/m): erfc(u) − exp(hx/k + h²κt/k²) erfc(u + (h/k)√(κt)), u = x / (2√(κt))
 * (Carslaw & Jaeger 1959, §2.7, eq. (1)), written with erfcx so that nothing overflows.
 */
export function stepResponseWithSurfaceTransfer(x: number, t: number, kappa: number, hOverK: number): number {
  const u = x / (2 * Math.sqrt(kappa * t));
  const v = u + hOverK * Math.sqrt(kappa * t);
  return Math.exp(-u * u) * (erfcx(u) - erfcx(v));
}

/** The slab: 2 m of a concrete-like solid (semi-infinite for a day: erfc(2 m / (2√(κ·1 d))) < 1e-8) on a flue of 1 km radius, the gas stepping from 20 °C to 320 °C at 00:00. */
export const SLAB = { conductivity: 1.4, density: 2300, specificHeat: 880, thickness: 2, innerRadius: 1000, filmInside: 40, initialK: C + 20, gasK: C + 320 };

/** The slab case as a warm-up from a cold wall (the step), with no heat loss outside over the hours compared. */
export function slabStep(run: Partial<RunInput> = {}): ModelInputs {
  const m = constantMaterial('slab', SLAB.conductivity, SLAB.density, SLAB.specificHeat);
  const base = baseInputs({ layers: [layer(m, SLAB.thickness)] });
  return {
    ...base,
    stack: { height: 10, innerDiameter: 2 * SLAB.innerRadius, segments: 1 },
    outside: { filmCoefficient: 5, radiation: { kind: 'none' }, sun: false },
    weather: { kind: 'source', source: airSource(() => SLAB.initialK) },
    flue: { ...base.flue, filmCoefficient: SLAB.filmInside, schedule: { daily: [{ clockS: 0, inletTemperatureK: SLAB.gasK, massFlow: 1 }] } },
    run: {
      ...base.run,
      mode: 'warmup',
      firingStartClockS: 0,
      initial: 'cold',
      length: { kind: 'days', days: 1 },
      outputInterval: 600,
      rtol: DEFAULTS.rtol,
      atol: DEFAULTS.atol,
      ...run,
    },
  };
}

/** Largest difference from the error-function solution of any node within `depthM` of the flue side, over the instants up to `untilS`, K. */
export function slabError(r: RunResult, untilS: number, depthM: number): number {
  const kappa = SLAB.conductivity / (SLAB.density * SLAB.specificHeat);
  const hOverK = SLAB.filmInside / SLAB.conductivity;
  let worst = 0;
  const r0 = r.series.nodeRadius[0]!;
  for (let k = 1; k < r.series.t.length; k++) {
    const t = r.series.t[k]! - r.series.t[0]!;
    if (t > untilS) break;
    for (let i = 0; i < r.series.nodes; i++) {
      const x = r.series.nodeRadius[i]! - r0;
      if (x > depthM) break;
      const exact = SLAB.initialK + (SLAB.gasK - SLAB.initialK) * stepResponseWithSurfaceTransfer(x, t, kappa, hOverK);
      worst = Math.max(worst, Math.abs(r.series.temperatureK[k * r.series.nodes + i]! - exact));
    }
  }
  return worst;
}
