/**
 * The kind of a ventilated air layer's opening area A_v: ISO 6946 states it per metre of length for
 * a vertical layer and per square metre of area for a horizontal one, the same numbers (500 and
 * 1500 mm²) bounding the classes in both. A layer is vertical when heat flows horizontally through
 * it (a wall), horizontal when it flows up or down (a roof or floor).
 */
import type { QuantityName } from '../../base/quantities.js';

export type VentOpeningQuantity = Extract<QuantityName, 'ventOpeningPerLength' | 'ventOpeningPerArea'>;

export function ventOpeningQuantity(heatFlowDirection: unknown): VentOpeningQuantity {
  return heatFlowDirection === 'horizontal' ? 'ventOpeningPerLength' : 'ventOpeningPerArea';
}
