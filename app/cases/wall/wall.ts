/** Public API of the wall and roof calculation. */
export type {
  WallInput,
  WallLayer,
  WallMaterialLayer,
  WallAirLayer,
  AirCondition,
  SurfaceResistanceChoice,
  InsideHumiditySource,
  WallMoistureInput,
  WallBridge,
  WallFasteners,
  AirGapLevel,
  WallTargetU,
} from './wall-input.js';
export { isAirLayer } from './wall-input.js';
export type { WallResult, WallLayerResult } from './wall-result.js';
export type { MonthlyClimate, ClimateMonth } from '../../checks/monthly-climate.js';
export { monthDuration } from '../../checks/monthly-climate.js';
export { calculateWall, solveWall, type WallSolution } from './wall-calculation.js';
export { validateWallInput } from './wall-validation.js';
export { buildThermalStack, type ThermalStack, type StackLayer, type VentilationRule } from './wall-thermal-stack.js';
export { roundToSignificantFigures, U_VALUE_SIGNIFICANT_FIGURES } from '../../base/significant-figures.js';
export { DEMO_CLIMATES, demoClimateByName } from './wall-demo-climates.js';
export { combinedMethod, type CombinedMethodResult, type CombinedPart, type CombinedSection } from './wall-combined-method.js';
export { uCorrections, type UCorrections } from './wall-u-corrections.js';
export { targetUSeries, type TargetUResult, type TargetURow } from './wall-target-u.js';
