/**
 * The sizing panel's pure parts: the "sizing" block as the switches write it (a first criterion
 * that suits the case, the economics that the economic criterion needs, the chosen thickness put
 * into the sized layer) and the marks the panel adds to the report section's tables across the
 * series: the chosen row marked and each failing cell carrying the engine's sentence.
 */
import { describe, expect, it } from 'vitest';
import { getAt } from '../../renderer/src/case-editor/case-paths.js';
import {
  chooseSeries, criterionOn, economicsOn, seriesChoice, sizableLayers, sizedThickness, startSizing, stopSizing, switchCriterion, switchEconomics, useThickness,
} from '../../renderer/src/case-editor/sizing-block.js';
import { ECONOMICS_FIELDS, RANGE_FIELDS, criterionFields, sizingPaths } from '../../renderer/src/case-editor/sizing-fields.js';
import { rangeHint } from '../../renderer/src/case-editor/field-text.js';
import type { NumberField } from '../../renderer/src/case-editor/case-form-fields.js';
import { sizingMarks } from '../../renderer/src/case-editor/sizing-table.js';
import { SI_TEXT } from '../../app/base/quantity-text.js';
import { sizingSection } from '../../app/cases/sizing/sizing-report.js';
import type { SizingResult } from '../../app/cases/sizing/sizing-model.js';
import type { ReportTable } from '../../app/report/report-model.js';
import { FROZEN, HOT } from '../sizing/sizing-result-fixture.js';

const hotPipe = {
  kind: 'pipe',
  inner: { kind: 'fluid', temperature: 90, coefficient: 1000 },
  ambient: { airTemperature: 20, relativeHumidity: 0.6, exposure: { kind: 'indoor' } },
  layers: [{ materialId: 1, thickness: 0.03 }, { materialId: 2, thickness: 0.04 }],
};
const chilled = { ...hotPipe, inner: { kind: 'fluid', temperature: 6, coefficient: 1000 } };

describe('the sizing block as the panel writes it', () => {
  it('starts on the outer layer, its family’s series, and the surface limit of a hot line or the dew point of a cold one', () => {
    const hot = startSizing(hotPipe);
    expect(getAt(hot, 'sizing')).toEqual({ layer: 1, series: { kind: 'material' }, criteria: { maxSurfaceTemperature: {} } });
    expect(getAt(startSizing(chilled), 'sizing.criteria')).toEqual({ noCondensation: { margin: 1 } });
    expect(getAt(stopSizing(hot), 'sizing')).toBeUndefined();
    expect(sizableLayers({ layers: [{ kind: 'air-layer' }, { materialId: 3 }] })).toEqual([1]);
  });

  it('adds the economics with the economic criterion, and takes the criterion away with them', () => {
    const economic = switchCriterion(startSizing(hotPipe), 'economic', true, 'pipe', 'demo pipe sections');
    expect(criterionOn(economic, 'economic')).toBe(true);
    expect(getAt(economic, 'sizing.economics.costTable')).toBe('demo pipe sections');
    const without = switchEconomics(economic, false, 'demo pipe sections');
    expect(economicsOn(without) || criterionOn(without, 'economic')).toBe(false);
    expect(criterionOn(without, 'maxSurfaceTemperature')).toBe(true);
    expect(getAt(switchCriterion(economic, 'maxHeatLoss', true, 'flat', ''), 'sizing.criteria.maxHeatLoss')).toEqual({ limit: 50 });
  });

  it('chooses a series, and puts the chosen thickness into the sized layer only', () => {
    const sized = startSizing(hotPipe);
    expect(seriesChoice(chooseSeries(sized, 'named:PIR pipe section'))).toBe('named:PIR pipe section');
    expect(getAt(chooseSeries(sized, 'range'), 'sizing.series')).toEqual({ kind: 'range', from: 0.02, to: 0.2, step: 0.01 });
    const used = useThickness(sized, 0.06);
    expect(getAt(used, 'layers')).toEqual([{ materialId: 1, thickness: 0.03 }, { materialId: 2, thickness: 0.06 }]);
    expect(sizedThickness(used)).toBe(0.06);
  });

  it('names the paths of the boxes shown, so a refusal lands beside its box', () => {
    const paths = sizingPaths('pipe', (c) => c === 'maxTemperatureDrop', true, false);
    expect(paths).toContain('sizing.criteria.maxTemperatureDrop.massFlow');
    expect(paths).toContain('sizing.economics.discountRate');
    expect(paths).not.toContain('sizing.series.step');
    expect(paths).not.toContain('sizing.criteria.maxHeatLoss.limit');
  });
});

describe('the hints of the sizing boxes', () => {
  const numberFields = (kind: 'pipe' | 'flat'): NumberField[] =>
    [...RANGE_FIELDS, ...(['maxSurfaceTemperature', 'noCondensation', 'maxHeatLoss', 'maxTemperatureDrop', 'freezeProtection'] as const).flatMap((c) => criterionFields(c, kind)), ...ECONOMICS_FIELDS]
      .filter((f): f is NumberField => f.type === 'number');

  it('write a large bound out as a person writes it, never in e-notation', () => {
    const heatLoss = (kind: 'pipe' | 'flat') => criterionFields('maxHeatLoss', kind)[0] as NumberField;
    // The engine's bound of the heat-loss limit is 1e5 (app/cases/sizing/sizing-ranges).
    expect(rangeHint(heatLoss('pipe').range, heatLoss('pipe').quantity, 'SI')).toBe('Allowed above 0 to 100000 W/m');
    expect(rangeHint(heatLoss('flat').range, heatLoss('flat').quantity, 'SI')).toBe('Allowed above 0 to 100000 W/m²');
    // 1 Btu(IT) = 1055.05585262 J and 1 ft = 0.3048 m exactly (NIST SP 811): 1e5 W/m = 1e5 × 3600/1055.05585262 × 0.3048
    // = 104002.08 Btu/(h·ft), 104002 to six figures.
    expect(rangeHint(heatLoss('pipe').range, heatLoss('pipe').quantity, 'IP')).toBe('Allowed above 0 to 104002 Btu/(h·ft)');
    for (const kind of ['pipe', 'flat'] as const) {
      for (const system of ['SI', 'IP'] as const) {
        for (const field of numberFields(kind)) expect(rangeHint(field.range, field.quantity, system), field.path).not.toMatch(/\de[-+]?\d|NaN|Infinity/);
      }
    }
  });
});

describe('the marks the panel adds to the report’s sizing tables', () => {
  // The tables are the report section's own (sizingSection); the panel only marks them.
  const tables = (result: SizingResult) =>
    sizingSection(result, SI_TEXT, 'per-metre').blocks.flatMap((b): ReportTable[] => (b.kind === 'table' ? [b.table] : []));

  it('marks the chosen row of every table and explains each failing criterion cell by the engine’s sentence', () => {
    const shown = tables(HOT);
    expect(shown.length).toBeGreaterThanOrEqual(3);
    for (const table of shown) {
      const marks = sizingMarks(table, HOT);
      expect(marks.testId).toBe('sizing-table');
      // HOT chooses its third row, 40 mm.
      expect(marks.rows.map((r) => r.marked)).toEqual([false, false, true, false]);
      expect(marks.rows.map((r) => r.testId)).toEqual(['sizing-row', 'sizing-row', 'sizing-chosen-row', 'sizing-row']);
      expect(marks.rows.every((r) => r.failures.length === table.columns.length)).toBe(true);
    }
    const criteria = shown.find((t) => t.columns.some((c) => c.label === 'Surface temperature limit'))!;
    const surface = criteria.columns.findIndex((c) => c.label === 'Surface temperature limit');
    const economic = criteria.columns.findIndex((c) => c.label === 'Least lifecycle cost');
    const marks = sizingMarks(criteria, HOT);
    expect(marks.rows.map((r) => r.failures[surface])).toEqual(['The surface must be at most 55 °C; it is 62.5 °C.', 'The surface must be at most 55 °C; it is 57.1 °C.', undefined, undefined]);
    expect(marks.rows.map((r) => r.failures[economic])).toEqual([
      'Least lifecycle cost of the series.', undefined, 'Least lifecycle cost of the series.', 'Least lifecycle cost of the series.',
    ]);
    // The thickness and choice columns, and every column of the figure tables, never fail.
    expect(marks.rows.every((r) => r.failures[0] === undefined && r.failures[r.failures.length - 1] === undefined)).toBe(true);
    for (const table of shown.filter((t) => t !== criteria)) expect(sizingMarks(table, HOT).rows.flatMap((r) => r.failures).every((f) => f === undefined)).toBe(true);
  });

  it('marks no row where no thickness meets every criterion, and still explains each failing cell', () => {
    const criteria = tables(FROZEN).find((t) => t.columns.some((c) => c.label === 'Freeze protection'))!;
    const marks = sizingMarks(criteria, FROZEN);
    expect(marks.rows.every((r) => !r.marked && r.testId === 'sizing-row')).toBe(true);
    const column = criteria.columns.findIndex((c) => c.label === 'Freeze protection');
    expect(marks.rows.map((r) => r.failures[column])).toEqual(FROZEN.rows.map((r) => r.outcomes[0]!.reason));
  });
});
