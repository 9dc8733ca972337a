/**
 * The cost of the explicit RK45 reference on the wall model, estimated before running from the
 * Gershgorin bound of the Jacobian, against the steps the integrator really takes on it.
 */
import { describe, it, expect } from 'vitest';
import { readFileSync } from 'node:fs';
import { parse } from 'yaml';
import { validateModelInputs } from '../../src/input/scenario/validate.ts';
import { assembleModel } from '../../src/model/assemble.ts';
import { estimateExplicitSteps } from '../../src/model/stiffness.ts';
import { integrateDormandPrince } from '../../src/solver/index.ts';

describe('estimateExplicitSteps', () => {
  it('on the demo wall (one segment, three hours from a uniform wall) is within 25 % of the steps Dormand–Prince takes', () => {
    const s = parse(readFileSync('scenarios/demo.yaml', 'utf8'));
    s.run.days = 1;
    s.stack.segments = 1;
    const { inputs } = validateModelInputs(s);
    const model = assembleModel(inputs);
    const duration = 3 * 3600;
    const estimate = estimateExplicitSteps(model, 0, duration);
    const d = model.system.driversAt(0);
    const y0 = new Float64Array(model.system.size).fill(0.5 * (d.airTemperatureK + d.inletTemperatureK));
    const r = integrateDormandPrince(model.system, y0, 0, [duration], { rtol: inputs.run.rtol, atol: inputs.run.atol, maxStep: 3600 });
    // the step hovers at the stability limit once the fast modes have decayed; the bound is taken at the start
    // (conductivities change a little as the wall warms) and the first steps are set by accuracy: 25 % covers both
    expect(r.stats.steps / estimate.steps).toBeGreaterThan(0.75);
    expect(r.stats.steps / estimate.steps).toBeLessThan(1.25);
    // the stiffest node is a thin cell of the wall, its stable step under a few seconds
    expect(estimate.stableStepS).toBeLessThan(5);
  });
});
