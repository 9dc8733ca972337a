/**
 * The scenario file format: a YAML (or JSON) document validated with zod. Every dimensional value
 * is a plain number in the unit its key documents, or a string with a unit; values come out of
 * this schema already converted to SI (kelvin for temperatures). Unknown keys are errors.
 */
import { z } from 'zod';
import { parseQuantity, parseClockTime, describeExpected, QUANTITY_KINDS, type QuantityKindName } from './units.ts';
import { findMaterial, suggestMaterial } from '../../physics/materials/index.ts';
import { FUELS } from '../../physics/flue/fuels.ts';
import { isValidTimeZone } from '../../model/clock.ts';
import { TERRAIN_EXPONENTS, type Terrain } from '../../physics/outside/wind.ts';
import { SKY_MODELS, type SkyModelName } from '../../physics/outside/boundary.ts';
import { INTEGRATORS, type IntegratorName } from '../../solver/index.ts';

interface Bounds {
  /** Smallest allowed SI value (inclusive unless `exclusiveMin`). */
  readonly min?: number;
  readonly exclusiveMin?: boolean;
  readonly max?: number;
  /** Words for the bound, e.g. "a positive length". */
  readonly wording?: string;
}

const show = (v: unknown) => (typeof v === 'string' ? `"${v}"` : JSON.stringify(v));

/** A value with a unit; output is the SI number. */
export function quantity(kind: QuantityKindName, bounds: Bounds = {}, description?: string) {
  const k = QUANTITY_KINDS[kind];
  const input = z.union([z.number(), z.string()]).meta({
    description: `${description ? `${description}. ` : ''}${k.what[0]!.toUpperCase()}${k.what.slice(1)}: a plain number in ${k.plainUnit}, or a string with a unit.`,
  });
  return input.transform((v, ctx) => {
    const parsed = parseQuantity(v, kind);
    if (!parsed.ok) {
      ctx.addIssue({ code: 'custom', message: `found ${show(v)}; expected ${parsed.expected}` });
      return z.NEVER;
    }
    const x = parsed.value;
    const low = bounds.min !== undefined && (bounds.exclusiveMin ? x <= bounds.min : x < bounds.min);
    const high = bounds.max !== undefined && x > bounds.max;
    if (low || high) {
      ctx.addIssue({ code: 'custom', message: `found ${show(v)}; expected ${describeExpected(kind, bounds.wording)}` });
      return z.NEVER;
    }
    return x;
  });
}

/** A dimensionless number with bounds. */
function ratio(min: number, max: number, what: string, description: string) {
  return z.number().meta({ description: `${description} (${what}, ${min} to ${max}).` }).check((ctx) => {
    const v = ctx.value;
    if (!(v >= min && v <= max)) ctx.issues.push({ code: 'custom', input: v, message: `found ${show(v)}; expected ${what} between ${min} and ${max}` });
  });
}

function count(min: number, max: number, description: string) {
  return z.number().meta({ description: `${description} (whole number, ${min} to ${max}).` }).check((ctx) => {
    const v = ctx.value;
    if (!(Number.isInteger(v) && v >= min && v <= max)) ctx.issues.push({ code: 'custom', input: v, message: `found ${show(v)}; expected a whole number from ${min} to ${max}` });
  });
}

/** Twelve dimensionless monthly values within [min, max]. */
function monthly(description: string, min: number, max: number) {
  return z
    .array(ratio(min, max, 'an optical depth', description))
    .length(12, 'expected 12 values, January to December')
    .meta({ description: `${description}: 12 values, January to December.` });
}

const clockTime = z
  .string()
  .meta({ description: 'Local clock time, "HH:MM" (00:00 to 24:00).' })
  .transform((v, ctx) => {
    const s = parseClockTime(v);
    if (s === null) {
      ctx.addIssue({ code: 'custom', message: `found ${show(v)}; expected a local clock time "HH:MM" from 00:00 to 24:00` });
      return z.NEVER;
    }
    return s;
  });

const ABSOLUTE_ZERO_WORDING = 'a temperature above absolute zero';
const temperature = (description: string) => quantity('temperature', { min: 0, exclusiveMin: true, wording: ABSOLUTE_ZERO_WORDING }, description);
const positiveLength = (description: string) => quantity('length', { min: 0, exclusiveMin: true, wording: 'a positive length' }, description);

const site = z.strictObject({
  name: z.string().min(1).meta({ description: 'Name of the site, for reports.' }),
  latitude: ratio(-90, 90, 'degrees north', 'Latitude, degrees north (negative south)'),
  longitude: ratio(-180, 180, 'degrees east', 'Longitude, degrees east (negative west)'),
  elevation: quantity('length', { min: -500, max: 9000, wording: 'an elevation between -500 m and 9000 m' }, 'Elevation above sea level').prefault(0),
  pressure: quantity('pressure', { min: 30_000, max: 110_000, wording: 'a pressure from 30 kPa to 110 kPa' }, 'Atmospheric pressure at the site (default: the standard atmosphere at the elevation)').optional(),
  time_zone: z
    .string()
    .meta({ description: 'IANA time zone of the site, e.g. "Europe/Oslo".' })
    .check((ctx) => {
      if (!isValidTimeZone(ctx.value))
        ctx.issues.push({ code: 'custom', input: ctx.value, message: `found "${ctx.value}"; expected an IANA time zone such as "Europe/Oslo" or "America/Chicago"` });
    }),
  first_day: z.string().regex(/^\d{4}-\d{2}-\d{2}$/, 'expected a date "YYYY-MM-DD"').meta({ description: 'First simulated day, local date "YYYY-MM-DD".' }),
  ground_reflectance: ratio(0, 1, 'a fraction', 'Solar reflectance (albedo) of the ground around the stack').default(0.2),
  terrain: z
    .union([z.enum(Object.keys(TERRAIN_EXPONENTS) as [Terrain, ...Terrain[]]), ratio(0.05, 0.6, 'a power-law exponent', 'Wind power-law exponent')])
    .default('suburban')
    .meta({
      description: `Terrain around the stack for the wind profile: ${Object.keys(TERRAIN_EXPONENTS).join(', ')} (the station's reading is converted by the two-terrain power law), or a power-law exponent applied to the reading directly.`,
    }),
});

const propertyTable = (kind: 'conductivity' | 'specificHeat', description: string) =>
  z.union([
    quantity(kind, { min: 0, exclusiveMin: true, wording: 'a positive value' }, description),
    z
      .array(z.tuple([z.number(), z.number()]))
      .min(1)
      .meta({ description: `${description}: table of [temperature in °C, value in ${QUANTITY_KINDS[kind].plainUnit}] pairs, temperatures increasing.` }),
  ]);

const inlineMaterial = z.strictObject({
  name: z.string().min(1).meta({ description: 'Name for reports.' }),
  density: quantity('density', { min: 0, exclusiveMin: true, wording: 'a positive density' }, 'Density'),
  conductivity: propertyTable('conductivity', 'Thermal conductivity'),
  specific_heat: propertyTable('specificHeat', 'Specific heat'),
  emissivity: ratio(0, 1, 'a fraction', 'Surface emissivity').default(0.9),
  max_service_temperature: temperature('Maximum service temperature'),
  youngs_modulus: quantity('stress', { min: 0, exclusiveMin: true, wording: 'a positive modulus' }, "Young's modulus").optional(),
  thermal_expansion: z.number().positive().meta({ description: 'Linear thermal expansion coefficient, 1/K.' }).optional(),
  poisson_ratio: ratio(0, 0.5, 'a ratio', "Poisson's ratio").optional(),
  source: z.string().default('user data').meta({ description: 'Where the numbers come from.' }),
});

const layer = z.strictObject({
  label: z.string().min(1).optional().meta({ description: 'Label for reports, e.g. "liner". Default: the material name.' }),
  material: z.union([
    z
      .string()
      .meta({ description: 'Name of a material in the library (`stackday materials`).' })
      .check((ctx) => {
        if (findMaterial(ctx.value)) return;
        const hint = suggestMaterial(ctx.value);
        ctx.issues.push({
          code: 'custom',
          input: ctx.value,
          message: `found "${ctx.value}"; expected a material from the library${hint ? ` (did you mean "${hint}"?)` : ''}; \`stackday materials\` lists them`,
        });
      }),
    inlineMaterial,
  ]),
  thickness: positiveLength('Layer thickness'),
  cells: z.union([z.literal('auto'), count(1, 200, 'Finite-volume cells across the layer')]).default('auto'),
  contact_resistance: quantity('contactResistance', { min: 0, wording: 'a contact resistance of zero or more' }, 'Contact resistance to the next layer outward').prefault(0),
});

const stack = z.strictObject({
  height: quantity('length', { min: 0, exclusiveMin: true, max: 500, wording: 'a height above 0 m and up to 500 m' }, 'Height of the stack above its base'),
  inner_diameter: quantity('length', { min: 0.05, max: 30, wording: 'a diameter from 0.05 m to 30 m' }, 'Inner (flue) diameter'),
  segments: count(1, 200, 'Axial segments the height is cut into').default(12),
  layers: z.array(layer).min(1).meta({ description: 'Wall layers from the flue side outward.' }),
});

const surface = z.strictObject({
  emissivity: ratio(0, 1, 'a fraction', 'Thermal emissivity of the outer surface'),
  solar_absorptance: ratio(0, 1, 'a fraction', 'Solar absorptance of the outer surface'),
});

const outside = z.strictObject({
  film_coefficient: z
    .union([z.literal('auto'), quantity('filmCoefficient', { min: 0, exclusiveMin: true, wording: 'a positive film coefficient' }, 'Fixed outside film coefficient')])
    .default('auto')
    .meta({ description: '"auto" (Churchill–Bernstein / Churchill–Chu, mixed) or a fixed value calibrated by the user.' }),
  radiation: z
    .union([z.enum(['sky-ground', 'none']), z.strictObject({ surroundings: temperature('Temperature of the surroundings') })])
    .default('sky-ground'),
  sky: z.enum(Object.keys(SKY_MODELS) as [SkyModelName, ...SkyModelName[]]).default('berdahl-martin').meta({ description: 'Sky temperature model.' }),
  ground_temperature: temperature('Ground temperature (default: the air temperature)').optional(),
  sun: z.boolean().default(true).meta({ description: 'Apply absorbed sun.' }),
  clear_sky: z
    .union([
      z.literal('ashrae-1985'),
      z.strictObject({
        ashrae_2009: z.strictObject({
          tau_b: monthly('Beam optical depth τ_b of each month (the site\'s design-climate table), January first', 0.1, 1.5),
          tau_d: monthly('Diffuse optical depth τ_d of each month, January first', 1, 4),
        }),
      }),
    ])
    .default('ashrae-1985')
    .meta({ description: 'Clear-sky irradiance where the weather has none: "ashrae-1985" (monthly constants interpolated by day), or the 2009 model with the site\'s optical depths.' }),
});

const designDay = z.strictObject({
  min_air_temperature: temperature('Daily minimum air temperature'),
  max_air_temperature: temperature('Daily maximum air temperature'),
  wind_speed: quantity('speed', { min: 0, max: 75, wording: 'a wind speed from 0 to 75 m/s' }, 'Mean wind speed at the reference height'),
  wind_daily_amplitude: ratio(0, 1, 'a fraction of the mean', 'Daily swing of the wind speed, peaking mid-afternoon').default(0.3),
  cloud_cover: ratio(0, 1, 'a fraction', 'Cloud cover').default(0),
  dew_point: temperature('Dew point of the outside air (default: the daily minimum air temperature, FAO-56 eq. 48)').optional(),
});

const weather = z
  .strictObject({
    design_day: designDay.optional(),
    file: z.string().min(1).optional().meta({ description: 'Hourly weather CSV, path relative to the scenario file.' }),
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
    gas_temperature: temperature('Gas temperature at the stack inlet'),
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
      .string()
      .meta({ description: `Fuel name (${Object.keys(FUELS).join(', ')}); the flue gas follows by stoichiometry.` })
      .check((ctx) => {
        if (!Object.hasOwn(FUELS, ctx.value)) ctx.issues.push({ code: 'custom', input: ctx.value, message: `found "${ctx.value}"; expected one of ${Object.keys(FUELS).join(', ')}` });
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
      ctx.issues.push({ code: 'custom', input: v, path: ['excess_air'], message: 'missing; expected the excess air as a fraction (0.15 = 15 %) with a fuel' });
  });

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
    }),
  off_mass_flow: quantity('massFlow', { min: 0, wording: 'a mass flow of zero or more' }, 'Natural-draft flow while the burner is off (floor)').optional(),
  gas,
  properties: z.enum(['mixture', 'air']).default('mixture').meta({ description: 'Gas properties: the mixture (NASA polynomials, Wilke mixing) or air.' }),
  film_coefficient: z
    .union([z.literal('auto'), quantity('filmCoefficient', { min: 0, exclusiveMin: true, wording: 'a positive film coefficient' }, 'Fixed inside film coefficient')])
    .default('auto'),
  gas_cooling: z.boolean().default(true).meta({ description: 'Whether the gas cools as it rises (false: every height sees the inlet temperature).' }),
  gas_radiation: z.boolean().default(true).meta({ description: 'Whether the H2O–CO2 flue gas radiates to the lining (weighted sum of grey gases).' }),
  pressure: quantity('pressure', { min: 50_000, max: 120_000, wording: 'a pressure from 50 kPa to 120 kPa' }, 'Absolute pressure in the flue (default: the site pressure)').optional(),
});

const run = z.strictObject({
  mode: z.enum(['cycle', 'warmup']).default('cycle'),
  days: z.union([count(1, 366, 'Days to simulate'), z.literal('until-periodic')]).default(1),
  periodic_tolerance: quantity('temperatureDifference', { min: 0, exclusiveMin: true, wording: 'a positive temperature difference' }, 'Largest day-to-day change of any node for the periodic state').prefault(0.05),
  max_days: count(1, 366, 'Most days to try for the periodic state').default(30),
  output_interval: quantity('duration', { min: 60, max: 6 * 3600, wording: 'an interval from 1 min to 6 h' }, 'Interval between output instants').prefault(10),
  initial: z.enum(['steady', 'steady-at-start', 'cold']).default('steady').meta({ description: 'Initial wall: steady at the daily-mean conditions, steady at the first instant, or cold (at air temperature).' }),
  firing_start: clockTime.optional(),
  integrator: z.enum(Object.keys(INTEGRATORS) as [IntegratorName, ...IntegratorName[]]).default('implicit'),
  relative_tolerance: z.number().min(1e-9).max(1e-2).default(1e-5),
  absolute_tolerance: quantity('temperatureDifference', { min: 1e-6, max: 1, wording: 'a temperature difference from 1e-6 K to 1 K' }, 'Absolute tolerance of the integrator').prefault(0.01),
});

const limits = z.strictObject({
  shell_touch: temperature('Highest allowed outer-surface temperature (touch / burn limit)').optional(),
  lining_service: temperature('Highest allowed lining temperature (default: the lining material limit)').optional(),
  allowable_stress: quantity('stress', { min: 0, exclusiveMin: true, wording: 'a positive stress' }, 'Allowable thermal stress').optional(),
  acid_dew_margin: quantity('temperatureDifference', { min: 0, wording: 'a margin of zero or more' }, 'Required margin of the inner surface above the acid dew point').optional(),
  water_dew_margin: quantity('temperatureDifference', { min: 0, wording: 'a margin of zero or more' }, 'Required margin of the inner surface above the water dew point').optional(),
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
        ctx.issues.push({ code: 'custom', input: name, path: [name], message: `found the name ${show(name)}; expected a variant name of letters, digits, ".", "_" or "-"` });
      else if (changes === null || typeof changes !== 'object' || Array.isArray(changes))
        ctx.issues.push({ code: 'custom', input: changes, path: [name], message: `found ${show(changes)}; expected a mapping of the keys the variant changes` });
    }
  });

export const scenarioSchema = z
  .strictObject({
    name: z.string().regex(/^[A-Za-z0-9][A-Za-z0-9._-]*$/, 'expected a short name of letters, digits, ".", "_" or "-"').meta({ description: 'Scenario name; also the default output folder out/<name>/.' }),
    description: z.string().optional(),
    site,
    stack,
    surface,
    outside: outside.prefault({}),
    weather,
    flue,
    run: run.prefault({}),
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
