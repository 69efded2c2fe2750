/** Public API of the wall moisture checks (interstitial condensation, mould and surface condensation). */
export { constructVapourProfile, unlimitedVapourProfile, type GlaserInput, type GlaserProfile } from './glaser-construction.js';
export { VAPOUR_PERMEABILITY_OF_AIR, vapourStackAt, type VapourLayer, type VapourStackAtCondition } from './interstitial-vapour-stack.js';
export {
  checkInterstitialAtDesignCondition,
  interstitialStateAt,
  type InterstitialOptions,
  type InterstitialState,
  type InterstitialPoint,
  type InterstitialDesignResult,
} from './interstitial-condensation.js';
export { checkInterstitialMonthly, type InterstitialMonth, type InterstitialMonthlyResult } from './interstitial-monthly.js';
export { assessMould, mouldDesignIndices, surfaceHumidityConditions, type MouldAssessment, type SurfaceHumidityCondition } from './mould-check.js';
export {
  temperatureFactor,
  minimumTemperatureFactor,
  minimumSurfaceTemperature,
  MOULD_SURFACE_HUMIDITY_LIMIT,
  CONDENSATION_SURFACE_HUMIDITY_LIMIT,
  MOULD_CHECK_INSIDE_SURFACE_RESISTANCE,
} from './mould-temperature-factor.js';
export { insideVapourPressure, classVapourPressureExcess, type InsideHumiditySource, HUMIDITY_CLASSES, HUMIDITY_CLASS_SOURCE, HUMIDITY_CLASS_SAFETY_FACTOR } from './mould-humidity-classes.js';
export { MOISTURE_CAUTION } from './mould-moisture-caution.js';
