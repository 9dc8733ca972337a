/** Overlay: the inner surface's margin above the acid dew point at the top through the day, one line per run. */
import type { ChartConfiguration } from 'chart.js';
import { fixed } from '../format.ts';
import { LOOK } from './look.ts';
import type { Limit } from './parts.ts';
import { traceOverlay, type OverlayCase, type OverlayOptions } from './overlayParts.ts';

/** The dew point itself (margin 0) and the required margin of a run, K. */
function marginLines(c: OverlayCase): Limit[] {
  const out: Limit[] = [{ label: 'Acid dew point (margin 0)', valueC: 0, look: LOOK.acidDew }];
  const v = c.summary.verdicts.find((x) => x.limit === 'acid_dew_margin' && x.status !== 'not-set');
  if (v?.limit_value != null) out.push({ label: 'Required margin', valueC: v.limit_value, look: LOOK.acidDewMargin });
  return out;
}

/** Inner surface minus the acid dew point in the top segment through the evaluated day, per run (runs without SO₃ have no line). */
export function overlayAcidMarginTop(cases: readonly OverlayCase[], options: OverlayOptions = {}): ChartConfiguration {
  const top = cases[0]?.trace.topHeightM;
  return traceOverlay(
    cases,
    {
      title: 'Margin above the acid dew point at the top',
      subtitle: `Inner surface of the top segment${top === undefined ? '' : ` (${fixed(top)} m)`} minus the acid dew point; below 0 it condenses`,
      yTitle: 'Margin (K)',
      unit: 'K',
      values: (c) => c.trace.acidMarginTopK,
      limits: marginLines,
    },
    options,
  );
}
