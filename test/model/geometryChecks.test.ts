/** Where the geometry weakens the model's assumptions (src/model/geometryChecks.ts): warned, never refused. */
import { describe, it, expect } from 'vitest';
import { geometryWarnings } from '../../src/model/geometryChecks.ts';
import { findMaterial } from '../../src/physics/materials/index.ts';
import { simulate } from '../../src/model/simulate.ts';
import { baseInputs, layer } from './fixtures.ts';

const castable = findMaterial('dense-castable')!;
const steel = findMaterial('carbon-steel')!;

describe('geometryWarnings', () => {
  it('says nothing for a slender stack with a thin lining', () => {
    const inputs = baseInputs({ layers: [layer(castable, 0.05), layer(steel, 0.008)], stack: { height: 45, innerDiameter: 1.4, segments: 4 }, limits: { allowableStressPa: 3e6 } });
    expect(geometryWarnings(inputs, 1.516)).toEqual([]);
  });

  it('warns of the entrance region below ten diameters of height (turbulent entry about 10 D, Incropera & DeWitt §8.1, from memory)', () => {
    const inputs = baseInputs({ layers: [layer(steel, 0.008)], stack: { height: 20, innerDiameter: 4, segments: 4 } });
    expect(geometryWarnings(inputs, 4.016).join()).toMatch(/only 5 diameters tall .*entrance region/);
  });

  it('warns of a stack shorter than it is wide, and still runs it (a 40 m windshield, 20 m tall)', () => {
    const inputs = baseInputs({ layers: [layer(castable, 0.2), layer(steel, 0.01)], stack: { height: 20, innerDiameter: 40, segments: 2 } });
    const r = simulate(inputs);
    expect(r.warnings.join()).toMatch(/shorter \(20 m\) than it is wide \(40\.42 m\)/);
    expect(r.series.temperatureK.every(Number.isFinite)).toBe(true);
  });

  it('warns that the thin-wall stress indicator is approximate for a load-bearing layer thicker than a tenth of its radius, where a stress limit is set', () => {
    const thick = baseInputs({ layers: [layer(castable, 0.15), layer(steel, 0.008)], stack: { height: 30, innerDiameter: 1, segments: 2 }, limits: { allowableStressPa: 3e6 } });
    expect(geometryWarnings(thick, 1.316).join()).toMatch(/layer dense-castable is 0\.3 of its inner radius thick/);
    expect(geometryWarnings({ ...thick, limits: {} }, 1.316)).toEqual([]);
  });
});
