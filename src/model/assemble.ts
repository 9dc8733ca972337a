/**
 * Assembling the model from validated inputs: the site clock, the wall mesh, the stack geometry
 * with the wind factor of each segment, the firing schedule, the flue-gas property table and the
 * ODE system. Nothing here reads files or knows the scenario format.
 */
import type { ModelInputs } from './inputs.ts';
import { makeSiteClock, type SiteClock } from './clock.ts';
import { buildWallMesh, type WallMesh } from '../physics/wall/mesh.ts';
import { StackWallSystem, type StackGeometry } from './system.ts';
import type { DriverContext } from './drivers.ts';
import { windAtHeight } from '../physics/outside/wind.ts';
import { makeFiringSchedule } from './firing.ts';
import { makeGasPropertyTable, airAsFlueGas, type GasPropertyLookup } from '../physics/properties/flueGas.ts';

/** The model assembled for one run. */
export interface AssembledModel {
  readonly inputs: ModelInputs;
  readonly clock: SiteClock;
  readonly mesh: WallMesh;
  readonly geometry: StackGeometry;
  readonly gas: GasPropertyLookup;
  readonly system: StackWallSystem;
  readonly ctx: DriverContext;
}

/** Build the mesh, the drivers and the ODE system for the inputs. */
export function assembleModel(inputs: ModelInputs): AssembledModel {
  const clock = makeSiteClock(inputs.site.timeZone, inputs.site.startDate);
  const mesh = buildWallMesh(inputs.layers, inputs.stack.innerDiameter / 2);
  const segments = inputs.stack.segments;
  const dz = inputs.stack.height / segments;
  const weather = inputs.weather.source;
  const midHeight = new Float64Array(segments);
  const windFactor = new Float64Array(segments);
  for (let s = 0; s < segments; s++) {
    midHeight[s] = (s + 0.5) * dz;
    windFactor[s] = windAtHeight(1, weather.referenceHeightM, midHeight[s]!, inputs.site.windExponent);
  }
  const geometry: StackGeometry = {
    segments,
    segmentLength: dz,
    midHeight,
    windFactor,
    innerDiameter: inputs.stack.innerDiameter,
    outerDiameter: 2 * mesh.outerRadius,
  };
  const schedule = makeFiringSchedule({ ...inputs.flue.schedule, offMassFlow: inputs.flue.offMassFlow });
  const composition = inputs.flue.properties === 'air' ? airAsFlueGas : inputs.flue.composition;
  const gas = makeGasPropertyTable(composition, inputs.flue.pressurePa);
  const ctx: DriverContext = {
    inputs,
    clock,
    weather,
    schedule,
    outerDiameter: geometry.outerDiameter,
    repeatFirstDay: inputs.run.length.kind === 'until-periodic',
  };
  const system = new StackWallSystem(inputs, mesh, geometry, ctx, gas);
  return { inputs, clock, mesh, geometry, gas, system, ctx };
}
