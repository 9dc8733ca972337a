/** Overlay: the hottest point of the shell through the day, one line per run, with the shell touch limit. */
import type { ChartConfiguration } from 'chart.js';
import { LOOK } from './look.ts';
import type { Limit } from './parts.ts';
import { traceOverlay, type OverlayCase, type OverlayOptions } from './overlayParts.ts';

/** The shell touch limit of a run, °C, as a reference line (none when not set). */
function shellTouch(c: OverlayCase): Limit[] {
  const v = c.summary.verdicts.find((x) => x.limit === 'shell_touch' && x.status !== 'not-set');
  return v?.limit_value != null ? [{ label: 'Shell touch limit', valueC: v.limit_value, look: LOOK.shellTouch }] : [];
}

/** The hottest outer-surface temperature over all heights at each instant of the evaluated day, per run. */
export function overlayShell(cases: readonly OverlayCase[], options: OverlayOptions = {}): ChartConfiguration {
  return traceOverlay(
    cases,
    {
      title: 'Shell through the day',
      subtitle: 'Hottest outer-surface temperature over all heights at each instant',
      yTitle: 'Temperature (°C)',
      unit: '°C',
      values: (c) => c.trace.shellC,
      limits: shellTouch,
    },
    options,
  );
}
