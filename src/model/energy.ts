/**
 * The energy account of a run or of one day: heat from the gas into the wall, stored in the wall,
 * lost outside by convection and radiation, and absorbed from the sun; the residual
 * in − stored − out says how well the integration conserves energy.
 */
import { nodeEnthalpyChange, type WallMesh } from '../physics/wall/mesh.ts';
import type { EnergyAccount } from './timeseries.ts';
import { AUX_CONVECTION, AUX_GAS_TO_WALL, AUX_RADIATION, AUX_SUN, type StackGeometry } from './system.ts';

/**
 * Account over a period from the integrated heat flows `aux` (J, channels AUX_*) and the wall states
 * at its start and end (sensible heat by the exact integral of the tabulated c_p).
 */
export function energyAccount(mesh: WallMesh, geometry: StackGeometry, aux: Float64Array, yStart: Float64Array, yEnd: Float64Array, periodS: number): EnergyAccount {
  const n = mesh.nodeCount;
  // columns: segments × sectors; each sector's nodes stand for the whole circumference (1/sectors of it is its own)
  const columns = yStart.length / n;
  const share = geometry.segments / columns;
  let stored = 0;
  for (let c = 0; c < columns; c++)
    for (let i = 0; i < n; i++) stored += nodeEnthalpyChange(mesh, i, yStart[c * n + i]!, yEnd[c * n + i]!) * geometry.segmentLength;
  if (share !== 1) stored *= share;
  const gas = aux[AUX_GAS_TO_WALL]!;
  const conv = aux[AUX_CONVECTION]!;
  const rad = aux[AUX_RADIATION]!;
  const sun = aux[AUX_SUN]!;
  const residual = gas + sun - stored - conv - rad;
  const scale = Math.max(Math.abs(gas), Math.abs(sun), Math.abs(conv) + Math.abs(rad), Math.abs(stored), 1e-30);
  return { gasToWallJ: gas, convectionJ: conv, radiationJ: rad, sunJ: sun, storedJ: stored, residualPercent: (100 * residual) / scale, periodS };
}
