/**
 * Saturation vapour pressure of water over a plane surface of water or ice, and its inverse (the
 * temperature at which a given vapour pressure saturates). Magnus-type formulas
 * p_sat = a·exp(bθ/(c+θ)), coefficients as data (data/physics/saturation-formulas.json).
 * Default: the ISO 13788 pair, which switches to ice below 0 °C, as the standard's condensation
 * and mould assessments do.
 */
import formulas from '../../data/physics/saturation-formulas.json' with { type: 'json' };
import { requireCelsius, requireOneOf, requirePositive } from './input-checks.js';

export type SaturationFormula = 'iso13788' | 'magnus-alduchov-eskridge';
/** 'auto': over ice below 0 °C, over water from 0 °C. */
export type SaturationPhase = 'auto' | 'water' | 'ice';

export interface SaturationOptions {
  readonly formula?: SaturationFormula;
  readonly phase?: SaturationPhase;
}

interface MagnusCoefficients {
  readonly a: number;
  readonly b: number;
  readonly c: number;
}

const FORMULA_IDS: readonly SaturationFormula[] = ['iso13788', 'magnus-alduchov-eskridge'];
const PHASES: readonly SaturationPhase[] = ['auto', 'water', 'ice'];

function coefficientsOf(options: SaturationOptions | undefined): { water: MagnusCoefficients; ice: MagnusCoefficients; phase: SaturationPhase } {
  const id = requireOneOf('formula', options?.formula ?? 'iso13788', FORMULA_IDS);
  const phase = requireOneOf('phase', options?.phase ?? 'auto', PHASES);
  const row = formulas.formulas.find((f) => f.id === id)!;
  return { water: row.water, ice: row.ice, phase };
}

/** The default formula's coefficients, looked up once: a wall case asks for p_sat at every point of every month. */
const DEFAULT_COEFFICIENTS = coefficientsOf(undefined);

/** p_sat in Pa at θ (°C). */
export function saturationPressure(celsius: number, options?: SaturationOptions): number {
  const theta = requireCelsius('temperature', celsius);
  const { water, ice, phase } = options === undefined ? DEFAULT_COEFFICIENTS : coefficientsOf(options);
  const k = phase === 'water' || (phase === 'auto' && theta >= 0) ? water : ice;
  return k.a * Math.exp((k.b * theta) / (k.c + theta));
}

/**
 * The temperature (°C) at which p_sat equals the vapour pressure p (Pa > 0): the dew point (or,
 * over ice, the frost point) of air holding that vapour pressure.
 * With 'auto', pressures below p_sat,water(0 °C) use the ice branch.
 */
export function saturationTemperature(pressure: number, options?: SaturationOptions): number {
  const p = requirePositive('vapourPressure', pressure, 'Pa');
  const { water, ice, phase } = coefficientsOf(options);
  const k = phase === 'water' || (phase === 'auto' && p >= water.a) ? water : ice;
  const x = Math.log(p / k.a);
  return (k.c * x) / (k.b - x);
}
