/**
 * Lagrange line elements on the reference interval ξ ∈ [−1, 1] and their Gauss rules.
 * Linear elements use 2 Gauss points and quadratic elements 3, which integrate the stiffness,
 * capacity and load exactly for conductivity up to linear (linear elements) or quadratic
 * (quadratic elements) in position, including the axisymmetric factor r.
 */
import type { ElementOrder } from './problem.js';

export interface ReferenceElement {
  readonly order: ElementOrder;
  readonly nodeCount: number;
  /** Reference coordinate of each local node. */
  readonly nodeXi: readonly number[];
  /** Gauss points and weights on [−1, 1]. */
  readonly gaussXi: readonly number[];
  readonly gaussWeight: readonly number[];
  /** Shape-function values N_a(ξ_g) and derivatives dN_a/dξ(ξ_g), indexed [g][a]. */
  readonly shape: readonly (readonly number[])[];
  readonly shapeDerivative: readonly (readonly number[])[];
}

const gauss2 = { xi: [-1 / Math.sqrt(3), 1 / Math.sqrt(3)], w: [1, 1] };
const gauss3 = { xi: [-Math.sqrt(3 / 5), 0, Math.sqrt(3 / 5)], w: [5 / 9, 8 / 9, 5 / 9] };

function linearShape(xi: number): number[] {
  return [(1 - xi) / 2, (1 + xi) / 2];
}
function linearShapeDerivative(): number[] {
  return [-0.5, 0.5];
}
function quadraticShape(xi: number): number[] {
  return [(xi * (xi - 1)) / 2, 1 - xi * xi, (xi * (xi + 1)) / 2];
}
function quadraticShapeDerivative(xi: number): number[] {
  return [xi - 0.5, -2 * xi, xi + 0.5];
}

function tabulate(
  order: ElementOrder,
  nodeXi: number[],
  rule: { xi: number[]; w: number[] },
  shape: (xi: number) => number[],
  derivative: (xi: number) => number[],
): ReferenceElement {
  return {
    order,
    nodeCount: nodeXi.length,
    nodeXi,
    gaussXi: rule.xi,
    gaussWeight: rule.w,
    shape: rule.xi.map(shape),
    shapeDerivative: rule.xi.map(derivative),
  };
}

const linear = tabulate(1, [-1, 1], gauss2, linearShape, linearShapeDerivative);
const quadratic = tabulate(2, [-1, 0, 1], gauss3, quadraticShape, quadraticShapeDerivative);

export function referenceElement(order: ElementOrder): ReferenceElement {
  return order === 1 ? linear : quadratic;
}
