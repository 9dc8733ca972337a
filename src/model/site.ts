/** Site-level quantities the model derives from its inputs. */
import { airPressureAtElevation } from '../physics/properties/air.ts';
import type { ModelInputs } from './inputs.ts';

/** Atmospheric pressure at the site, Pa: as given, or the standard atmosphere at the elevation (ISO 2533). */
export function sitePressurePa(inputs: ModelInputs): number {
  return inputs.site.pressurePa ?? airPressureAtElevation(inputs.site.elevationM);
}
