/**
 * The scenario file format: a YAML (or JSON) document validated with zod. Every dimensional value
 * is a plain number in the unit its key documents, or a string with a unit; values come out of
 * this schema already converted to SI (kelvin for temperatures). Unknown keys are errors.
 */
import { z } from 'zod';
import { parseQuantity, parseClockTime, describeExpected, QUANTITY_KINDS, type QuantityKindName } from './units.ts';
import { KELVIN_OFFSET } from '../../physics/constants.ts';
import { findMaterial, suggestMaterial } from '../../physics/materials/index.ts';
import { FUELS } from '../../physics/flue/fuels.ts';
import { isValidTimeZone, parseCalendarDate, CALENDAR_DATE_WORDING } from '../../model/clock.ts';
import { TERRAIN_EXPONENTS, type Terrain } from '../../physics/outside/wind.ts';
import { SKY_MODELS, type SkyModelName } from '../../physics/outside/boundary.ts';
import { INTEGRATORS, type IntegratorName } from '../../solver/index.ts';
import { LIMITS } from './limits.ts';

interface Bounds {
  /** Smallest allowed SI value (inclusive unless `exclusiveMin`). */
  readonly min?: number;
  readonly exclusiveMin?: boolean;
  readonly max?: number;
  /** Words for the bound, e.g. "a positive length". */
  readonly wording?: string;
}

/**
 * Default tolerances of the integrator. Chosen so that the time-integration error stays a fraction
 * of the 0.1 K the defaults aim at (docs/model.md "Accuracy"): measured on the demo and on a
 * three-layer wall under a one-hour ramp against tight references, rtol 1e-5 / atol 0.01 K left up
 * to 0.09 K of time error; these leave about a third of that, beside the mesh's share.
 */
export const DEFAULT_RELATIVE_TOLERANCE = 5e-6;
export const DEFAULT_ABSOLUTE_TOLERANCE_K = 5e-3;

// Messages below start with "expected …": errors.ts puts the path and the value found (as written) in front.

/** A value with a unit; output is the SI number. Every message names the quantity, its unit and its range. */
export function quantity(kind: QuantityKindName, bounds: Bounds = {}, description?: string) {
  const k = QUANTITY_KINDS[kind];
  const expected = `expected ${describeExpected(kind, bounds.wording)}`;
  const input = z.union([z.number(), z.string()], { error: () => expected }).meta({
    description: `${description ? `${description}. ` : ''}${k.what[0]!.toUpperCase()}${k.what.slice(1)}: a plain number in ${k.plainUnit}, or a string with a unit.`,
  });
  return input.transform((v, ctx) => {
    const parsed = parseQuantity(v, kind);
    const x = parsed.ok ? parsed.value : Number.NaN;
    const low = bounds.min !== undefined && (bounds.exclusiveMin ? x <= bounds.min : x < bounds.min);
    const high = bounds.max !== undefined && x > bounds.max;
    if (!parsed.ok || low || high) {
      ctx.addIssue({ code: 'custom', message: expected });
      return z.NEVER;
    }
    return x;
  });
}

/** A dimensionless number with bounds. */
function ratio(min: number, max: number, what: string, description: string) {
  const expected = `expected ${what} between ${min} and ${max}`;
  return z
    .number({ error: () => expected })
    .meta({ description: `${description} (${what}, ${min} to ${max}).` })
    .check((ctx) => {
      const v = ctx.value;
      if (!(v >= min && v <= max)) ctx.issues.push({ code: 'custom', input: v, message: expected });
    });
}

/** Words for a whole number in a range: `a whole number from 1 to 200 (cells across the layer)`. */
const wholeNumber = (min: number, max: number, what: string) => `a whole number from ${min} to ${max} (${what})`;

function count(min: number, max: number, what: string, description: string) {
  const expected = `expected ${wholeNumber(min, max, what)}`;
  return z
    .number({ error: () => expected })
    .meta({ description: `${description} (whole number, ${min} to ${max}).` })
    .check((ctx) => {
      const v = ctx.value;
      if (!(Number.isInteger(v) && v >= min && v <= max)) ctx.issues.push({ code: 'custom', input: v, message: expected });
    });
}

/** Twelve dimensionless monthly values within [min, max]. */
function monthly(description: string, min: number, max: number) {
  return z
    .array(ratio(min, max, 'an optical depth', description), { error: () => `expected a list of 12 values from ${min} to ${max}, January to December` })
    .length(12, `expected 12 values from ${min} to ${max}, January to December`)
    .meta({ description: `${description}: 12 values, January to December.` });
}

const CLOCK_TIME_WORDING = 'expected a local clock time "HH:MM" from 00:00 to 24:00 (in quotes in YAML)';
const clockTime = z
  .string({ error: () => CLOCK_TIME_WORDING })
  .meta({ description: 'Local clock time, "HH:MM" (00:00 to 24:00).' })
  .transform((v, ctx) => {
    const s = parseClockTime(v);
    if (s === null) {
      ctx.addIssue({ code: 'custom', message: CLOCK_TIME_WORDING });
      return z.NEVER;
    }
    return s;
  });

/** A temperature from `minC` to `maxC` °C (plain numbers are °C). `what`: "a gas temperature". */
const temperature = (minC: number, maxC: number, what: string, description: string) =>
  quantity('temperature', { min: minC + KELVIN_OFFSET, max: maxC + KELVIN_OFFSET, wording: `${what} from ${minC} °C to ${maxC} °C` }, description);
/** Outside air and dew points: the range weather files accept (input/weather/csvFile.ts). */
const airTemperature = (description: string) => temperature(-90, 60, 'an air temperature', description);
/** Ground and surroundings: outdoor surfaces, up to a sun-baked roof. */
const surroundingsTemperature = (description: string) => temperature(-90, 100, 'a temperature', description);
/** Limits and material service temperatures: from 0 °C to beyond any refractory. */
const limitTemperature = (description: string) => temperature(0, 2500, 'a temperature limit', description);
const positiveLength = (description: string) => quantity('length', { min: 0, exclusiveMin: true, wording: 'a positive length' }, description);
/** Control characters (but tab and line breaks): text with them would garble the terminal and the reports. */
const CONTROL = /[\u0000-\u0008\u000b\u000c\u000e-\u001f\u007f-\u009f]/;
/** Non-empty printable text. */
const text = (what: string) =>
  z
    .string({ error: () => `expected ${what} (text)` })
    .min(1, `expected ${what} (text, not empty)`)
    .refine((v) => !CONTROL.test(v), `expected ${what} (text without control characters)`);

const TIME_ZONE_WORDING = 'expected an IANA time zone such as "Europe/Oslo", "America/Chicago" or "UTC"';
const TERRAINS = Object.keys(TERRAIN_EXPONENTS) as [Terrain, ...Terrain[]];
/** Every allowed text of a choice, for messages: `"flat", "open", "suburban" or "city"`. */
const choices = (names: readonly string[]) => names.map((n) => `"${n}"`).join(', ').replace(/, ([^,]*)$/, ' or $1');

const site = z.strictObject({
  name: text('the name of the site').meta({ description: 'Name of the site, for reports.' }),
  latitude: ratio(-90, 90, 'degrees north', 'Latitude, degrees north (negative south)'),
  longitude: ratio(-180, 180, 'degrees east', 'Longitude, degrees east (negative west)'),
  elevation: quantity('length', { min: -500, max: 9000, wording: 'an elevation between -500 m and 9000 m' }, 'Elevation above sea level').prefault(0),
  pressure: quantity('pressure', { min: 30_000, max: 110_000, wording: 'a pressure from 30 kPa to 110 kPa' }, 'Atmospheric pressure at the site (default: the standard atmosphere at the elevation)').optional(),
  time_zone: z
    .string({ error: () => TIME_ZONE_WORDING })
    .meta({ description: 'IANA time zone of the site, e.g. "Europe/Oslo".' })
    .check((ctx) => {
      if (!isValidTimeZone(ctx.value)) ctx.issues.push({ code: 'custom', input: ctx.value, message: TIME_ZONE_WORDING });
    }),
  first_day: z
    .string({ error: () => `expected ${CALENDAR_DATE_WORDING}` })
    .meta({ description: `First simulated day, local date "YYYY-MM-DD" (${CALENDAR_DATE_WORDING.replace(/^a calendar date "YYYY-MM-DD" /, '')}).` })
    .check((ctx) => {
      if (!parseCalendarDate(ctx.value)) ctx.issues.push({ code: 'custom', input: ctx.value, message: `expected ${CALENDAR_DATE_WORDING}` });
    }),
  ground_reflectance: ratio(0, 1, 'a fraction', 'Solar reflectance (albedo) of the ground around the stack').default(0.2),
  terrain: z
    .union([z.enum(TERRAINS), ratio(0.05, 0.6, 'a power-law exponent', 'Wind power-law exponent')], {
      error: () => `expected one of ${choices(TERRAINS)}, or a power-law exponent between 0.05 and 0.6`,
    })
    .default('suburban')
    .meta({
      description: `Terrain around the stack for the wind profile: ${Object.keys(TERRAIN_EXPONENTS).join(', ')} (the station's reading is converted by the two-terrain power law), or a power-law exponent applied to the reading directly.`,
    }),
});

const propertyTable = (kind: 'conductivity' | 'specificHeat', description: string) => {
  const unit = QUANTITY_KINDS[kind].plainUnit;
  const what = QUANTITY_KINDS[kind].what;
  return z.union(
    [
      quantity(kind, { min: 0, exclusiveMin: true, wording: `a positive ${what.replace(/^an? /, '')}` }, description),
      z
        .array(z.tuple([z.number({ error: () => 'expected a temperature in °C' }), z.number({ error: () => `expected ${what} in ${unit}` })], { error: () => `expected a pair [temperature in °C, value in ${unit}]` }))
        .min(1, `expected at least one pair [temperature in °C, value in ${unit}]`)
        .meta({ description: `${description}: table of [temperature in °C, value in ${unit}] pairs, temperatures increasing.` }),
    ],
    { error: () => `expected ${what}: a positive plain number in ${unit}, a string with a unit, or a table of [temperature in °C, value in ${unit}] pairs` },
  );
};

const inlineMaterial = z.strictObject({
  name: text('a name for the material').meta({ description: 'Name for reports.' }),
  density: quantity('density', { min: 0, exclusiveMin: true, wording: 'a positive density' }, 'Density'),
  conductivity: propertyTable('conductivity', 'Thermal conductivity'),
  specific_heat: propertyTable('specificHeat', 'Specific heat'),
  emissivity: ratio(0, 1, 'a fraction', 'Surface emissivity').default(0.9),
  max_service_temperature: limitTemperature('Maximum service temperature'),
  youngs_modulus: quantity('stress', { min: 0, exclusiveMin: true, wording: 'a positive modulus' }, "Young's modulus").optional(),
  thermal_expansion: ratio(0, 1e-4, 'a linear expansion coefficient in 1/K', 'Linear thermal expansion coefficient, 1/K').optional(),
  poisson_ratio: ratio(0, 0.5, 'a ratio', "Poisson's ratio").optional(),
  source: z.string().default('user data').meta({ description: 'Where the numbers come from.' }),
});

const layer = z.strictObject({
  label: text('a label for the layer').optional().meta({ description: 'Label for reports, e.g. "liner". Default: the material name.' }),
  material: z.union(
    [
      z
        .string()
        .meta({ description: 'Name of a material in the library (`stackday materials`).' })
        .check((ctx) => {
          if (findMaterial(ctx.value)) return;
          const hint = suggestMaterial(ctx.value);
          ctx.issues.push({
            code: 'custom',
            input: ctx.value,
            message: `expected a material from the library${hint ? ` (did you mean "${hint}"?)` : ''}; \`stackday materials\` lists them`,
          });
        }),
      inlineMaterial,
    ],
    // a name that is not in the library is reported by its own branch, with a suggestion
    { error: (iss) => (typeof iss.input === 'string' ? undefined : 'expected the name of a material from the library (`stackday materials`) or an inline material section') },
  ),
  thickness: positiveLength('Layer thickness'),
  cells: z
    .union([z.literal('auto'), count(1, LIMITS.cellsPerLayer, 'cells across the layer', 'Finite-volume cells across the layer')], {
      error: () => `expected "auto" or ${wholeNumber(1, LIMITS.cellsPerLayer, 'cells across the layer')}`,
    })
    .default('auto'),
  contact_resistance: quantity('contactResistance', { min: 0, wording: 'a contact resistance of zero or more' }, 'Contact resistance to the next layer outward').prefault(0),
});

const stack = z.strictObject({
  height: quantity('length', { min: 0, exclusiveMin: true, wording: 'a positive height' }, 'Height of the stack above its base (proportions that weaken the model are warned about, not refused)'),
  inner_diameter: quantity('length', { min: 0, exclusiveMin: true, wording: 'a positive diameter' }, 'Inner (flue) diameter'),
  segments: count(1, LIMITS.segments, 'axial segments', 'Axial segments the height is cut into').default(12),
  sectors: count(1, 72, 'circumferential sectors', 'Circumferential sectors of the wall: 1 averages the sun round the circumference; 8 to 36 resolve the sun-facing side').default(1),
  layers: z
    .array(layer, { error: () => 'expected a list of wall layers, from the flue side outward' })
    .min(1, `expected a list of 1 to ${LIMITS.layers} wall layers`)
    .max(LIMITS.layers, `expected at most ${LIMITS.layers} wall layers (a limit of stackday)`)
    .meta({ description: `Wall layers from the flue side outward (1 to ${LIMITS.layers}).` }),
});

const surface = z.strictObject({
  emissivity: ratio(0, 1, 'a fraction', 'Thermal emissivity of the outer surface'),
  solar_absorptance: ratio(0, 1, 'a fraction', 'Solar absorptance of the outer surface'),
});

const outside = z.strictObject({
  film_coefficient: z
    .union([z.literal('auto'), quantity('filmCoefficient', { min: 0, exclusiveMin: true, wording: 'a positive film coefficient' }, 'Fixed outside film coefficient')], {
      error: () => `expected "auto" or ${describeExpected('filmCoefficient', 'a positive film coefficient')}`,
    })
    .default('auto')
    .meta({ description: '"auto" (Churchill–Bernstein / Churchill–Chu, mixed) or a fixed value calibrated by the user.' }),
  radiation: z
    .union([z.enum(['sky-ground', 'none']), z.strictObject({ surroundings: surroundingsTemperature('Temperature of the surroundings') })], {
      error: () => 'expected "sky-ground", "none" or a section { surroundings: temperature in °C }',
    })
    .default('sky-ground'),
  sky: z.enum(Object.keys(SKY_MODELS) as [SkyModelName, ...SkyModelName[]]).default('berdahl-martin').meta({ description: 'Sky temperature model.' }),
  ground_temperature: surroundingsTemperature('Ground temperature (default: the air temperature)').optional(),
  sun: z.boolean().default(true).meta({ description: 'Apply absorbed sun.' }),
  clear_sky: z
    .union(
      [
        z.literal('ashrae-1985'),
        z.strictObject({
          ashrae_2009: z.strictObject({
            tau_b: monthly('Beam optical depth τ_b of each month (the site\'s design-climate table), January first', 0.1, 1.5),
            tau_d: monthly('Diffuse optical depth τ_d of each month, January first', 1, 4),
          }),
        }),
      ],
      { error: () => 'expected "ashrae-1985" or a section { ashrae_2009: { tau_b: [12 values], tau_d: [12 values] } }' },
    )
    .default('ashrae-1985')
    .meta({ description: 'Clear-sky irradiance where the weather has none: "ashrae-1985" (monthly constants interpolated by day), or the 2009 model with the site\'s optical depths.' }),
});

const designDay = z.strictObject({
  min_air_temperature: airTemperature('Daily minimum air temperature'),
  max_air_temperature: airTemperature('Daily maximum air temperature'),
  wind_speed: quantity('speed', { min: 0, max: 75, wording: 'a wind speed from 0 to 75 m/s' }, 'Mean wind speed at the reference height'),
  wind_daily_amplitude: ratio(0, 1, 'a fraction of the mean', 'Daily swing of the wind speed, peaking mid-afternoon').default(0.3),
  cloud_cover: ratio(0, 1, 'a fraction', 'Cloud cover').default(0),
  dew_point: temperature(-100, 60, 'a dew point', 'Dew point of the outside air (default: the daily minimum air temperature, FAO-56 eq. 48)').optional(),
  shape: z
    .enum(['ashrae-2009', 'sinusoid'])
    .default('ashrae-2009')
    .meta({ description: 'Daily course of the air temperature: the published hourly profile (ASHRAE 2009, minimum 05:00, maximum 15:00), or a pure sinusoid with its minimum at minimum_at.' }),
  minimum_at: clockTime.optional().meta({ description: 'Local clock time of the minimum of a sinusoidal day, "HH:MM" (default "05:00").' }),
});

const weather = z
  .strictObject({
    design_day: designDay.optional(),
    file: text('the path of a weather CSV file').optional().meta({ description: 'Weather file (CSV hourly or finer, EPW or TMY3), path relative to the scenario file.' }),
    wind_reference_height: quantity('length', { min: 0.5, max: 300, wording: 'a height from 0.5 m to 300 m' }, 'Height of the wind measurement').prefault(10),
    wind_station_terrain: z
      .enum(Object.keys(TERRAIN_EXPONENTS) as [Terrain, ...Terrain[]])
      .default('open')
      .meta({ description: 'Terrain around the anemometer (a weather station usually stands in open country).' }),
  })
  .check((ctx) => {
    const v = ctx.value;
    if ((v.design_day === undefined) === (v.file === undefined))
      ctx.issues.push({ code: 'custom', input: v, path: [], message: 'found ' + (v.file ? 'both design_day and file' : 'neither design_day nor file') + '; expected exactly one of them' });
  });

const firingPoint = z
  .strictObject({
    time: clockTime,
    gas_temperature: temperature(-50, 1700, 'a gas temperature', 'Gas temperature at the stack inlet'),
    mass_flow: quantity('massFlow', { min: 0, max: 2000, wording: 'a mass flow from 0 to 2000 kg/s' }, 'Flue gas mass flow').optional(),
    volume_flow: quantity('volumeFlow', { min: 0, max: 2000, wording: 'a volume flow from 0 to 7.2 million Nm³/h' }, 'Flue gas volume flow at normal conditions (0 °C, 101.325 kPa), instead of mass_flow').optional(),
  })
  .check((ctx) => {
    const v = ctx.value;
    if ((v.mass_flow === undefined) === (v.volume_flow === undefined))
      ctx.issues.push({ code: 'custom', input: v, path: [], message: `found ${v.mass_flow === undefined ? 'neither mass_flow nor volume_flow' : 'both mass_flow and volume_flow'}; expected exactly one of them` });
  });

const gas = z
  .strictObject({
    fuel: z
      .string({ error: () => `expected one of ${choices(Object.keys(FUELS))}` })
      .meta({ description: `Fuel name (${Object.keys(FUELS).join(', ')}); the flue gas follows by stoichiometry.` })
      .check((ctx) => {
        if (!Object.hasOwn(FUELS, ctx.value)) ctx.issues.push({ code: 'custom', input: ctx.value, message: `expected one of ${choices(Object.keys(FUELS))}` });
      })
      .optional(),
    fuel_analysis: z
      .strictObject({
        C: ratio(0, 1, 'a mass fraction', 'Carbon'),
        H: ratio(0, 1, 'a mass fraction', 'Hydrogen'),
        O: ratio(0, 1, 'a mass fraction', 'Oxygen'),
        N: ratio(0, 1, 'a mass fraction', 'Nitrogen'),
        S: ratio(0, 1, 'a mass fraction', 'Sulfur'),
        moisture: ratio(0, 1, 'a mass fraction', 'Moisture'),
        ash: ratio(0, 1, 'a mass fraction', 'Ash'),
      })
      .optional()
      .meta({ description: 'Your own fuel: ultimate analysis as fired, mass fractions summing to 1 (instead of fuel).' }),
    excess_air: ratio(0, 5, 'a fraction', 'Excess air as a fraction of stoichiometric air (0.15 = 15 %)').optional(),
    sulfur_to_so3: ratio(0, 0.2, 'a fraction', 'Fraction of the fuel sulfur converted to SO3').optional(),
    air_humidity: ratio(0, 0.1, 'kg water per kg dry air', 'Humidity of the combustion air').optional(),
    composition: z
      .strictObject({
        N2: ratio(0, 1, 'a volume fraction', 'Nitrogen (and argon)'),
        O2: ratio(0, 1, 'a volume fraction', 'Oxygen'),
        CO2: ratio(0, 1, 'a volume fraction', 'Carbon dioxide'),
        H2O: ratio(0, 1, 'a volume fraction', 'Water vapour'),
        SO2_ppm: ratio(0, 1e5, 'ppm by volume', 'Sulfur dioxide').default(0),
        SO3_ppm: ratio(0, 1e4, 'ppm by volume', 'Sulfur trioxide').default(0),
      })
      .optional()
      .meta({ description: 'Wet flue gas composition by volume, instead of a fuel.' }),
  })
  .check((ctx) => {
    const v = ctx.value;
    const given = (['fuel', 'fuel_analysis', 'composition'] as const).filter((k) => v[k] !== undefined);
    if (given.length !== 1)
      ctx.issues.push({ code: 'custom', input: v, path: [], message: `found ${given.length === 0 ? 'none' : given.join(' and ')} of fuel, fuel_analysis and composition; expected exactly one of them` });
    else if (given[0] !== 'composition' && v.excess_air === undefined)
      ctx.issues.push({ code: 'custom', input: v, path: ['excess_air'], message: 'expected the excess air as a fraction from 0 to 5 (0.15 = 15 %) with a fuel' });
  });

/** A local date in a plant calendar: `YYYY-MM-DD` (a one-off date) or `MM-DD` (every year). */
const calendarDate = (description: string) =>
  z
    .string()
    .meta({ description: `${description}: a local date "YYYY-MM-DD" (once) or "MM-DD" (every year).` })
    .check((ctx) => {
      const v = ctx.value;
      const m = /^(?:(\d{4})-)?(\d{2})-(\d{2})$/.exec(v);
      // a yearly date is checked in a leap year, so 02-29 passes (it then applies in leap years only)
      const [y, mo, d] = m ? [m[1] === undefined ? 2024 : Number(m[1]), Number(m[2]), Number(m[3])] : [0, 0, 0];
      const t = new Date(Date.UTC(y, mo - 1, d));
      if (!m || t.getUTCFullYear() !== y || t.getUTCMonth() !== mo - 1 || t.getUTCDate() !== d)
        ctx.issues.push({ code: 'custom', input: v, message: 'expected a calendar date "YYYY-MM-DD" (once) or "MM-DD" (every year)' });
    });

const dayScheduleName = (description: string) => z.string().min(1).meta({ description: `${description}: the name of a day-schedule in days.` });

const weekPattern = z
  .strictObject({
    weekdays: dayScheduleName('Monday to Friday').optional(),
    weekend: dayScheduleName('Saturday and Sunday').optional(),
    monday: dayScheduleName('Monday (overrides weekdays)').optional(),
    tuesday: dayScheduleName('Tuesday').optional(),
    wednesday: dayScheduleName('Wednesday').optional(),
    thursday: dayScheduleName('Thursday').optional(),
    friday: dayScheduleName('Friday').optional(),
    saturday: dayScheduleName('Saturday (overrides weekend)').optional(),
    sunday: dayScheduleName('Sunday (overrides weekend)').optional(),
  })
  .meta({ description: 'A week as day-schedule names: weekdays (Monday–Friday) and weekend (Saturday, Sunday); a single day overrides its group.' });

const calendarPeriod = {
  name: z.string().min(1).meta({ description: 'Name of the period, for messages and reports.' }),
  from: calendarDate('First day of the period (inclusive)'),
  to: calendarDate('Last day of the period (inclusive; a yearly period with from after to runs over New Year)'),
};

const calendar = z
  .strictObject({
    days: z
      .record(z.string().regex(/^[A-Za-z0-9][A-Za-z0-9 ._-]*$/, 'expected a name of letters, digits, spaces, ".", "_" or "-"'), z.array(firingPoint).min(1))
      .meta({ description: 'Day-schedules by name: each a list of firing points against local clock time, as in schedule.daily.' }),
    week: weekPattern,
    seasons: z
      .array(
        z.strictObject({
          ...calendarPeriod,
          week: weekPattern.optional(),
          flow_scale: z.number().meta({ description: 'Factor on every scheduled mass flow of the season (> 0; for no firing use a shutdown).' }).optional(),
        }),
      )
      .optional()
      .meta({ description: 'Load seasons: periods with their own week and/or a flow scale; a one-off (dated) season may lie inside a yearly one and then wins.' }),
    shutdowns: z.array(z.strictObject(calendarPeriod)).optional().meta({ description: 'Shutdowns: periods with no firing (they win over any season).' }),
    shutdown_day: z.string().min(1).optional().meta({ description: 'The day-schedule used on shutdown days (every flow 0; its gas temperature is that of the cold plant).' }),
  })
  .meta({ description: 'Plant calendar by local date: named day-schedules, the usual week, load seasons and shutdowns (instead of schedule).' });

const flue = z.strictObject({
  schedule: z
    .strictObject({
      daily: z.array(firingPoint).min(1).optional().meta({ description: 'Firing points repeated every day, piecewise linear in local clock time.' }),
      per_day: z.array(z.array(firingPoint).min(1)).min(1).optional().meta({ description: 'One list of firing points per day, used in turn.' }),
    })
    .check((ctx) => {
      const v = ctx.value;
      if ((v.daily === undefined) === (v.per_day === undefined))
        ctx.issues.push({ code: 'custom', input: v, path: [], message: `found ${v.daily ? 'both daily and per_day' : 'neither daily nor per_day'}; expected exactly one of them` });
    })
    .optional(),
  calendar: calendar.optional(),
  off_mass_flow: quantity('massFlow', { min: 0, wording: 'a mass flow of zero or more' }, 'Natural-draft flow while the burner is off (floor)').optional(),
  gas,
  properties: z.enum(['mixture', 'air']).default('mixture').meta({ description: 'Gas properties: the mixture (NASA polynomials, Wilke mixing) or air.' }),
  film_coefficient: z
    .union([z.literal('auto'), quantity('filmCoefficient', { min: 0, exclusiveMin: true, wording: 'a positive film coefficient' }, 'Fixed inside film coefficient')], {
      error: () => `expected "auto" or ${describeExpected('filmCoefficient', 'a positive film coefficient')}`,
    })
    .default('auto'),
  gas_cooling: z.boolean().default(true).meta({ description: 'Whether the gas cools as it rises (false: every height sees the inlet temperature).' }),
  gas_radiation: z.boolean().default(true).meta({ description: 'Whether the H2O–CO2 flue gas radiates to the lining (weighted sum of grey gases).' }),
  pressure: quantity('pressure', { min: 50_000, max: 120_000, wording: 'a pressure from 50 kPa to 120 kPa' }, 'Absolute pressure in the flue (default: the site pressure)').optional(),
}).check((ctx) => {
  const v = ctx.value;
  if ((v.schedule === undefined) === (v.calendar === undefined))
    ctx.issues.push({ code: 'custom', input: v, path: [], message: `found ${v.schedule ? 'both schedule and calendar' : 'neither schedule nor calendar'}; expected exactly one of them (a daily schedule, or a plant calendar by date)` });
});

const run = z.strictObject({
  mode: z.enum(['cycle', 'warmup']).default('cycle'),
  days: z
    .union([count(1, LIMITS.days, 'days to simulate', 'Days to simulate'), z.literal('until-periodic'), z.literal('year')], {
      error: () => `expected ${wholeNumber(1, LIMITS.days, 'days to simulate')}, "until-periodic" (repeat the first day until the wall's daily cycle settles) or "year" (an annual run)`,
    })
    .optional()
    .meta({ description: 'Days to simulate (default 1), "until-periodic" (repeat the first day until the wall settles), or "year" (an annual run: a year of local days from site.first_day, 365 or 366, with monthly and annual figures).' }),
  last_day: z
    .string()
    .regex(/^\d{4}-\d{2}-\d{2}$/, 'expected a date "YYYY-MM-DD"')
    .optional()
    .meta({ description: 'Last simulated day, local date "YYYY-MM-DD" (instead of days): an annual run from site.first_day to this day, inclusive, at most 366 days.' }),
  periodic_tolerance: quantity('temperatureDifference', { min: 0, exclusiveMin: true, wording: 'a positive temperature difference' }, 'Largest day-to-day change of any node for the periodic state').prefault(0.05),
  max_days: count(1, LIMITS.days, 'days', 'Most days to try for the periodic state').default(30),
  output_interval: quantity('duration', { min: 60, max: 6 * 3600, wording: 'an interval from 1 min to 6 h' }, 'Interval between output instants').prefault(10),
  initial: z
    .union([
      z.enum(['steady', 'steady-at-start', 'cold']),
      z.strictObject({ temperature: temperature(-60, 1500, 'a wall temperature', 'Temperature of the whole wall at the start') }),
      z.strictObject({ from: z.string().min(1).meta({ description: 'A state.json written by an earlier run (path relative to the scenario file): the wall continues from where that run ended.' }) }),
    ])
    .default('steady')
    .meta({ description: 'Initial wall: steady at the daily-mean conditions, steady at the first instant, cold (at air temperature), {temperature: 12} (uniform), or {from: state.json} (where an earlier run ended).' }),
  firing_start: clockTime.optional(),
  integrator: z.enum(Object.keys(INTEGRATORS) as [IntegratorName, ...IntegratorName[]]).default('implicit'),
  relative_tolerance: ratio(1e-9, 1e-2, 'a relative tolerance', 'Relative tolerance of the integrator').default(DEFAULT_RELATIVE_TOLERANCE),
  absolute_tolerance: quantity('temperatureDifference', { min: 1e-6, max: 1, wording: 'a temperature difference from 1e-6 K to 1 K' }, 'Absolute tolerance of the integrator').prefault(DEFAULT_ABSOLUTE_TOLERANCE_K),
  accuracy: z
    .union([z.enum(['estimate', 'off']), quantity('temperatureDifference', { min: 0, exclusiveMin: true, wording: 'a positive temperature difference' }, 'Accuracy target')], {
      error: () => `expected "estimate", "off" or an accuracy target: ${describeExpected('temperatureDifference', 'a positive temperature difference')}`,
    })
    .default('estimate')
    .meta({ description: 'Accuracy statement: "estimate" (a second solve on a finer mesh at tighter tolerances gives ± on every reported figure), "off", or a target in K that the run is refined toward.' }),
});

/** What a run writes of one per-instant file. */
const seriesFile = (file: string) =>
  z
    .enum(['all', 'last-day', 'daily-extremes', 'off'])
    .optional()
    .meta({
      description: `What ${file} holds: every output instant (all), the last simulated day (last-day), per day the lowest and highest value of every column (daily-extremes), or no file (off). Default: all; daily-extremes for an annual run (run.days: year or run.last_day).`,
    });
const seriesFileInterval = (file: string) =>
  quantity('duration', { min: 60, max: 24 * 3600, wording: 'an interval from 1 min to 24 h' }, `Write ${file} rows only at whole multiples of this after the run's start (with all and last-day; a whole multiple of run.output_interval)`).optional();

const output = z.strictObject({
  timeseries: seriesFile('timeseries.csv'),
  timeseries_interval: seriesFileInterval('timeseries.csv'),
  segments: seriesFile('segments.csv'),
  segments_interval: seriesFileInterval('segments.csv'),
});

const limits = z.strictObject({
  shell_touch: limitTemperature('Highest allowed outer-surface temperature (touch / burn limit)').optional(),
  lining_service: limitTemperature('Highest allowed lining temperature (default: the lining material limit)').optional(),
  allowable_stress: quantity('stress', { min: 0, exclusiveMin: true, wording: 'a positive stress' }, 'Allowable thermal stress').optional(),
  acid_dew_margin: quantity('temperatureDifference', { min: 0, wording: 'a margin of zero or more' }, 'Required margin of the inner surface above the acid dew point').optional(),
  water_dew_margin: quantity('temperatureDifference', { min: 0, wording: 'a margin of zero or more' }, 'Required margin of the inner surface above the water dew point').optional(),
  acid_dew_hours_per_year: z.number().min(0).max(8784).optional().meta({ description: 'Annual runs: most hours a year the inner surface may spend below the acid dew point at any height, h (0 to 8784).' }),
  water_dew_hours_per_year: z.number().min(0).max(8784).optional().meta({ description: 'Annual runs: most hours a year below the water dew point at any height, h (0 to 8784).' }),
  cycles_above: z
    .strictObject({
      range: quantity('temperatureDifference', { min: 0, exclusiveMin: true, wording: 'a positive temperature difference' }, 'Range of the temperature difference across a layer above which a thermal cycle counts'),
      count: count(0, 1e9, 'cycles a year', 'Most such cycles a year at any height, in any layer or across the whole wall').optional(),
    })
    .optional()
    .meta({ description: 'Annual runs: thermal cycles (rainflow, ASTM E1049) of the temperature difference across each layer and the whole wall with a range above `range`, counted; with `count`, a limit on them per year.' }),
});

/**
 * Variants of the scenario in the same file, by name: each a mapping of overrides (a section merged
 * key by key, a list or a value replaced, a key path such as `stack.layers[1].thickness` setting one
 * value, null removing a key). Each variant is validated as its own scenario by validate.ts.
 */
const variants = z
  .record(z.string(), z.unknown())
  .meta({ description: 'Named variants of this scenario (for `stackday compare`): each a mapping of the keys it changes, e.g. `stack.layers[1].thickness: 100 mm`.' })
  .check((ctx) => {
    for (const [name, changes] of Object.entries(ctx.value)) {
      if (!/^[A-Za-z0-9][A-Za-z0-9._-]*$/.test(name))
        ctx.issues.push({ code: 'custom', input: name, path: [name], message: `found the name ${JSON.stringify(name)}; expected a variant name of letters, digits, ".", "_" or "-", starting with a letter or digit` });
      else if (changes === null || typeof changes !== 'object' || Array.isArray(changes))
        ctx.issues.push({ code: 'custom', input: changes, path: [name], message: 'expected a mapping of the keys the variant changes' });
    }
  });

/** Names become folder names: short, and only characters every file system takes. */
const NAME_WORDING = `expected a name of 1 to ${LIMITS.nameLength} letters, digits, ".", "_" or "-", starting with a letter or digit (it names the output folder)`;

export const scenarioSchema = z
  .strictObject({
    name: z
      .string({ error: () => NAME_WORDING })
      .regex(/^[A-Za-z0-9][A-Za-z0-9._-]*$/, NAME_WORDING)
      .max(LIMITS.nameLength, NAME_WORDING)
      .meta({ description: `Scenario name; also the default output folder out/<name>/ (1 to ${LIMITS.nameLength} letters, digits, ".", "_" or "-").` }),
    description: z
      .string({ error: () => 'expected a description (text)' })
      .refine((v) => !CONTROL.test(v), 'expected a description (text without control characters)')
      .optional(),
    site,
    stack,
    surface,
    outside: outside.prefault({}),
    weather,
    flue,
    run: run.prefault({}),
    output: output.prefault({}),
    limits: limits.prefault({}),
    variants: variants.optional(),
  })
  .meta({ title: 'stackday scenario', description: 'A stack, its wall build-up, the site, the weather, the firing and the run.' });

export type Scenario = z.output<typeof scenarioSchema>;
export type ScenarioLayer = z.output<typeof layer>;
export type ScenarioMaterial = z.output<typeof inlineMaterial>;

/** JSON Schema of the scenario file (input side: what a user may write). */
export function scenarioJsonSchema(): object {
  return z.toJSONSchema(scenarioSchema, { io: 'input', unrepresentable: 'any' });
}
