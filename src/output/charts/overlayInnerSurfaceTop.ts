/** Overlay: the inner surface at the top of the stack through the day, one line per run, with the dew points. */
import type { ChartConfiguration } from 'chart.js';
import { fixed } from '../format.ts';
import { LOOK } from './look.ts';
import type { Limit } from './parts.ts';
import { traceOverlay, type OverlayCase, type OverlayOptions } from './overlayParts.ts';

/** The acid and water dew points of a run, °C, as reference lines. */
function dewPoints(c: OverlayCase): Limit[] {
  const out: Limit[] = [];
  if (c.summary.acid_dew_point_c !== null) out.push({ label: 'Acid dew point', valueC: c.summary.acid_dew_point_c, look: LOOK.acidDew });
  out.push({ label: 'Water dew point', valueC: c.summary.water_dew_point_c, look: LOOK.waterDew });
  return out;
}

/** The inner-surface temperature of the top segment (the coldest, where condensation starts) through the evaluated day, per run. */
export function overlayInnerSurfaceTop(cases: readonly OverlayCase[], options: OverlayOptions = {}): ChartConfiguration {
  const top = cases[0]?.trace.topHeightM;
  return traceOverlay(
    cases,
    {
      title: 'Inner surface at the top through the day',
      subtitle: `Top segment${top === undefined ? '' : ` (${fixed(top)} m)`}, where the gas is coolest`,
      yTitle: 'Temperature (°C)',
      unit: '°C',
      values: (c) => c.trace.innerTopC,
      limits: dewPoints,
    },
    options,
  );
}
