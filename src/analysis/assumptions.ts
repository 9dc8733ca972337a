/**
 * What a run assumed that its reader should know, in plain sentences for the summary and the
 * report: how the wind reading was carried to the stack's heights, the site pressure, whether the
 * gas radiates, the clear-sky model, and every correlation used beyond its published range where
 * the literature accepts it (from the run's range checks).
 */
import type { ModelInputs } from '../model/inputs.ts';
import type { RunResult } from '../model/timeseries.ts';
import { TERRAIN_BOUNDARY_LAYERS } from '../physics/outside/wind.ts';
import { airPressureAtElevation } from '../physics/properties/air.ts';
import { round } from './rounding.ts';

/** The wind conversion in words, with the factor at the bottom and top segments. */
function windSentence(inputs: ModelInputs, result: RunResult): string {
  const s = result.series;
  const { siteTerrain, stationTerrain, windExponent } = inputs.site;
  const at = (seg: number) => {
    const ref = s.instant.windSpeedRef[0]!;
    const factor = ref > 0 ? s.segment.windAtHeight[seg]! / ref : Number.NaN;
    return `${round(factor, 2)}× at ${round(s.heightM[seg]!, 1)} m`;
  };
  const factors = s.t.length > 0 && s.instant.windSpeedRef[0]! > 0 ? ` (wind at height: ${at(0)}, ${at(s.segments - 1)} of the reading)` : '';
  if (siteTerrain && stationTerrain) {
    const a = TERRAIN_BOUNDARY_LAYERS[stationTerrain];
    const b = TERRAIN_BOUNDARY_LAYERS[siteTerrain];
    return `Wind: the reading over ${stationTerrain} terrain (exponent ${a.exponent}, boundary layer ${a.thicknessM} m) is carried up to the gradient wind and down the ${siteTerrain} site's profile (exponent ${b.exponent}, boundary layer ${b.thicknessM} m) by the two-terrain power law (ASHRAE Fundamentals 2009, ch. 24), capped at the site's boundary-layer height${factors}.`;
  }
  return `Wind: the site's power-law exponent ${windExponent} is applied to the reading directly, as if the anemometer stood in the same terrain${factors}.`;
}

/** The run's assumptions in sentences, most general first. */
export function runAssumptions(inputs: ModelInputs, result: RunResult): string[] {
  const pressure = inputs.site.pressurePa ?? airPressureAtElevation(inputs.site.elevationM);
  const clear = inputs.outside.clearSky ?? { kind: 'ashrae-1985' };
  return [
    windSentence(inputs, result),
    `Air outside and in gaps at the site pressure ${round(pressure / 1000, 2)} kPa${inputs.site.pressurePa === undefined ? ` (standard atmosphere at ${round(inputs.site.elevationM, 0)} m)` : ''}; flue gas at ${round(inputs.flue.pressurePa / 1000, 2)} kPa.`,
    inputs.flue.gasRadiation
      ? 'The H2O–CO2 flue gas radiates to the lining (weighted sum of grey gases, mean beam length 0.95 D).'
      : 'Flue-gas radiation is switched off: the lining exchanges heat with the gas by convection only.',
    clear.kind === 'ashrae-1985'
      ? 'Clear sky where the weather gives no irradiance: ASHRAE (1985) with its monthly constants interpolated by day between the 21sts.'
      : 'Clear sky where the weather gives no irradiance: ASHRAE (2009) with the site\'s monthly optical depths, interpolated by day.',
    ...((inputs.stack.sectors ?? 1) > 1
      ? [
          `The wall is cut into ${inputs.stack.sectors} sectors round the circumference: each takes the beam by the cosine between its outward normal and the sun's direction, diffuse and ground-reflected light alike; neighbouring sectors exchange heat by conduction round every layer (air gaps: still air and a radiative conductivity); the outside film coefficient is the circumferential mean evaluated at each sector's own surface temperature (no windward-to-leeward variation); the flue gas is one well-mixed stream per segment.`,
        ]
      : []),
    ...(inputs.weather.kind === 'file' ? (inputs.weather.notes?.assumptions ?? []) : []),
    ...result.assumptions,
  ];
}
