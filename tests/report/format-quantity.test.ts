import { describe, expect, it } from 'vitest';
import { formatQuantity, formatQuantityNumber, quantityUnit, tableCellTexts } from '../../app/report/format-quantity.js';
import type { ReportTable } from '../../app/report/report-model.js';
import { numberText } from '../../app/base/number-text.js';

// Writing conventions checked here: a space between the number and its unit, and the minus sign
// U+2212 rather than a hyphen (ISO 80000-1, from memory); rounding to significant figures agrees
// with ECMAScript's Number.prototype.toPrecision (the language specification's own rounding).

describe('formatQuantity', () => {
  it('writes each kind with its unit and precision', () => {
    expect(formatQuantity(18.6349, 'temperature')).toBe('18.6 °C');
    expect(formatQuantity(53.2149, 'heatFlowPerLength')).toBe('53.2 W/m');
    expect(formatQuantity(0.2842, 'uValue')).toBe('0.28 W/(m²·K)');
    expect(formatQuantity(0.2842, 'uValueUnrounded')).toBe('0.2842 W/(m²·K)');
    expect(formatQuantity(4.61, 'temperatureDifference')).toBe('4.6 K');
    expect(formatQuantity(0.926, 'temperatureFactor')).toBe('0.926');
    expect(formatQuantity(7, 'count')).toBe('7');
  });

  it('scales to the display unit: metres read in mm, fractions in %, rates per day, seconds in hours', () => {
    expect(formatQuantity(0.05, 'thickness')).toBe('50.0 mm');
    expect(formatQuantity(0.1683, 'diameter')).toBe('168.3 mm');
    expect(formatQuantity(0.85, 'relativeHumidity')).toBe('85 %');
    // 1e-6 kg/(m²·s) × 86 400 s/day × 1000 g/kg = 86.4 g/(m²·day)
    expect(formatQuantity(1e-6, 'condensationRate')).toBe('86.4 g/(m²·day)');
    expect(formatQuantity(14_400, 'timeHours')).toBe('4.00 h');
    expect(formatQuantity(90, 'timeMinutes')).toBe('1.5 min');
    expect(formatQuantity(-1_234_567, 'energyPerArea')).toBe('−1235 kJ/m²');
  });

  it('uses the true minus sign and never prints −0.0', () => {
    expect(formatQuantity(-4.642, 'heatFlux')).toBe('−4.64 W/m²');
    expect(formatQuantity(-0.04, 'temperature')).toBe('0.0 °C');
    expect(formatQuantity(-0, 'temperature')).toBe('0.0 °C');
    expect(formatQuantity(-0.00004, 'thickness')).toBe('0.0 mm');
    expect(formatQuantity(-0.06, 'temperature')).toBe('−0.1 °C');
  });

  it('significant figures without exponent notation for ordinary magnitudes', () => {
    expect(formatQuantity(1234.5, 'heatFlow')).toBe('1230 W');
    expect(formatQuantity(0.0012345, 'heatFlow')).toBe('0.00123 W');
    expect(formatQuantity(45_833.4, 'energyPerYear')).toBe('45800 kWh/a');
    expect(formatQuantity(999.6, 'heatFlow')).toBe('1000 W');
    expect(formatQuantity(0, 'heatFlow')).toBe('0 W');
    expect(formatQuantity(0.000100004, 'heatFlow')).toBe('0.000100 W');
    for (const x of [1234.5, 0.0012345, 63.66, 7.0049, 0.99951]) {
      expect(Number(formatQuantityNumber(x, 'heatFlow'))).toBe(Number(x.toPrecision(3)));
    }
  });

  it('exponent form only below 1e-4 or from 1e9', () => {
    expect(formatQuantity(3.7021e-11, 'heatFlowPerLength')).toBe('3.70 × 10⁻¹¹ W/m');
    expect(formatQuantity(-5.81e-13, 'relativeResidual')).toBe('−5.8 × 10⁻¹³');
    expect(formatQuantity(0.000012345, 'heatFlow')).toBe('1.23 × 10⁻⁵ W');
    // Decided on the rounded value: 0.000099996 rounds to 0.000100, which is plain.
    expect(formatQuantity(0.000099996, 'heatFlow')).toBe('0.000100 W');
    expect(formatQuantity(2.5e9, 'heatFlow')).toBe('2.50 × 10⁹ W');
    expect(formatQuantity(999_999_999, 'heatFlow')).toBe('1.00 × 10⁹ W');
    expect(formatQuantity(123_456_789, 'heatFlow')).toBe('123000000 W');
  });

  it('null is "not applicable"; a non-finite value is a bug and throws', () => {
    expect(formatQuantity(null, 'temperature')).toBe('—');
    expect(formatQuantityNumber(null, 'thickness')).toBe('—');
    expect(() => formatQuantity(Number.NaN, 'temperature')).toThrow(/non-finite temperature/);
    expect(() => formatQuantity(Infinity, 'heatFlux')).toThrow(/non-finite heatFlux/);
    expect(() => numberText(-Infinity, { decimals: 1 })).toThrow(/non-finite/);
  });

  it('names the unit of each kind for table headers', () => {
    expect(quantityUnit('thermalResistance')).toBe('m²·K/W');
    expect(quantityUnit('temperatureFactor')).toBe('');
  });
});

describe('tableCellTexts: one notation per column', () => {
  // The wall-flat-roof example's monthly table had "5.78 × 10⁻⁵" among "0.000134"; kg/m² to 3 significant figures.
  const kg = (value: number | null) => ({ value, quantity: 'massPerArea' as const });
  const table: ReportTable = {
    title: 'Condensate stored at the end of each month',
    columns: [{ label: 'Month' }, { label: 'θ outside', quantity: 'temperature' }, { label: 'Change', quantity: 'massPerArea' }, { label: 'Stored', quantity: 'massPerArea' }],
    rows: [
      ['February', { value: -4, quantity: 'temperature' }, kg(0.000196), kg(0.00084)],
      ['March', { value: 1, quantity: 'temperature' }, kg(5.78e-5), kg(0.000898)],
      ['April', { value: 7, quantity: 'temperature' }, kg(-0.000321), kg(0.000577)],
      ['June', { value: 16, quantity: 'temperature' }, kg(0), kg(null)],
    ],
  };

  it('a column with one exponent-form number writes every number so, at the same significant figures', () => {
    const cells = tableCellTexts(table);
    expect(cells.map((r) => r[2])).toEqual(['1.96 × 10⁻⁴', '5.78 × 10⁻⁵', '\u22123.21 × 10⁻⁴', '0']);
    // The figures are the plain ones, digit for digit: 0.000196 = 1.96 × 10⁻⁴.
    expect(cells.map((r) => r[3])).toEqual(['0.000840', '0.000898', '0.000577', '—']);
    expect(cells.map((r) => r[1])).toEqual(['\u22124.0', '1.0', '7.0', '16.0']);
    expect(cells.map((r) => r[0])).toEqual(['February', 'March', 'April', 'June']);
  });

  it('a column with no such number is written cell by cell as before', () => {
    const plain: ReportTable = { ...table, rows: table.rows.filter((r) => r[0] !== 'March') };
    expect(tableCellTexts(plain).map((r) => r[2])).toEqual([formatQuantityNumber(0.000196, 'massPerArea'), formatQuantityNumber(-0.000321, 'massPerArea'), '0']);
  });

  it('decides in the unit system shown (°F of a temperature column stays plain)', () => {
    expect(tableCellTexts(table, 'IP').map((r) => r[1])).toEqual(['24.8', '33.8', '44.6', '60.8']);
  });
});
