/**
 * Assembling the model from validated inputs: the site clock, the wall mesh, the stack geometry
 * with the wind factor of each segment, the firing schedule, the flue-gas property table and the
 * ODE system. Nothing here reads files or knows the scenario format.
 */
import type { ModelInputs } from './inputs.ts';
import { makeSiteClock, type SiteClock } from './clock.ts';
import { buildWallMesh, type WallMesh } from '../physics/wall/mesh.ts';
import { forcingTimeScales, type ForcingTimeScales } from './forcing.ts';
import { StackWallSystem, type StackGeometry } from './system.ts';
import type { DriverContext } from './drivers.ts';
import { TERRAIN_BOUNDARY_LAYERS, windAtHeight, windAtHeightFromStation } from '../physics/outside/wind.ts';
import { makeFiringSchedule, type FiringSchedule } from './firing.ts';
import { makePlantCalendar } from './calendar.ts';
import { makeGasPropertyTable, type GasPropertyLookup } from '../physics/properties/flueGas.ts';
import { makeAirGasPropertyLookup } from '../physics/properties/airGasLookup.ts';

/** The model assembled for one run. */
export interface AssembledModel {
  readonly inputs: ModelInputs;
  readonly clock: SiteClock;
  readonly mesh: WallMesh;
  /** The forcing time scales the automatic mesh resolves. */
  readonly forcing: ForcingTimeScales;
  readonly geometry: StackGeometry;
  readonly gas: GasPropertyLookup;
  readonly system: StackWallSystem;
  readonly ctx: DriverContext;
  /** Atmospheric pressure at the site, Pa. */
  readonly sitePressurePa: number;
}

/**
 * Wind at each height per unit wind at the weather's reference height: the two-terrain power law
 * from the station's terrain to the site's (capped at the site's boundary-layer height) when both
 * are known, else the site's exponent applied to the reading directly.
 */
function windFactors(inputs: ModelInputs, referenceHeightM: number, midHeight: Float64Array): Float64Array {
  const { siteTerrain, stationTerrain, windExponent } = inputs.site;
  return midHeight.map((z) =>
    siteTerrain && stationTerrain
      ? windAtHeightFromStation(1, referenceHeightM, TERRAIN_BOUNDARY_LAYERS[stationTerrain], z, TERRAIN_BOUNDARY_LAYERS[siteTerrain])
      : windAtHeight(1, referenceHeightM, z, windExponent),
  );
}

/** Properties of the flue gas at a temperature, as the run uses them: `properties: air` reads the same air table as the outside film. */
export function flueGasPropertyLookup(inputs: ModelInputs): GasPropertyLookup {
  return inputs.flue.properties === 'air' ? makeAirGasPropertyLookup(inputs.flue.pressurePa) : makeGasPropertyTable(inputs.flue.composition, inputs.flue.pressurePa);
}

/** The firing schedule of the inputs: daily or per-day points, or a plant calendar from the run's first local date. */
function firingScheduleOf(inputs: ModelInputs): FiringSchedule {
  const { schedule, offMassFlow } = inputs.flue;
  if ('calendar' in schedule) return makePlantCalendar({ ...schedule.calendar, offMassFlow: offMassFlow ?? schedule.calendar.offMassFlow }).firingSchedule(inputs.site.startDate);
  return makeFiringSchedule({ ...schedule, offMassFlow });
}

/**
 * Build the mesh, the drivers and the ODE system for the inputs; `meshRefinement` cuts every cell
 * of the scenario's mesh into that many (the nested finer mesh of an accuracy check).
 */
export function assembleModel(inputs: ModelInputs, meshRefinement = 1): AssembledModel {
  const clock = makeSiteClock(inputs.site.timeZone, inputs.site.startDate);
  const forcing = forcingTimeScales(inputs);
  const mesh = buildWallMesh(inputs.layers, inputs.stack.innerDiameter / 2, {
    flueSideTimeScaleS: forcing.flueSide.timeScaleS,
    outsideTimeScaleS: forcing.outside.timeScaleS,
    refinement: meshRefinement,
  });
  const segments = inputs.stack.segments;
  const dz = inputs.stack.height / segments;
  const weather = inputs.weather.source;
  const midHeight = new Float64Array(segments).map((_, s) => (s + 0.5) * dz);
  const windFactor = windFactors(inputs, weather.referenceHeightM, midHeight);
  const geometry: StackGeometry = {
    segments,
    segmentLength: dz,
    midHeight,
    windFactor,
    innerDiameter: inputs.stack.innerDiameter,
    outerDiameter: 2 * mesh.outerRadius,
  };
  const schedule = firingScheduleOf(inputs);
  const gas = flueGasPropertyLookup(inputs);
  const ctx: DriverContext = {
    inputs,
    clock,
    weather,
    schedule,
    outerDiameter: geometry.outerDiameter,
    repeatFirstDay: inputs.run.length.kind === 'until-periodic',
  };
  const system = new StackWallSystem(inputs, mesh, geometry, ctx, gas);
  return { inputs, clock, mesh, forcing, geometry, gas, system, ctx, sitePressurePa: system.sitePressurePa };
}
