/** A state of moist air: temperature and relative humidity, as the moisture checks and climates give it. */
export interface AirCondition {
  /** °C */
  readonly temperature: number;
  /** fraction 0..1 */
  readonly relativeHumidity: number;
}
