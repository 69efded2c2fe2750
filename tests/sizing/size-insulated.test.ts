/**
 * The sweep across a thickness series through solveCase, as the command line and the editor call
 * it: properties every sizing must have, whatever the case.
 * - The chosen thickness meets every criterion switched on, and the next thinner option fails at
 *   least one (the definition of "the thinnest that meets them all"; common practice, no source).
 * - Heat loss falls and the surface temperature moves toward the air as the insulation thickens:
 *   more resistance in series with the same films (Incropera, Fundamentals of Heat and Mass
 *   Transfer, ch. 3, the plane wall and the cylinder; holds here above the critical radius).
 * - The case's own thickness is a row, with the figures of the plain solve of the case.
 */
import { readFileSync } from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { solveCase } from '../../app/index.js';
import type { SizingResult } from '../../app/cases/sizing/sizing-model.js';
import { caseContext } from '../../main/cases/case-context.js';

const root = path.resolve(__dirname, '..', '..');
const example = (name: string) => JSON.parse(readFileSync(path.join(root, 'data', 'examples', name), 'utf8')) as Record<string, unknown>;
const context = caseContext(null);
const list = (mm: number[]) => ({ kind: 'list', thicknesses: mm.map((t) => t / 1000) });

function sized(name: string, sizing: unknown): { sizing: SizingResult; plainHeatLoss: number; air: number } {
  const json = example(name);
  const plain = solveCase(json, context).result as { heatLossPerMetre?: number; heatFlowDensity?: number };
  const solved = solveCase({ ...json, sizing }, context);
  const air = (json['ambient'] as { airTemperature: number }).airTemperature;
  return { sizing: solved.sizing!, plainHeatLoss: plain.heatLossPerMetre ?? plain.heatFlowDensity!, air };
}

const CASES = [
  // Hot water indoors: touch limit and a heat-loss limit per metre.
  ['pipe-hot-water-plant-room.json', { layer: 0, series: list([20, 25, 30, 40, 50, 60, 80, 100, 120]), criteria: { maxSurfaceTemperature: { limit: 35 }, maxHeatLoss: { limit: 18 } } }],
  // A chilled line gains heat: no condensation with a margin of 1 K.
  ['pipe-chilled-water.json', { layer: 0, series: list([9, 13, 19, 25, 32, 40, 50]), criteria: { noCondensation: { margin: 1 } } }],
  // A hot tank wall per m².
  ['flat-hot-tank-wall.json', { layer: 0, series: list([25, 50, 75, 100, 150, 200]), criteria: { maxSurfaceTemperature: { limit: 40 }, maxHeatLoss: { limit: 40 } } }],
] as const;

describe('sizing across a series, through solveCase', () => {
  for (const [name, block] of CASES) {
    it(`${name}: the chosen thickness meets every criterion and the next thinner fails one`, () => {
      const { sizing } = sized(name, block);
      expect(sizing.choice.kind).toBe('chosen');
      if (sizing.choice.kind !== 'chosen') return;
      const rows = sizing.rows;
      const at = rows.findIndex((r) => Math.abs(r.thickness - (sizing.choice as { thickness: number }).thickness) < 1e-9);
      expect(at).toBeGreaterThanOrEqual(0);
      expect(rows[at]!.outcomes.length).toBe(Object.keys(block.criteria).length);
      expect(rows[at]!.outcomes.every((o) => o.met && o.margin >= 0)).toBe(true);
      if (at > 0) expect(rows[at - 1]!.outcomes.some((o) => !o.met && o.margin < 0)).toBe(true);
      // The governing criterion is one the next thinner option fails.
      if (at > 0) expect(rows[at - 1]!.outcomes.find((o) => o.criterion === (sizing.choice as { governing: string }).governing)!.met).toBe(false);
    });

    it(`${name}: heat flow falls and the surface nears the air as the insulation thickens`, () => {
      const { sizing, air } = sized(name, block);
      const rows = sizing.rows;
      for (let i = 1; i < rows.length; i++) {
        expect(Math.abs(rows[i]!.heatLoss)).toBeLessThan(Math.abs(rows[i - 1]!.heatLoss));
        expect(Math.abs(rows[i]!.surfaceTemperature - air)).toBeLessThan(Math.abs(rows[i - 1]!.surfaceTemperature - air));
      }
    });

    it(`${name}: the case's own thickness is a row with the plain solve's heat flow`, () => {
      const { sizing, plainHeatLoss } = sized(name, block);
      const own = sizing.rows.find((r) => Math.abs(r.thickness - sizing.caseThickness!) < 1e-9)!;
      expect(own).toBeDefined();
      expect(Math.abs(own.heatLoss - plainHeatLoss)).toBeLessThanOrEqual(1e-12 * Math.abs(plainHeatLoss));
    });
  }

  it('no thickness meets the limit: the choice says which criterion fails, by the thickest row\'s margin', () => {
    const { sizing } = sized('pipe-hot-water-plant-room.json', { layer: 0, series: list([20, 40]), criteria: { maxHeatLoss: { limit: 1 } } });
    expect(sizing.choice.kind).toBe('none');
    if (sizing.choice.kind !== 'none') return;
    const thickest = sizing.rows.at(-1)!;
    expect(sizing.choice.failures.map((f) => f.criterion)).toEqual(['maxHeatLoss']);
    expect(sizing.choice.failures[0]!.margin).toBe(thickest.outcomes[0]!.margin);
    expect(sizing.choice.failures[0]!.margin).toBeCloseTo(1 - Math.abs(thickest.heatLoss), 12);
  });

  it('refusals name the field: a layer that is not there, a fluid criterion on a flat surface', () => {
    expect(() => solveCase({ ...example('pipe-hot-water-plant-room.json'), sizing: { layer: 3, series: list([20]), criteria: { maxHeatLoss: { limit: 10 } } } }, context)).toThrow(/^sizing\.layer must be a whole number from 0 to 0/);
    expect(() =>
      solveCase({ ...example('flat-hot-tank-wall.json'), sizing: { layer: 0, series: list([50]), criteria: { maxTemperatureDrop: { massFlow: 1, specificHeat: 4190, limit: 1 } } } }, context),
    ).toThrow(/maxTemperatureDrop/);
  });
});
