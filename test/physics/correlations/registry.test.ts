import { describe, it, expect } from 'vitest';
import {
  CORRELATIONS,
  CORRELATION_NAMES,
  callCorrelation,
  checkValidity,
  type CorrelationInputs,
  type CorrelationName,
} from '../../../src/physics/correlations/registry.ts';
import {
  nuCylinderChurchillBernstein,
  nuVerticalPlateChurchillChu,
  slenderCylinderFactorPopiel,
  nuMixedChurchill,
} from '../../../src/physics/correlations/external.ts';
import {
  frictionFactorPetukhov,
  nuPipeGnielinski,
  nuPipeBlended,
  NU_PIPE_LAMINAR_CONSTANT_WALL,
} from '../../../src/physics/correlations/internal.ts';
import { effectiveConductivityRatioAnnulusRaithbyHollands } from '../../../src/physics/correlations/enclosure.ts';
import { nuVerticalCavityElSherbiny } from '../../../src/physics/correlations/cavity.ts';
import { mixedConvectionChurchill } from '../../../src/physics/correlations/internal.ts';
import { gasEmissivityWsgg, WSGG_SMITH_1982 } from '../../../src/physics/correlations/gasRadiation.ts';
import { CorrelationRangeTally, rangeStatus } from '../../../src/physics/correlations/registry.ts';

/** Inputs inside every published range, and the direct call each table entry must reproduce. */
const CASES: { [N in CorrelationName]: { inputs: CorrelationInputs<N>; direct: () => number } } = {
  nuCylinderChurchillBernstein: {
    inputs: { re: 5e4, pr: 0.71 },
    direct: () => nuCylinderChurchillBernstein(5e4, 0.71),
  },
  nuVerticalPlateChurchillChu: {
    inputs: { ra: 1e9, pr: 0.71 },
    direct: () => nuVerticalPlateChurchillChu(1e9, 0.71),
  },
  slenderCylinderFactorPopiel: {
    inputs: { grashofHeight: 1e8, pr: 0.7, height: 2, diameter: 0.05 },
    direct: () => slenderCylinderFactorPopiel(1e8, 0.7, 2, 0.05),
  },
  nuMixedChurchill: {
    inputs: { nuForced: 12, nuNatural: 9 },
    direct: () => nuMixedChurchill(12, 9, 3),
  },
  frictionFactorPetukhov: { inputs: { re: 1e5 }, direct: () => frictionFactorPetukhov(1e5) },
  nuPipeGnielinski: { inputs: { re: 1e5, pr: 0.7 }, direct: () => nuPipeGnielinski(1e5, 0.7) },
  nuPipeLaminarConstantWall: { inputs: { re: 1000 }, direct: () => NU_PIPE_LAMINAR_CONSTANT_WALL },
  nuPipeBlended: { inputs: { re: 5000, pr: 0.7 }, direct: () => nuPipeBlended(5000, 0.7) },
  effectiveConductivityRatioAnnulusRaithbyHollands: {
    inputs: { innerDiameter: 1, outerDiameter: 1.1, rayleighGap: 1e6, pr: 0.7 },
    direct: () => effectiveConductivityRatioAnnulusRaithbyHollands(1, 1.1, 1e6, 0.7),
  },
  nuVerticalCavityElSherbiny: { inputs: { ra: 1e5, aspectRatio: 20 }, direct: () => nuVerticalCavityElSherbiny(1e5, 20) },
  mixedConvectionChurchillSigned: {
    inputs: { forced: 5, natural: 3, aiding: 0 },
    direct: () => mixedConvectionChurchill(5, 3, false),
  },
  gasEmissivityWsggSmith: {
    inputs: { temperature: 1000, pathLength: 0.3, ratio: 2 },
    direct: () => gasEmissivityWsgg(1000, 0.3, 2, WSGG_SMITH_1982),
  },
};

/** Same call, name chosen at run time (as a scenario would). */
function callByName<N extends CorrelationName>(name: N): number {
  return callCorrelation(name, CASES[name].inputs);
}
function validityByName<N extends CorrelationName>(name: N): string | null {
  return checkValidity(name, CASES[name].inputs);
}

describe('CORRELATIONS table', () => {
  it('has a test case for every entry and an entry for every test case', () => {
    expect([...CORRELATION_NAMES].sort()).toEqual(Object.keys(CASES).sort());
  });

  it.each(CORRELATION_NAMES)('%s called by name equals the direct call', (name) => {
    // Exact equality: the table entry must call the very same function with the same arguments.
    expect(callByName(name)).toBe(CASES[name].direct());
  });

  it.each(CORRELATION_NAMES)('%s has a description, a source and ranges on its own inputs', (name) => {
    const e = CORRELATIONS[name];
    expect(e.description.length).toBeGreaterThan(10);
    expect(e.source.length).toBeGreaterThan(10);
    const inputs: readonly string[] = e.inputs;
    for (const key of Object.keys(e.ranges)) expect(inputs).toContain(key);
  });

  it.each(CORRELATION_NAMES)('%s reports no warning for inputs inside its range', (name) => {
    expect(validityByName(name)).toBeNull();
  });
});

describe('checkValidity', () => {
  it('warns (without throwing) when Gnielinski is used in laminar flow', () => {
    const w = checkValidity('nuPipeGnielinski', { re: 1000, pr: 0.7 });
    expect(w).toMatch(/re = 1000 outside \[3000, 5\.00e\+6\]/);
    expect(w).toMatch(/Gnielinski/);
  });

  it('warns when the Prandtl number is outside Gnielinski’s range', () => {
    expect(checkValidity('nuPipeGnielinski', { re: 1e5, pr: 0.01 })).toMatch(/pr = 0.01/);
  });

  it('warns when Re·Pr < 0.2 for Churchill–Bernstein', () => {
    expect(checkValidity('nuCylinderChurchillBernstein', { re: 0.1, pr: 0.7 })).toMatch(/Re·Pr ≥ 0.2/);
  });

  it('warns when a tall stack pushes Churchill–Chu past Ra = 10¹²', () => {
    expect(checkValidity('nuVerticalPlateChurchillChu', { ra: 2.3e14, pr: 0.707 })).toMatch(/ra = /);
  });

  it('warns when the Popiel factor is asked for turbulent flow', () => {
    expect(
      checkValidity('slenderCylinderFactorPopiel', { grashofHeight: 1e12, pr: 0.7, height: 10, diameter: 0.01 }),
    ).toMatch(/laminar/);
  });

  it('warns when the annulus Ra_c exceeds 10⁷ but not below the onset of convection', () => {
    const big = { innerDiameter: 1, outerDiameter: 1.5, rayleighGap: 1e10, pr: 0.7 };
    expect(checkValidity('effectiveConductivityRatioAnnulusRaithbyHollands', big)).toMatch(/Ra_c/);
    const small = { innerDiameter: 1, outerDiameter: 1.1, rayleighGap: 10, pr: 0.7 };
    expect(checkValidity('effectiveConductivityRatioAnnulusRaithbyHollands', small)).toBeNull();
  });

  it('warns when the laminar constant is used above Re = 2300', () => {
    expect(checkValidity('nuPipeLaminarConstantWall', { re: 5000 })).toMatch(/re = 5000/);
  });

  it('reports a NaN input', () => {
    expect(checkValidity('nuPipeBlended', { re: Number.NaN, pr: 0.7 })).toMatch(/not a number/);
  });
});

describe('extrapolation: accepted, or warned with how far and where', () => {
  it('Churchill–Chu above Ra = 1e12 is an accepted extrapolation (the turbulent Ra^(1/3) asymptote), not a warning', () => {
    // common practice for tall stacks: Ra_H ~ 1e14 on every real stack
    expect(rangeStatus('nuVerticalPlateChurchillChu', { ra: 2e14, pr: 0.7 }).kind).toBe('accepted');
    const tally = new CorrelationRangeTally();
    for (let i = 0; i < 10; i++) tally.note('nuVerticalPlateChurchillChu', { ra: 1e13 * (i + 1), pr: 0.7 }, { t: 0, heightM: 5 });
    expect(tally.warnings()).toEqual([]);
    const [line] = tally.assumptions();
    expect(line).toMatch(/Churchill–Chu \(1975\) is used above its published range \(ra > 1\.00e\+12, up to 1\.00e\+14\) at 100 % of the points checked: accepted because/);
  });

  it('an unjustified extrapolation is a warning naming the worst value, by how much, where and how often', () => {
    const tally = new CorrelationRangeTally();
    tally.note('nuPipeGnielinski', { re: 1e5, pr: 0.7 }, { t: 0, heightM: 1 });
    tally.note('nuPipeGnielinski', { re: 2000, pr: 0.7 }, { t: 3600, heightM: 2.5 }); // 33 % below 3000
    tally.note('nuPipeGnielinski', { re: 2700, pr: 0.7 }, { t: 7200, heightM: 4 }); // 10 % below
    const warnings = tally.warnings((p) => `${p.heightM} m, t = ${p.t} s`);
    expect(warnings).toHaveLength(1);
    expect(warnings[0]).toMatch(/Gnielinski \(1976\): re = 2000 below its published range \[3000, 5\.00e\+6\] \(by 33 %\) at 2\.5 m, t = 3600 s; beyond its range at 67 % of the points checked/);
    expect(tally.assumptions()).toEqual([]);
  });

  it('stays silent inside the range', () => {
    const tally = new CorrelationRangeTally();
    tally.note('nuCylinderChurchillBernstein', { re: 5e4, pr: 0.71 });
    expect(tally.warnings()).toEqual([]);
    expect(tally.assumptions()).toEqual([]);
    expect(tally.counts('nuCylinderChurchillBernstein')).toEqual({ checked: 1, accepted: 0, outside: 0 });
  });
});
