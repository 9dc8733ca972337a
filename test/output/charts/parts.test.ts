/** Charts take the places of the summary's figures as indices, from summariseRun or found again from the series. */
import { describe, it, expect } from 'vitest';
import { summariseRun } from '../../../src/analysis/metrics/index.ts';
import { figureLocations } from '../../../src/output/charts/parts.ts';
import { wallProfile } from '../../../src/output/charts/index.ts';
import { demoStudy } from '../../support/demoStudy.ts';

describe('figure locations in charts', () => {
  const study = demoStudy('cycle');
  const { locations } = summariseRun({ inputs: study.inputs, result: study.result, version: 'test' });
  const s = study.result.series;

  it('are found again from the series when not given, at the same indices', () => {
    expect(figureLocations(s, study.inputs, {})).toEqual(locations);
    expect(figureLocations(s, study.inputs, { locations })).toBe(locations);
  });

  it('place the wall profile at the given instant and segment', () => {
    // move the hottest-lining profile to the first instant of the bottom segment: the chart must follow the indices
    const moved = { ...locations, peakLining: { instant: 0, segment: 0 } };
    const c = wallProfile(s, study.summary, study.inputs, { locations: moved });
    const first = c.data.datasets[0]!;
    expect(first.label).toBe(`Hottest lining: ${s.isoLocal[0]!.slice(11, 16)} at ${s.heightM[0]!.toFixed(1)} m`);
    expect((first.data[0] as { y: number }).y).toBeCloseTo(s.temperatureK[0]! - 273.15, 2); // chart rounds to 0.01 °C
  });
});
