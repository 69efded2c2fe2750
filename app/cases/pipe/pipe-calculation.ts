/**
 * Heat loss (or gain) of an insulated pipe, and the surface checks.
 *
 * The pipe wall, the insulation layers and the jacket become an axisymmetric FE problem from the
 * pipe's inner radius outwards. The inner face carries the fluid film (or a fixed temperature);
 * the outer face carries the surface film from app/physics outerSurfaceExchange, whose coefficient
 * depends on the surface temperature and which the engine iterates to convergence together with
 * any temperature-dependent conductivity. Results keep full precision; rounding is for display.
 * Heat flows are positive outwards (heat lost by the pipe); a chilled line gives negative values.
 */
import { SI_TEXT, type QuantityText } from '../../base/quantity-text.js';
import type { SteadyStart } from '../../fe/steady-solve.js';
import { geometryPlausibilityWarnings } from '../../checks/plausibility-warnings.js';
import type { OuterSurfaceShape } from '../../physics/outer-surface-exchange.js';
import {
  methodNeedsEmissivity,
  outerSurfaceEmissivity,
  type ResolvedEmissivity,
} from '../insulated/insulated-inputs.js';
import { insulatedStack, reportedStackSolution, solveStack, type StackSolution, surfaceExchangeFor } from '../insulated/insulated-solve.js';
import { DEFAULT_SURFACE_METHOD, validatePipeInput, verticalPipeHeight, type PipeInput } from './pipe-input.js';
import { withFields } from '../with-fields.js';

export interface PipeResult extends Omit<StackSolution, 'engine' | 'heatOut'> {
  /** W/m; positive = heat lost by the pipe. */
  readonly heatLossPerMetre: number;
  /** W over the whole run. */
  readonly heatLoss: number;
  /** W/m² of outer (jacket or insulation) surface. */
  readonly heatFlowDensityAtSurface: number;
  /** kWh per year: heatLoss × operating hours / 1000. */
  readonly annualEnergy: number;
  /** m, of the insulated pipe including the jacket. */
  readonly outerDiameter: number;
  /** m² of outer surface per metre of pipe: π·outerDiameter. */
  readonly surfaceAreaPerMetre: number;
  /** The emissivity used for radiation and where it came from; null for a fixed coefficient or resistance. */
  readonly emissivity: ResolvedEmissivity | null;
  /** m, the height used for convection on a vertical pipe; null when horizontal. */
  readonly height: number | null;
  /** Defaults and choices the calculation made, in words. */
  readonly assumptions: readonly string[];
}

/** Validates `input`, then calculates; `text` writes the figures of the checks' reasons, warnings and assumptions (default SI). */
export function calculatePipe(input: PipeInput, text: QuantityText = SI_TEXT): PipeResult {
  validatePipeInput(input);
  return calculateValidatedPipe(input, text);
}

/**
 * The calculation of an input that has passed validatePipeInput already: the pipe kind's parse
 * validates the whole case, so its solve does not check every field a second time. `start`, from a
 * neighbouring solve (a sizing sweep), only shortens the iteration; the result is the same.
 */
export function calculateValidatedPipe(input: PipeInput, text: QuantityText, start?: SteadyStart): PipeResult {
  const method = input.surfaceMethod ?? DEFAULT_SURFACE_METHOD;
  const assumptions: string[] = [];

  const innerRadius = input.pipe.outerDiameter / 2 - input.pipe.wallThickness;
  const stack = insulatedStack(
    { role: 'pipe-wall', label: 'pipe wall', layer: { material: input.pipe.material, thickness: input.pipe.wallThickness } },
    input.layers,
    input.jacket,
  );
  const outerDiameter = 2 * stack.reduce((r, l) => r + l.thickness, innerRadius);

  let height: number | null = null;
  if (input.orientation === 'vertical') {
    const chosen = verticalPipeHeight(input, text);
    height = chosen.height;
    assumptions.push(chosen.note);
  }
  const shape: OuterSurfaceShape =
    input.orientation === 'vertical'
      ? { kind: 'pipe', orientation: 'vertical', outerDiameter, height: height! }
      : { kind: 'pipe', orientation: 'horizontal', outerDiameter };

  const emissivity = methodNeedsEmissivity(method) ? outerSurfaceEmissivity(input.layers, input.jacket) : null;
  if (input.ambient.surroundingsTemperature === undefined) assumptions.push('surroundings (radiant) temperature taken equal to the air temperature');
  if (input.surfaceMethod === undefined) assumptions.push('outer surface coefficient from the general correlations (natural, forced and mixed convection) plus radiation');

  const exchange = surfaceExchangeFor(shape, input.inner, input.ambient, method, emissivity);

  const solved = solveStack({
    geometry: { kind: 'axisymmetric', innerRadius },
    stack,
    inner: input.inner,
    exchange,
    ambient: input.ambient,
    ...(input.touchLimit !== undefined ? { touchLimit: input.touchLimit } : {}),
    ...(start !== undefined ? { start } : {}),
  }, text);
  const heatOut = solved.heatOut;
  const solution = reportedStackSolution(solved);

  const surfaceAreaPerMetre = Math.PI * outerDiameter;
  const warnings = [...geometryPlausibilityWarnings(innerRadius, text), ...solution.warnings];
  const heatLoss = heatOut * input.length;
  return withFields(solution, {
    warnings,
    heatLossPerMetre: heatOut,
    heatLoss,
    heatFlowDensityAtSurface: heatOut / surfaceAreaPerMetre,
    annualEnergy: (heatLoss * input.operatingHours) / 1000,
    outerDiameter,
    surfaceAreaPerMetre,
    emissivity,
    height,
    assumptions,
  });
}
