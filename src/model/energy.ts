/**
 * The energy account of a run or of one day: heat from the gas into the wall, stored in the wall,
 * lost outside by convection and radiation, and absorbed from the sun; the residual
 * in − stored − out says how well the integration conserves energy. It is stated against the gross
 * energy exchanged across the wall's surfaces, ∫ Σ |q| dt over every segment and flow (in plus out),
 * which stays meaningful for a periodic day whose net flows nearly cancel.
 */
import { nodeEnthalpyChange, type WallMesh } from '../physics/wall/mesh.ts';
import type { EnergyAccount } from './timeseries.ts';
import { AUX_CONVECTION, AUX_GAS_TO_WALL, AUX_GROSS, AUX_RADIATION, AUX_SUN, type StackGeometry } from './system.ts';

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
  const gross = aux[AUX_GROSS]!;
  const residual = gas + sun - stored - conv - rad;
  return { gasToWallJ: gas, convectionJ: conv, radiationJ: rad, sunJ: sun, storedJ: stored, grossJ: gross, residualJ: residual, residualPercent: (100 * residual) / Math.max(gross, 1e-30), periodS };
}
