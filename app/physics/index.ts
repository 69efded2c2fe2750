/** Public API of the surface physics and psychrometrics layer. */
export { InputError } from './errors.js';
export { STEFAN_BOLTZMANN, KELVIN_OFFSET, GRAVITY, WATER_VAPOUR_GAS_CONSTANT, toKelvin } from './constants.js';

export {
  airPropertiesAt,
  AIR_TABLE_RANGE,
  AIR_TABLE_SOURCE,
  AIR_EXTRAPOLATION_LIMITS,
  type AirProperties,
} from './air-properties.js';
export type { ConvectionResult, NusseltEstimate } from './convection-result.js';
export { naturalConvectionGroups, forcedConvectionGroups, type SurfaceAndAir } from './film-groups.js';
export {
  horizontalCylinderNusselt,
  horizontalCylinderNusseltLaminar,
  naturalConvectionHorizontalCylinder,
  type HorizontalCylinderInput,
} from './horizontal-cylinder-natural.js';
export {
  verticalPlateNusselt,
  verticalPlateNusseltLaminar,
  naturalConvectionVerticalSurface,
  type VerticalSurfaceInput,
} from './vertical-surface-natural.js';
export {
  horizontalPlateNusselt,
  horizontalPlateArrangement,
  naturalConvectionHorizontalPlate,
  type HorizontalPlateArrangement,
  type HorizontalPlateInput,
  type Facing,
} from './horizontal-plate-natural.js';
export { cylinderCrossFlowNusselt, forcedConvectionCylinder, type CylinderCrossFlowInput } from './cylinder-cross-flow.js';
export { plateParallelFlowNusselt, forcedConvectionPlate, type PlateParallelFlowInput } from './plate-parallel-flow.js';
export {
  combinedConvection,
  MIXED_CONVECTION_EXPONENT,
  type CombinedConvectionResult,
  type MixedFlowArrangement,
} from './combined-convection.js';
export {
  simplifiedConvection,
  SIMPLIFIED_CONVECTION_TABLE,
  SIMPLIFIED_CONVECTION_SOURCE,
  type SimplifiedCase,
  type SimplifiedCaseRow,
  type SimplifiedFormulaRow,
  type SimplifiedConvectionInput,
  type SimplifiedConvectionResult,
} from './simplified-convection.js';
export { radiationCoefficient, blackBodyRadiationCoefficient } from './radiation.js';
export {
  outerSurfaceExchange,
  type OuterSurfaceSpec,
  type OuterSurfaceShape,
  type Exposure,
  type SurfaceMethod,
  type OuterSurfaceExchange,
  type OuterSurfaceExchangeFunction,
} from './outer-surface-exchange.js';

export { HEAT_FLOW_DIRECTIONS, type HeatFlowDirection } from './heat-flow-direction.js';
export {
  standardSurfaceResistances,
  surfaceResistanceFromCoefficients,
  internalConvectionCoefficient,
  externalConvectionCoefficient,
  insideSurfaceResistance,
  outsideSurfaceResistance,
  SURFACE_RESISTANCE_SOURCE,
  type SurfaceResistancePair,
  type SurfaceResistanceBasisInput,
} from './building-surface-resistance.js';
export {
  airLayerResistance,
  airLayerResistanceFromTable,
  airLayerConvectionCoefficient,
  effectiveEmittance,
  airLayerVentilation,
  slightlyVentilatedTotalResistance,
  wellVentilatedOutsideResistance,
  AIR_LAYER_MAXIMUM_THICKNESS,
  AIR_LAYER_SOURCE,
  type AirLayerInput,
  type AirLayerVentilation,
} from './air-layer.js';

export {
  saturationPressure,
  saturationTemperature,
  type SaturationFormula,
  type SaturationPhase,
  type SaturationOptions,
} from './saturation-pressure.js';
export {
  vapourPressure,
  relativeHumidity,
  dewPoint,
  vapourConcentration,
  vapourPressureFromConcentration,
} from './humidity.js';

export { complex, type Complex } from './complex-number.js';
export {
  layerMatrix,
  resistanceMatrix,
  multiplyMatrices,
  periodicPenetrationDepth,
  type HeatTransferMatrix,
  type StoringLayer,
} from './heat-transfer-matrix.js';
export {
  periodicResponse,
  elementMatrix,
  DAILY_PERIOD,
  type PeriodicElement,
  type PeriodicLayer,
  type PeriodicFigure,
  type PeriodicResponse,
} from './periodic-response.js';
