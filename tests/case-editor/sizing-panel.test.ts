/**
 * The sizing panel's pure parts: the "sizing" block as the switches write it (a first criterion
 * that suits the case, the economics that the economic criterion needs, the chosen thickness put
 * into the sized layer) and the table across the series in the project's units, with the chosen
 * row marked and each failing cell carrying the engine's sentence.
 */
import { describe, expect, it } from 'vitest';
import { getAt } from '../../renderer/src/case-editor/case-paths.js';
import {
  chooseSeries, criterionOn, economicsOn, seriesChoice, sizableLayers, sizedThickness, startSizing, stopSizing, switchCriterion, switchEconomics, useThickness,
} from '../../renderer/src/case-editor/sizing-block.js';
import { sizingPaths } from '../../renderer/src/case-editor/sizing-fields.js';
import { sizingTable } from '../../renderer/src/case-editor/sizing-table.js';
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

describe('the table across the series', () => {
  it('marks the chosen row and explains each failing cell by the engine’s sentence', () => {
    const table = sizingTable(HOT, 'SI', 'per-metre');
    expect(table.headers).toEqual(['Thickness (mm)', 'Heat loss (W/m)', 'Surface (°C)', 'Above dew point (K)', 'Lifecycle cost', 'Surface temperature limit', 'Least lifecycle cost', 'Choice']);
    expect(table.rows.map((r) => r.chosen)).toEqual([false, false, true, false]);
    const first = table.rows[0]!.cells[5]!;
    expect(first).toEqual({ text: 'fails by 7.5 K', reason: 'The surface must be at most 55 °C; it is 62.5 °C.', numeric: false });
    expect(table.rows[2]!.cells.map((c) => c.text)).toEqual(['40.0', '38.0', '52.4', '42.4', '720.0', 'met', 'costs 20.00 EUR more', 'chosen']);
  });

  it('reads in US units, with freeze times and a time never reached', () => {
    const table = sizingTable(FROZEN, 'IP', 'per-metre');
    expect(table.headers.slice(0, 3)).toEqual(['Thickness (in)', 'Heat loss (Btu/(h·ft))', 'Surface (°F)']);
    expect(table.headers).toContain('Time to 32.0 °F (h)');
    expect(table.rows[1]!.cells[table.headers.indexOf('Time to the frozen part (h)')]!.text).toBe('not reached');
    expect(table.rows.every((r) => !r.chosen)).toBe(true);
  });
});
