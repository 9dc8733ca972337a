/**
 * Building blocks for model tests: materials with constant properties and minimal model inputs
 * with fixed film coefficients, no sun and no radiation unless a test asks for them. Invented
 * test data; every check against it compares with an analytic result named in the test.
 */
import type { Material } from '../../src/physics/materials/types.ts';
import type { ModelInputs, LayerInput } from '../../src/model/inputs.ts';
import type { WeatherSource, AirState } from '../../src/physics/outside/weather.ts';

/** A solid with constant k, ρ, c_p. */
export function constantMaterial(name: string, conductivity: number, density: number, specificHeat: number, extra: Partial<Material> = {}): Material {
  return {
    name,
    description: 'constant-property test material',
    kind: 'solid',
    density,
    conductivity: { temperatureK: [300], values: [conductivity] },
    specificHeat: { temperatureK: [300], values: [specificHeat] },
    emissivity: 0.9,
    maxServiceTemperatureK: 2000,
    youngsModulus: 0,
    thermalExpansion: 0,
    poissonRatio: 0.2,
    source: 'test data',
    ...extra,
  };
}

export function layer(material: Material, thickness: number, cells: number | 'auto' = 'auto', contactResistanceToNext = 0, label = material.name): LayerInput {
  return { label, material, thickness, cells, contactResistanceToNext };
}

/** A weather source with the air temperature given as a function of UTC ms. */
export function airSource(airTemperatureK: (utcMs: number) => number, windSpeed = 0): WeatherSource {
  return {
    referenceHeightM: 10,
    at: (utcMs: number): AirState => ({ airTemperatureK: airTemperatureK(utcMs), windSpeed, cloudCover: 0, dewPointK: 250 }),
  };
}

/** Minimal inputs: one segment, fixed film coefficients, no sun, no radiation, uniform gas temperature. */
export function baseInputs(over: Partial<ModelInputs> & { layers: readonly LayerInput[] }): ModelInputs {
  const base: ModelInputs = {
    name: 'test',
    site: { name: 'test site', latitudeDeg: 45, longitudeDeg: 0, elevationM: 0, timeZone: 'UTC', startDate: '2026-03-20', groundReflectance: 0.2, windExponent: 0.22 },
    stack: { height: 10, innerDiameter: 2, segments: 1 },
    layers: over.layers,
    surface: { emissivity: 0.9, solarAbsorptance: 0.7 },
    outside: { filmCoefficient: 10, radiation: { kind: 'none' }, sun: false },
    weather: { kind: 'source', source: airSource(() => 293.15) },
    flue: {
      schedule: { daily: [{ clockS: 0, inletTemperatureK: 473.15, massFlow: 1 }] },
      composition: { N2: 0.73, O2: 0.03, CO2: 0.09, H2O: 0.15, SO2: 0, SO3: 0 },
      properties: 'mixture',
      filmCoefficient: 20,
      gasCooling: false,
      pressurePa: 101325,
    },
    run: { mode: 'cycle', length: { kind: 'days', days: 1 }, outputInterval: 600, initial: 'steady-at-start', integrator: 'implicit', rtol: 1e-6, atol: 1e-4 },
    limits: {},
  };
  return { ...base, ...over };
}

/**
 * Inputs with fixed film coefficients on both sides, constant air and gas temperatures, no sun and
 * no radiation: the setting of the closed-form checks (series resistances, lumped capacitance).
 */
export function fixedFilmInputs(
  o: { layers: readonly LayerInput[]; hIn: number; hOut: number; gasK: number; airK: number; composition?: ModelInputs['flue']['composition'] } & Partial<Omit<ModelInputs, 'layers'>>,
): ModelInputs {
  const { hIn, hOut, gasK, airK, composition, ...over } = o;
  const base = baseInputs({ layers: o.layers });
  return baseInputs({
    outside: { filmCoefficient: hOut, radiation: { kind: 'none' }, sun: false },
    weather: { kind: 'source', source: airSource(() => airK) },
    flue: { ...base.flue, ...(composition ? { composition } : {}), filmCoefficient: hIn, schedule: { daily: [{ clockS: 0, inletTemperatureK: gasK, massFlow: 1 }] } },
    ...over,
  });
}
