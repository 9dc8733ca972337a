/**
 * The machine-readable result of a run (summary.json) and its types. Field names state their unit.
 * Temperatures in °C, differences in K, stresses in MPa, energies in kWh, times as ISO local time.
 */

export type VerdictStatus = 'pass' | 'fail' | 'not-set';

export interface Verdict {
  /** Which limit: shell_touch, lining_service, allowable_stress, acid_dew_margin, water_dew_margin. */
  readonly limit: string;
  /** Plain words for the limit. */
  readonly title: string;
  readonly status: VerdictStatus;
  /** The limit as set (null when not set). */
  readonly limit_value: number | null;
  /** The figure that governs the verdict. */
  readonly governing_value: number | null;
  /** Unit of limit_value and governing_value. */
  readonly unit: string;
  /** When and where the governing figure occurs. */
  readonly time_local: string | null;
  readonly height_m: number | null;
  /** One sentence saying what was compared. */
  readonly detail: string;
}

export interface Extreme {
  readonly value_c: number;
  readonly time_local: string;
  readonly height_m: number;
}

export interface PositionRange {
  /** inner_surface, interface_1, …, outer_surface. */
  readonly position: string;
  readonly radius_m: number;
  readonly min_c: number;
  readonly max_c: number;
  /** Largest daily swing (max − min) at any height, K. */
  readonly swing_k: number;
  /** Height where the largest swing occurs. */
  readonly swing_height_m: number;
}

export interface LayerSummary {
  readonly label: string;
  readonly material: string;
  readonly kind: 'solid' | 'gap';
  readonly thickness_mm: number;
  readonly min_c: number;
  readonly max_c: number;
  readonly swing_k: number;
  /** Largest temperature difference across the layer, K, with its time and height. */
  readonly max_delta_t_k: number;
  readonly max_delta_t_time: string;
  readonly max_delta_t_height_m: number;
  /** Thermal-stress indicator E α ΔT / (2(1 − ν)), MPa (null for gaps and materials without elastic data). */
  readonly stress_indicator_mpa: number | null;
  readonly max_service_c: number | null;
}

export interface HeightHours {
  readonly height_m: number;
  readonly hours: number;
}

export interface WarmupAtHeight {
  readonly height_m: number;
  /** Minutes from firing start until the inner surface stays above the water dew point plus margin (null: not within the run). */
  readonly minutes_to_water_dew: number | null;
  readonly minutes_to_acid_dew: number | null;
  /** Minutes until the outer surface has risen 90 % of its rise over the run. */
  readonly minutes_to_shell_90_percent: number | null;
  /** Minutes until the outer surface first passes the touch limit (null: never, or no limit set). */
  readonly minutes_to_shell_touch: number | null;
}

/** Figures of one simulated day (closed interval from its start to its end), every height. */
export interface DayFigures {
  /** Day of the run, from 1. */
  readonly day: number;
  /** Local date at the middle of the day, YYYY-MM-DD. */
  readonly date: string;
  /** Range of the outer surface. */
  readonly shell_min_c: number;
  readonly shell_max_c: number;
  /** Range of the flue-side layer, every node. */
  readonly lining_min_c: number;
  readonly lining_max_c: number;
  readonly inner_surface_min_c: number;
  readonly inner_surface_max_c: number;
  readonly lowest_water_dew_margin_k: number;
  /** Null when the gas has no acid dew point. */
  readonly lowest_acid_dew_margin_k: number | null;
  /** Heat lost to the outside over the day, net of sun, kWh (null when the day's account is not known). */
  readonly heat_loss_kwh: number | null;
  /** Heat from the gas into the wall over the day, kWh. */
  readonly gas_to_wall_kwh: number | null;
}

/** The sun-facing side (walls cut into circumferential sectors only). */
export interface SectorSummary {
  /** Number of sectors; sector j faces the azimuth 360 j / count degrees clockwise from north. */
  readonly count: number;
  /** Outward azimuth of the sector where the hottest shell occurs, degrees clockwise from north. */
  readonly peak_shell_azimuth_deg: number;
  /** The shell round the circumference at the hottest instant and height, sector by sector, °C. */
  readonly shell_by_sector_at_peak_c: readonly number[];
  /** Largest difference between the hottest and the coldest sector of the shell at one height, K. */
  readonly largest_side_to_side_shell_k: number;
  readonly largest_side_to_side_shell_time: string;
  readonly largest_side_to_side_shell_height_m: number;
  /** Largest difference between opposite sides of the wall's mean temperature (twice its first circumferential harmonic), K. */
  readonly largest_side_to_side_wall_k: number;
  readonly largest_side_to_side_wall_time: string;
  readonly largest_side_to_side_wall_height_m: number;
  /** Thermal expansion used for the bow, 1/K (the outermost layer with expansion data). */
  readonly bow_expansion_per_k: number;
  /** Largest tip deflection of the stack as a cantilever from its side-to-side difference, mm (an indicator, not a structural check). */
  readonly bow_largest_tip_deflection_mm: number;
  readonly bow_largest_tip_deflection_time: string;
  /** Curvature α ΔT_side / D of each segment at that instant, 1/km, bottom → top. */
  readonly bow_curvature_per_km_by_height: readonly { readonly height_m: number; readonly curvature_per_km: number }[];
  /** Sectors with the most and the least beam sunshine over the evaluated period (outward azimuths, degrees). */
  readonly sunniest_sector_azimuth_deg: number;
  readonly shadiest_sector_azimuth_deg: number;
}

/** Figures of one calendar month of an annual run (its days in the run only). */
export interface MonthFigures {
  /** `YYYY-MM`. */
  readonly month: string;
  /** Run days dated in the month (by the local date at the middle of the day). */
  readonly days: number;
  /** Heat lost to the outside over those days, net of sun, kWh. */
  readonly heat_loss_kwh: number;
  /** Heat from the gas into the wall over those days, kWh. */
  readonly gas_to_wall_kwh: number;
  readonly shell_min_c: number;
  readonly shell_max_c: number;
  readonly lining_min_c: number;
  readonly lining_max_c: number;
  readonly inner_surface_min_c: number;
  readonly lowest_water_dew_margin_k: number;
  /** Null when the gas has no acid dew point. */
  readonly lowest_acid_dew_margin_k: number | null;
  /** Hours of the month the inner surface spends below each dew point, at every height, bottom → top. */
  readonly hours_below_water_dew: readonly HeightHours[];
  readonly hours_below_acid_dew: readonly HeightHours[];
}

/** Rainflow cycles of one range bin. */
export interface CycleBin {
  /** The bin holds ranges from from_k (inclusive) to to_k (exclusive), K. */
  readonly from_k: number;
  readonly to_k: number;
  /** Cycles counted (full cycles 1, half cycles ½). */
  readonly cycles: number;
}

/** Cycles of one temperature difference at one height (the sector with the most, when the wall has sectors). */
export interface CyclesAtHeight {
  readonly height_m: number;
  /** Cycles of any range. */
  readonly cycles: number;
  /** Cycles with a range above the threshold (null without a threshold). */
  readonly cycles_above_threshold: number | null;
  readonly largest_range_k: number;
}

/** Thermal cycles of the temperature difference across the whole wall or across one layer. */
export interface WallCycles {
  /** `whole wall` or the layer's label. */
  readonly across: string;
  /** Height whose counts are given here and in the histogram: the most cycles above the threshold, else the largest range. */
  readonly governing_height_m: number;
  readonly cycles: number;
  readonly cycles_above_threshold: number | null;
  readonly largest_range_k: number;
  /** Width of the histogram's bins, K. */
  readonly bin_width_k: number;
  /** Ranges at the governing height. */
  readonly histogram: readonly CycleBin[];
  readonly by_height: readonly CyclesAtHeight[];
}

/**
 * The annual figures of a run over a year (or a range of dates): summary.json `annual`. Its
 * peak_shell_*, peak_lining_* and min_inner_surface_* are those of the whole run (the summary's own
 * cover the last day).
 */
export interface AnnualSummary
  extends Pick<
    Summary,
    'peak_shell_c' | 'peak_shell_time' | 'peak_shell_height_m' | 'peak_lining_c' | 'peak_lining_time' | 'peak_lining_height_m' | 'min_inner_surface_c' | 'min_inner_surface_time' | 'min_inner_surface_height_m'
  > {
  readonly first_day: string;
  readonly last_day: string;
  readonly days: number;
  /** True when the run covers at least 365 days (its totals are then a year's). */
  readonly full_year: boolean;
  /** Hours below each dew point over the run, at every height, bottom → top. */
  readonly hours_below_water_dew: readonly HeightHours[];
  readonly hours_below_acid_dew: readonly HeightHours[];
  readonly heat_loss_kwh: number;
  readonly gas_to_wall_kwh: number;
  /** (With the peaks of the summary's fields of the same names, over the whole run.) */
  readonly months: readonly MonthFigures[];
  readonly cycles: {
    /** How the cycles were counted. */
    readonly method: string;
    /** The temperature differences were sampled at every output instant, this many minutes apart. */
    readonly sampled_every_min: number;
    /** Reversals smaller than this were filtered out before counting (hysteresis gate), K. */
    readonly gate_k: number;
    /** Range above which cycles are counted separately, K (limits.cycles_above.range; null when not set). */
    readonly threshold_k: number | null;
    /** The whole wall first, then each layer inside → outside. */
    readonly across: readonly WallCycles[];
  };
}

/** An annual run's figures with its verdicts on the annual limits (hours below the acid and water dew points, cycles above a range), which the summary lists with the others in `verdicts`. */
export interface AnnualOutcome extends AnnualSummary {
  readonly verdicts: readonly Verdict[];
}

/** The cells of one layer of a run's mesh. */
export interface LayerMesh {
  readonly label: string;
  /** Cells across the layer (0 for a gap). */
  readonly cells: number;
  /** Thinnest and thickest cell, mm (null for a gap). */
  readonly smallest_cell_mm: number | null;
  readonly largest_cell_mm: number | null;
}

/** The mesh of a run and the forcing its automatic cells resolve. */
export interface MeshSummary {
  readonly layers: readonly LayerMesh[];
  /** Time scale of the fastest forcing on the flue side, min, and what set it. */
  readonly flue_side_time_scale_min: number;
  readonly flue_side_set_by: string;
  /** Time scale of the fastest forcing outside, min, and what set it. */
  readonly outside_time_scale_min: number;
  readonly outside_set_by: string;
  /** Labels of automatic layers whose cell count hit the cap (also a warning). */
  readonly capped_layers: readonly string[];
  /** The run's mesh is the scenario's cut this many times finer (a refinement toward an accuracy target). */
  readonly refinement: number;
}

/**
 * How far the reported figures may be off: the estimated discretisation error (mesh and time
 * integration) of each, from a second solve on a finer mesh at tighter tolerances (± this value).
 */
export interface AccuracyStatement {
  readonly mode: 'estimate' | 'target' | 'off';
  /** The target asked for, K (null without one). */
  readonly target_k: number | null;
  /** Whether every estimate in K meets the target (null without one). */
  readonly target_met: boolean | null;
  /** How many times the run was refined toward the target (0: the scenario's mesh and tolerances). */
  readonly refinements: number;
  /** How the estimate was made, in words. */
  readonly method: string;
  /** The check solve (null when not estimated). */
  readonly check: {
    readonly mesh_refinement: number;
    readonly relative_tolerance: number;
    readonly absolute_tolerance_k: number;
    readonly nodes_per_segment: number;
    readonly days: number;
  } | null;
  /** Any surface or interface temperature at any reported instant (the time series, the charts), K. */
  readonly temperatures_k: number | null;
  readonly peak_shell_k: number | null;
  readonly peak_lining_k: number | null;
  readonly lowest_water_dew_margin_k: number | null;
  readonly lowest_acid_dew_margin_k: number | null;
  /** Warm-up times at the top, min (null: not a warm-up, or not reached in both solves). */
  readonly warmup_minutes_to_water_dew: number | null;
  readonly warmup_minutes_to_acid_dew: number | null;
  readonly warmup_minutes_to_shell_90_percent: number | null;
  readonly warmup_minutes_to_shell_touch: number | null;
  /** The largest estimate in K. */
  readonly largest_k: number | null;
}

export interface Summary {
  readonly tool: { readonly name: 'stackday'; readonly version: string };
  readonly scenario: { readonly name: string; readonly description: string | null; readonly site: string; readonly first_day: string; readonly time_zone: string };
  readonly run: {
    readonly mode: 'cycle' | 'warmup';
    readonly days_simulated: number;
    /** Which instants the figures below cover. */
    readonly evaluated_over: string;
    /** Which instants the verdicts judge: the same, or every simulated day (a cycle run of several days that is not periodic). */
    readonly verdicts_over: string;
    readonly periodic_requested: boolean;
    readonly periodic_reached: boolean | null;
    readonly periodic_last_change_k: number | null;
    readonly periodic_tolerance_k: number | null;
    readonly periodic_change_by_day_k: readonly number[];
    readonly integrator: string;
    /** Solver counts over the whole run: accepted and rejected steps, right-hand-side and Jacobian evaluations, Newton iterations and failures. */
    readonly steps: number;
    readonly rejected_steps: number;
    readonly rhs_evaluations: number;
    readonly jacobian_evaluations: number;
    readonly newton_iterations: number;
    readonly newton_failures: number;
    readonly output_interval_min: number;
    readonly segments: number;
    readonly nodes_per_segment: number;
    readonly relative_tolerance: number;
    readonly absolute_tolerance_k: number;
    readonly mesh: MeshSummary;
  };
  readonly accuracy: AccuracyStatement;
  readonly verdicts: readonly Verdict[];
  readonly all_limits_pass: boolean;
  readonly peak_shell_c: number;
  readonly peak_shell_time: string;
  readonly peak_shell_height_m: number;
  readonly peak_lining_c: number;
  readonly peak_lining_time: string;
  readonly peak_lining_height_m: number;
  readonly min_inner_surface_c: number;
  readonly min_inner_surface_time: string;
  readonly min_inner_surface_height_m: number;
  readonly positions: readonly PositionRange[];
  readonly layers: readonly LayerSummary[];
  readonly through_wall_max_delta_t_k: number;
  readonly through_wall_max_delta_t_time: string;
  readonly through_wall_max_delta_t_height_m: number;
  readonly water_dew_point_c: number;
  readonly acid_dew_point_c: number | null;
  readonly lowest_water_dew_margin_k: number;
  readonly lowest_water_dew_margin_time: string;
  readonly lowest_water_dew_margin_height_m: number;
  readonly lowest_acid_dew_margin_k: number | null;
  readonly lowest_acid_dew_margin_time: string | null;
  readonly lowest_acid_dew_margin_height_m: number | null;
  readonly hours_below_water_dew: readonly HeightHours[];
  readonly hours_below_acid_dew: readonly HeightHours[];
  readonly gas_exit_min_c: number;
  readonly gas_exit_max_c: number;
  readonly draft_min_pa: number;
  readonly draft_max_pa: number;
  readonly heat_loss_kwh_per_day: number;
  readonly gas_to_wall_kwh_per_day: number;
  readonly sun_absorbed_kwh_per_day: number;
  readonly convection_kwh_per_day: number;
  readonly radiation_kwh_per_day: number;
  /** Residual of the energy balance over the period the figures cover, relative to the gross energy exchanged, %. */
  readonly energy_residual_percent: number;
  /** The same over the whole run, %. */
  readonly energy_residual_run_percent: number;
  readonly warmup: {
    readonly firing_start_local: string;
    readonly top: WarmupAtHeight;
    readonly by_height: readonly WarmupAtHeight[];
  } | null;
  /** Figures of every simulated day (a periodic study: its settled day only), first to last. */
  readonly daily: readonly DayFigures[];
  /** Annual runs only (run.days: year or run.last_day): monthly and annual figures, thermal cycles (their verdicts are in `verdicts`). */
  readonly annual?: AnnualSummary;
  /** What the run assumed (wind conversion, pressures, gas radiation, clear sky) and every accepted extrapolation of a correlation, once each. */
  readonly assumptions: readonly string[];
  /** Problems the reader must see: correlations beyond their range without justification (how far, where), an unreached periodic state, a poor energy balance. */
  readonly warnings: readonly string[];
  /** The sun-facing side: only for a wall cut into circumferential sectors (absent otherwise). */
  readonly sectors?: SectorSummary;
  readonly cautions: readonly string[];
}

/** The caution of the circumferentially averaged wall (left out when the wall is cut into sectors). */
export const AVERAGED_SUN_CAUTION =
  'The sun is averaged round the circumference: the sun-facing side of the shell runs hotter, and the shaded side of the lining colder, than these figures.';

/** The cautions every report carries (docs/model.md "Cautions"). */
export const CAUTIONS: readonly string[] = [
  'These results inform engineering judgement; they do not certify a design or an installation.',
  'Hot surfaces burn: touch limits such as those in ISO 13732-1 and ASTM C1055 are guidance; guard or insulate surfaces people can reach.',
  AVERAGED_SUN_CAUTION,
  'Flue gas below its acid or water dew point condenses and corrodes linings and shells; verify with measurements where margins are small.',
  'Structural adequacy (wind, seismic, thermal stress, foundations) is not checked; the stress figure is an indicator only.',
  'Follow local codes and standards, and have a licensed engineer review any design or operating decision based on these figures.',
];
