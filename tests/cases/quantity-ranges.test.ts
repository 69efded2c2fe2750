/**
 * Ranges in app/base/quantity-ranges.ts that restate a limit the physics holds elsewhere (app/base
 * may import nothing from app/physics): the two must not drift apart.
 */
import { describe, expect, it } from 'vitest';
import { QUANTITY_RANGES } from '../../app/base/quantity-ranges.js';
import { AIR_LAYER_MAXIMUM_THICKNESS } from '../../app/physics/index.js';

describe('quantity ranges restated from the physics', () => {
  it("an air layer may be as thick as ISO 6946's air-layer rules go (data/physics, as app/physics reads it)", () => {
    expect(QUANTITY_RANGES.airLayerThickness.max).toBe(AIR_LAYER_MAXIMUM_THICKNESS);
  });
});
