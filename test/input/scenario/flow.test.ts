/**
 * Can the flue carry the scheduled flow? Beyond what a flue carries (60 m/s, Mach 0.3) a scenario is
 * bad input; above the usual design velocities (30 m/s) it runs with a warning.
 */
import { describe, it, expect } from 'vitest';
import { validateModelInputs } from '../../../src/input/scenario/validate.ts';
import { demoScenario, problemsOf } from './helpers.ts';
import { runScenario } from '../../../src/index.ts';

const demo = () => {
  const s = demoScenario();
  s.run.output_interval = 30;
  s.stack.segments = 4;
  return s;
};
/** The demo with the full-firing flow (points 2 and 3 of the daily schedule) set to `flow`. */
const firing = (flow: number | string, edit: (s: any) => void = () => {}) => {
  const s = demo();
  s.flue.schedule.daily[2].mass_flow = flow;
  s.flue.schedule.daily[3].mass_flow = flow;
  edit(s);
  return s;
};

// Hand figures for the demo's full firing, 205 °C (478.15 K): heavy-fuel-oil flue gas with 20 %
// excess air has a molar mass of about 28.6 g/mol (from memory), the site at 35 m about 100.9 kPa,
// so ρ = pM/(RT) ≈ 100 900 · 0.0286 / (8.314 · 478.15) ≈ 0.726 kg/m³; the 1.4 m flue has A = 1.5394 m².
const RHO_HAND = 0.726;
const AREA = (Math.PI * 1.4 * 1.4) / 4;
const flowFor = (velocity: number) => velocity * RHO_HAND * AREA;

describe('beyond what a flue can carry: bad input', () => {
  it('a 5 cm flue carrying 2000 kg/s names the key, the velocity, Mach and Reynolds numbers, and the limits', () => {
    const lines = problemsOf(firing(2000, (s) => (s.stack.inner_diameter = 0.05)));
    expect(lines[0]).toMatch(/^flue\.schedule\.daily\[2\]\.mass_flow: found 2000 kg\/s at 205 °C in a 0\.0500 m flue: a mean gas velocity of ([\d.]+e\+6) m\/s \(Mach \d+, Reynolds [\d.]+e\+9\); expected a flow the flue can carry, at most 60 m\/s and Mach 0\.3/);
    // v = ṁ / (ρ A) by hand: 2000 / (0.726 · 0.0019635) = 1.40e6 m/s; 5 % for the hand density's molar mass and pressure
    const v = Number(/velocity of ([\d.e+]+) m\/s/.exec(lines[0]!)![1]);
    expect(Math.abs(v / (2000 / (RHO_HAND * ((Math.PI * 0.05 * 0.05) / 4))) - 1)).toBeLessThan(0.05);
  });

  it('65 m/s is refused, 45 m/s runs with a warning, the demo flow (2.8 m/s) passes quietly', () => {
    // the thresholds are 60 (error) and 30 m/s (warning); these flows sit 8 % or more away from them, beyond the hand density's few per cent
    expect(problemsOf(firing(flowFor(65)))[0]).toMatch(/^flue\.schedule\.daily\[2\]\.mass_flow: .* a mean gas velocity of 6\d\.?\d* m\/s/);
    const warned = validateModelInputs(firing(flowFor(45)));
    expect(warned.warnings[0]).toMatch(/^flue\.schedule\.daily\[2\]\.mass_flow: .* a mean gas velocity of 4\d\.?\d* m\/s .*above the usual 30 m\/s of stacks/);
    expect(validateModelInputs(demo()).warnings).toEqual([]);
  });

  it('a volume flow is named by its own key, and the flow floor by flue.off_mass_flow', () => {
    const lines = problemsOf(
      firing(0, (s) => {
        s.stack.inner_diameter = 0.05;
        delete s.flue.schedule.daily[2].mass_flow;
        s.flue.schedule.daily[2].volume_flow = 12000; // Nm³/h
      }),
    );
    expect(lines.some((l) => l.startsWith('flue.schedule.daily[2].volume_flow: found '))).toBe(true);
    expect(lines.some((l) => l.startsWith('flue.off_mass_flow: found 0.150 kg/s at 205 °C in a 0.0500 m flue'))).toBe(true);
  });

  it('with air properties the check uses air', () => {
    expect(problemsOf(firing(2000, (s) => ((s.stack.inner_diameter = 0.05), (s.flue.properties = 'air'))))[0]).toMatch(/mean gas velocity of [\d.]+e\+6 m\/s/);
  });
});

describe('warnings of validation reach the run', () => {
  it("a velocity above usual practice is among the summary's warnings", () => {
    const run = runScenario(firing(flowFor(45)));
    expect(run.summary.warnings.some((w) => /above the usual 30 m\/s of stacks/.test(w))).toBe(true);
  });
});
