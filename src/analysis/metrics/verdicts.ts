/**
 * A verdict against every limit: the shell touch limit, the lining service limit, the allowable
 * stress and the margins above the acid and water dew points (in a warm-up study: whether each dew
 * point plus margin is reached within the run). A limit that is not set is reported as not set.
 */
import type { LimitsInput } from '../../model/inputs.ts';
import { kelvinToCelsius as c } from '../../physics/constants.ts';
import type { LayerSummary, Summary, Verdict } from '../summary.ts';
import { round } from '../rounding.ts';
import { timeAndHeight, type Evaluated, type Located } from './evaluated.ts';
import type { WallExtremes } from './extremes.ts';
import type { LowestMargins } from './dewPoints.ts';

/** The figures the verdicts are drawn from. */
export interface VerdictFigures {
  readonly mode: 'cycle' | 'warmup';
  readonly limits: LimitsInput;
  readonly extremes: WallExtremes;
  readonly layers: readonly LayerSummary[];
  readonly margins: LowestMargins;
  readonly warmup: Summary['warmup'];
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
  const temperatureVerdict = (limit: string, title: string, limitK: number | undefined, peak: Located, detail: string) => {
    const at = timeAndHeight(s, peak.at);
    setVerdict({
      limit,
      title,
      pass: limitK === undefined ? null : peak.value <= limitK,
      limit_value: limitK === undefined ? null : round(c(limitK), 1),
      governing_value: round(c(peak.value)),
      unit: '°C',
      time_local: at.time,
      height_m: at.height,
      detail,
    });
  };
  temperatureVerdict('shell_touch', 'Outer shell touch limit', limits.shellTouchK, f.extremes.peakShell, 'hottest outer-surface temperature against the touch limit');
  temperatureVerdict('lining_service', 'Lining service temperature', limits.liningServiceK, f.extremes.peakLining, `hottest temperature anywhere in the ${s.layers[0]!.label} layer against its service limit`);
  const stressed = f.layers.filter((l) => l.stress_indicator_mpa !== null);
  const worst = stressed.reduce<LayerSummary | null>((a, b) => (a === null || b.stress_indicator_mpa! > a.stress_indicator_mpa! ? b : a), null);
  setVerdict({
    limit: 'allowable_stress',
    title: 'Thermal-stress indicator',
    pass: limits.allowableStressPa === undefined || worst === null ? null : worst.stress_indicator_mpa! <= limits.allowableStressPa / 1e6,
    limit_value: limits.allowableStressPa === undefined ? null : round(limits.allowableStressPa / 1e6, 3),
    governing_value: worst ? worst.stress_indicator_mpa : null,
    unit: 'MPa',
    time_local: worst ? worst.max_delta_t_time : null,
    height_m: worst ? worst.max_delta_t_height_m : null,
    detail: worst ? `E·α·ΔT/(2(1−ν)) of the ${worst.label} layer at its largest temperature difference (${worst.max_delta_t_k} K)` : 'no layer has elastic data',
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
    const at = timeAndHeight(s, m.at);
    setVerdict({
      limit,
      title,
      pass: marginK === undefined ? null : m.value >= marginK,
      limit_value: marginK === undefined ? null : round(marginK, 2),
      governing_value: round(m.value),
      unit: 'K',
      time_local: at.time,
      height_m: at.height,
      detail: `lowest margin of the inner surface above the ${limit === 'acid_dew_margin' ? 'acid' : 'water'} dew point (${round(c(dewK), 1)} °C)`,
    });
  };
  dewVerdict('acid_dew_margin', limits.acidDewMarginK, f.margins.acid, s.acidDewPointK, 'Margin above the acid dew point');
  dewVerdict('water_dew_margin', limits.waterDewMarginK, f.margins.water, s.waterDewPointK, 'Margin above the water dew point');
  return out;
}
