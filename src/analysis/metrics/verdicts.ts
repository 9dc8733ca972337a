/**
 * A verdict against every limit: the shell touch limit, the lining service limit, the allowable
 * stress and the margins above the acid and water dew points (in a warm-up study: whether each dew
 * point plus margin is reached within the run). A limit that is not set is reported as not set.
 * A cycle run of several days that is not periodic is judged on the worst of every day (`runWide`),
 * not on its last day alone.
 */
import type { LayerInput, LimitsInput } from '../../model/inputs.ts';
import { kelvinToCelsius as c } from '../../physics/constants.ts';
import type { LayerSummary, Summary, Verdict } from '../summary.ts';
import { round } from '../rounding.ts';
import { timeAndHeight, type Evaluated, type Located } from './evaluated.ts';
import type { WallExtremes } from './extremes.ts';
import type { LowestMargins } from './dewPoints.ts';
import type { RunWorst, TimedExtreme } from './daily.ts';
import { layerStressMpa } from './layers.ts';

/** The figures the verdicts are drawn from. */
export interface VerdictFigures {
  readonly mode: 'cycle' | 'warmup';
  readonly limits: LimitsInput;
  readonly extremes: WallExtremes;
  readonly layers: readonly LayerSummary[];
  readonly margins: LowestMargins;
  readonly warmup: Summary['warmup'];
  /** The worst of every simulated day and how many days, for a run judged on all of them; null: judged on the evaluated period. */
  readonly runWide: { readonly worst: RunWorst; readonly days: number; readonly layers: readonly LayerInput[] } | null;
}

/** A governing figure with when and where. */
interface Governing {
  readonly value: number;
  readonly time: string | null;
  readonly height: number | null;
}

type DewLimit = 'acid_dew_margin' | 'water_dew_margin';

/** The five verdicts in a fixed order: shell touch, lining service, allowable stress, acid dew margin, water dew margin. */
export function verdicts(ev: Evaluated, f: VerdictFigures): Verdict[] {
  const s = ev.series;
  const { limits } = f;
  const out: Verdict[] = [];
  const setVerdict = (v: Omit<Verdict, 'status'> & { pass: boolean | null }) => {
    const { pass, ...rest } = v;
    out.push({ ...rest, status: pass === null ? 'not-set' : pass ? 'pass' : 'fail' });
  };
  const wide = f.runWide;
  // over which instants, for the details ('' for the evaluated period the summary states)
  const span = wide ? ` over all ${wide.days} simulated days` : '';
  const located = (x: Located): Governing => ({ value: x.value, ...timeAndHeight(s, x.at) });
  const timed = (x: TimedExtreme): Governing => ({ value: x.value, time: x.time, height: round(x.height, 2) });
  const temperatureVerdict = (limit: string, title: string, limitK: number | undefined, peak: Governing, detail: string) => {
    setVerdict({
      limit,
      title,
      pass: limitK === undefined ? null : peak.value <= limitK,
      limit_value: limitK === undefined ? null : round(c(limitK), 1),
      governing_value: round(c(peak.value)),
      unit: '°C',
      time_local: peak.time,
      height_m: peak.height,
      detail: detail + span,
    });
  };
  temperatureVerdict('shell_touch', 'Outer shell touch limit', limits.shellTouchK, wide ? timed(wide.worst.peakShell) : located(f.extremes.peakShell), 'hottest outer-surface temperature against the touch limit');
  temperatureVerdict(
    'lining_service',
    'Lining service temperature',
    limits.liningServiceK,
    wide ? timed(wide.worst.peakLining) : located(f.extremes.peakLining),
    `hottest temperature anywhere in the ${s.layers[0]!.label} layer against its service limit`,
  );
  // the most stressed layer: its indicator at its largest difference, when and where
  const stressed = wide
    ? wide.worst.layerMaxDeltaT.map((d, j) => ({ label: s.layers[j]!.label, mpa: layerStressMpa(wide.layers[j]!.material, d.value), deltaK: round(d.value, 3), ...timed(d) }))
    : f.layers.map((l) => ({ label: l.label, mpa: l.stress_indicator_mpa, deltaK: l.max_delta_t_k, time: l.max_delta_t_time, height: l.max_delta_t_height_m }));
  const worst = stressed.filter((l) => l.mpa !== null).reduce<(typeof stressed)[number] | null>((a, b) => (a === null || b.mpa! > a.mpa! ? b : a), null);
  setVerdict({
    limit: 'allowable_stress',
    title: 'Thermal-stress indicator',
    pass: limits.allowableStressPa === undefined || worst === null ? null : worst.mpa! <= limits.allowableStressPa / 1e6,
    limit_value: limits.allowableStressPa === undefined ? null : round(limits.allowableStressPa / 1e6, 3),
    governing_value: worst ? round(worst.mpa!, 3) : null,
    unit: 'MPa',
    time_local: worst ? worst.time : null,
    height_m: worst ? worst.height : null,
    detail: worst ? `E·α·ΔT/(2(1−ν)) of the ${worst.label} layer at its largest temperature difference (${worst.deltaK} K)${span}` : 'no layer has elastic data',
  });
  const dewVerdict = (limit: DewLimit, marginK: number | undefined, m: Located | null, dewK: number | null, title: string) => {
    if (m === null || dewK === null) {
      setVerdict({ limit, title, pass: null, limit_value: marginK ?? null, governing_value: null, unit: 'K', time_local: null, height_m: null, detail: 'the flue gas carries no SO3: no acid dew point' });
      return;
    }
    if (f.mode === 'warmup') {
      const key = limit === 'acid_dew_margin' ? 'minutes_to_acid_dew' : 'minutes_to_water_dew';
      const slowest = f.warmup!.by_height.reduce((a, b) => ((b[key] ?? Infinity) > (a[key] ?? Infinity) ? b : a));
      const minutes = slowest[key];
      setVerdict({
        limit,
        title: `${limit === 'acid_dew_margin' ? 'Acid' : 'Water'} dew point + ${round(marginK ?? 0, 1)} K reached (warm-up)`,
        pass: marginK === undefined ? null : minutes !== null,
        limit_value: null,
        governing_value: minutes,
        unit: 'min',
        time_local: null,
        height_m: slowest.height_m,
        detail: minutes === null ? `the inner surface does not reach ${round(c(dewK) + (marginK ?? 0), 1)} °C everywhere within the run` : `slowest height reaches the dew point plus margin after ${minutes} min of firing`,
      });
      return;
    }
    const runWorst = wide ? (limit === 'acid_dew_margin' ? wide.worst.lowestAcidMargin : wide.worst.lowestWaterMargin) : null;
    const g = runWorst ? timed(runWorst) : located(m);
    setVerdict({
      limit,
      title,
      pass: marginK === undefined ? null : g.value >= marginK,
      limit_value: marginK === undefined ? null : round(marginK, 2),
      governing_value: round(g.value),
      unit: 'K',
      time_local: g.time,
      height_m: g.height,
      detail: `lowest margin of the inner surface above the ${limit === 'acid_dew_margin' ? 'acid' : 'water'} dew point (${round(c(dewK), 1)} °C)${span}`,
    });
  };
  dewVerdict('acid_dew_margin', limits.acidDewMarginK, f.margins.acid, s.acidDewPointK, 'Margin above the acid dew point');
  dewVerdict('water_dew_margin', limits.waterDewMarginK, f.margins.water, s.waterDewPointK, 'Margin above the water dew point');
  return out;
}
