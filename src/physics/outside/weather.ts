/** Outside-air conditions at one instant, as the wall model consumes them. SI units. */
export interface AirState {
  /** Dry-bulb air temperature, K. */
  readonly airTemperatureK: number;
  /** Mean wind speed at the weather's reference height, m/s. */
  readonly windSpeed: number;
  /** Cloud cover fraction, 0 (clear) – 1 (overcast). */
  readonly cloudCover: number;
  /** Dew point of the outside air, K. */
  readonly dewPointK: number;
  /** Measured beam normal irradiance, W/m², when the weather source has it (else undefined: use a clear-sky model). */
  readonly beamNormal?: number;
  /** Measured diffuse horizontal irradiance, W/m², when the weather source has it. */
  readonly diffuseHorizontal?: number;
}

/** Anything that can tell the outside-air state at an instant. */
export interface WeatherSource {
  /** Height above ground at which `windSpeed` is given, m. */
  readonly referenceHeightM: number;
  /**
   * Shortest time between the source's data points, s, for a source read from data (its values are
   * interpolated between them, so they may change that fast); undefined for a smooth source such
   * as a design day.
   */
  readonly timeStepS?: number;
  /** Conditions at the UTC instant `utcMs`. */
  at(utcMs: number): AirState;
}
