/**
 * The economic side of sizing: the annuity and present-value factors against compound-interest
 * table values and their closed forms, the limits e = i and i = 0, a row's energy cost, CO₂ and
 * lifecycle cost by hand, the economic thickness (least lifecycle cost, ties to the thinner, where
 * a convex cost stops falling), the installed-cost CSV (all or nothing, line and column named),
 * its interpolation (exact at the nodes, linear between, no extrapolation), the shipped data files,
 * and the sentences that refuse bad economics.
 */
import { readFileSync } from 'node:fs';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { InputError } from '../../app/base/input-error.js';
import { writeShownSentence } from '../../app/base/quantity-sentence.js';
import { quantityText } from '../../app/base/quantity-text.js';
import { csvLineFields } from '../../app/cases/sizing/csv-line.js';
import { leastLifecycleCostRow } from '../../app/cases/sizing/economic-thickness.js';
import { EMISSION_FACTORS } from '../../app/cases/sizing/emission-factors.js';
import { findCostTable, installedCost, requireCostBasis } from '../../app/cases/sizing/installed-cost-lookup.js';
import { parseInstalledCostTables } from '../../app/cases/sizing/installed-cost-table.js';
import { annualEmissions, annualEnergyCost, annualPurchasedEnergy, lifecycleCost, rowEconomics } from '../../app/cases/sizing/lifecycle-cost.js';
import { annuityFactor, economicFactors, presentValueFactor } from '../../app/cases/sizing/present-value-factors.js';
import { ECONOMICS_RANGES, validateSizingEconomics } from '../../app/cases/sizing/sizing-economics-checks.js';
import type { InstalledCostTable, SizingEconomics } from '../../app/cases/sizing/sizing-model.js';
import { installedCostCatalogue } from '../../main/sizing/installed-cost-catalogue.js';

/** The factor by its definition, one year at a time: the reference the closed forms must meet. */
function presentValueBySum(e: number, i: number, n: number): number {
  let sum = 0;
  for (let k = 1; k <= n; k++) sum += ((1 + e) / (1 + i)) ** k;
  return sum;
}

/** The message of the InputError `run` throws (fails the test when it throws anything else or nothing). */
function refusal(run: () => unknown): InputError {
  try {
    run();
  } catch (error) {
    expect(error).toBeInstanceOf(InputError);
    return error as InputError;
  }
  throw new Error('expected an InputError');
}

describe('annuity (capital recovery) factor', () => {
  it('meets the compound-interest table values', () => {
    // Capital recovery factor (A/P, i, n) of the standard discrete compound-interest tables of
    // engineering-economics textbooks: 0.08024 at 5 % over 20 years and 0.16275 at 10 % over
    // 10 years (from memory), tabulated to 5 decimals.
    expect(annuityFactor(0.05, 20)).toBeCloseTo(0.08024, 5);
    expect(annuityFactor(0.1, 10)).toBeCloseTo(0.16275, 5);
    // And against the closed form a = i/(1 − (1 + i)^−n), written out here.
    expect(annuityFactor(0.05, 20)).toBeCloseTo(0.05 / (1 - 1.05 ** -20), 14);
    expect(annuityFactor(0.1, 10)).toBeCloseTo(0.1 / (1 - 1.1 ** -10), 14);
  });

  it('is 1/n at a zero rate, and tends to it smoothly as the rate falls', () => {
    // The limit of i/(1 − (1 + i)^−n) as i → 0 is 1/n (l'Hôpital): n equal repayments of a sum lent free.
    expect(annuityFactor(0, 20)).toBe(1 / 20);
    // Series of the closed form in i, derived here: a = (1/n)(1 + (n + 1)i/2 + (n² − 1)i²/12 + O(i³)).
    // No cancellation: the digits hold down to i = 1e-12.
    const series = (i: number, n: number) => (1 / n) * (1 + ((n + 1) * i) / 2 + ((n * n - 1) * i * i) / 12);
    for (const i of [1e-12, 1e-9, 1e-6]) expect(annuityFactor(i, 20) / series(i, 20) - 1).toBeCloseTo(0, 14);
  });

  it('repays the sum: n payments of a, discounted, are worth 1 today', () => {
    // Definition of the capital recovery factor; the present value of a level annuity of a.
    for (const [i, n] of [[0.05, 20], [0.08, 15], [0.02, 40], [0.3, 3]] as const) {
      expect(annuityFactor(i, n) * presentValueBySum(0, i, n)).toBeCloseTo(1, 12);
    }
  });
});

describe('present-value factor of an escalating energy cost', () => {
  it('agrees with the closed form of a growing annuity and with the year-by-year sum', () => {
    // Closed form (1 − xⁿ)(1 + e)/(i − e), x = (1 + e)/(1 + i): the geometric series Σ x^k, k = 1..n.
    for (const [e, i, n] of [[0.03, 0.05, 15], [0.05, 0.03, 20], [-0.02, 0.08, 30], [0.1, 0.02, 50], [0, 0.06, 10]] as const) {
      const x = (1 + e) / (1 + i);
      const closed = ((1 - x ** n) * (1 + e)) / (i - e);
      expect(presentValueFactor(e, i, n)).toBeCloseTo(closed, 10);
      expect(presentValueFactor(e, i, n)).toBeCloseTo(presentValueBySum(e, i, n), 10);
    }
  });

  it('is the level-annuity present worth 1/a without escalation', () => {
    // (P/A, 5 %, 20) = 12.4622 in the compound-interest tables (from memory), the reciprocal of (A/P).
    expect(presentValueFactor(0, 0.05, 20)).toBeCloseTo(12.4622, 4);
    expect(presentValueFactor(0, 0.05, 20) * annuityFactor(0.05, 20)).toBeCloseTo(1, 12);
  });

  it('is (1 + e) times the textbook geometric-gradient factor, whose first payment is not yet escalated', () => {
    // (P/A₁, g, i, n) = (1 − ((1 + g)/(1 + i))ⁿ)/(i − g) prices a first payment A₁ at the end of
    // year 1; here year 1 already pays today's price escalated once (the convention of the module).
    const [e, i, n] = [0.04, 0.07, 12];
    const gradient = (1 - ((1 + e) / (1 + i)) ** n) / (i - e);
    expect(presentValueFactor(e, i, n)).toBeCloseTo((1 + e) * gradient, 12);
  });

  it('is n when the escalation equals the discount rate, and tends to n either side', () => {
    // x = 1: every year's escalation cancels its discounting, Σ 1 = n.
    expect(presentValueFactor(0.05, 0.05, 20)).toBe(20);
    expect(presentValueFactor(0, 0, 7)).toBe(7);
    for (const gap of [1e-6, -1e-6, 1e-9, -1e-9, 1e-13, -1e-13]) {
      expect(presentValueFactor(0.05 + gap, 0.05, 20)).toBeCloseTo(presentValueBySum(0.05 + gap, 0.05, 20), 9);
    }
    // Near x = 1, PV ≈ n + (x − 1)·n(n + 1)/2 (Σ k·(x − 1) to first order, derived here): 210 per unit of x − 1 at n = 20.
    expect(presentValueFactor(0.05 - 1e-9, 0.05, 20)).toBeCloseTo(20 - (210 * 1e-9) / 1.05, 12);
    expect(presentValueFactor(0.05 + 1e-13, 0.05, 20)).toBeCloseTo(20, 10);
  });

  it('is the plain sum of escalated amounts when money is not discounted (i = 0)', () => {
    // Σ (1 + e)^k, k = 1..n = (1 + e)((1 + e)ⁿ − 1)/e: geometric series.
    expect(presentValueFactor(0.03, 0, 10)).toBeCloseTo((1.03 * (1.03 ** 10 - 1)) / 0.03, 12);
    expect(presentValueFactor(0, 0, 10)).toBe(10);
  });

  it('gives SizingResult.factors from the economics', () => {
    expect(economicFactors({ priceEscalation: 0.03, discountRate: 0.05, years: 15 })).toEqual({
      presentValue: presentValueFactor(0.03, 0.05, 15),
      annuity: annuityFactor(0.05, 15),
    });
  });
});

const ECONOMICS: SizingEconomics = {
  energyPrice: 0.08,
  priceEscalation: 0.03,
  generationEfficiency: 0.9,
  discountRate: 0.05,
  years: 15,
  emissionFactor: 0.202,
  emissionSource: 'IPCC 2006 default for natural gas (from memory)',
  costTable: 'Demo mineral wool pipe sections with aluminium jacket',
};

describe('a row of the sizing table: energy, cost, CO₂ and lifecycle cost', () => {
  it('turns delivered heat into purchased energy, its cost and its CO₂ (by hand)', () => {
    // 450 kWh/a delivered by a 0.9-efficient boiler: 500 kWh of fuel; × 0.08 = 40 a year; × 0.202 = 101 kg.
    expect(annualPurchasedEnergy(450, ECONOMICS)).toBeCloseTo(500, 12);
    expect(annualEnergyCost(450, ECONOMICS)).toBeCloseTo(40, 12);
    expect(annualEmissions(450, ECONOMICS)).toBeCloseTo(101, 12);
  });

  it('uses the magnitude of a heat gain, and a COP for cooling', () => {
    // A chilled line gaining 600 kWh/a with a chiller of COP 3: 200 kWh of electricity (common practice, no source).
    const cooling = { ...ECONOMICS, generationEfficiency: 3, energyPrice: 0.2, emissionFactor: 0.21 };
    expect(annualPurchasedEnergy(-600, cooling)).toBeCloseTo(200, 12);
    expect(annualEnergyCost(-600, cooling)).toBeCloseTo(40, 12);
    expect(annualEmissions(-600, cooling)).toBeCloseTo(42, 12);
  });

  it('adds the present value of the energy to the installed cost', () => {
    const pv = presentValueFactor(0.03, 0.05, 15);
    expect(lifecycleCost(35, 40, pv)).toBeCloseTo(35 + 40 * pv, 12);
    const row = rowEconomics(450, 35, ECONOMICS);
    expect(row.annualEnergyCost).toBeCloseTo(40, 12);
    expect(row.annualEmissions).toBeCloseTo(101, 12);
    expect(row.insulationCost).toBe(35);
    expect(row.lifecycleCost).toBeCloseTo(35 + 40 * pv, 10);
    // By the definition: the installed cost plus each year's escalated energy cost discounted to today.
    let byYear = 35;
    for (let k = 1; k <= 15; k++) byYear += (40 * 1.03 ** k) / 1.05 ** k;
    expect(row.lifecycleCost).toBeCloseTo(byYear, 10);
  });
});

describe('economic thickness', () => {
  const rows = (costs: readonly (number | null)[]) => costs.map((lifecycleCost, k) => ({ thickness: 0.02 + 0.01 * k, lifecycleCost }));

  it('is the row of least lifecycle cost, in whatever order the rows come', () => {
    expect(leastLifecycleCostRow(rows([120, 100, 95, 97, 104]))?.thickness).toBeCloseTo(0.04, 12);
    expect(leastLifecycleCostRow(rows([120, 100, 95, 97, 104]).reverse())?.thickness).toBeCloseTo(0.04, 12);
  });

  it('breaks a tie, exact or within round-off, for the thinner row', () => {
    expect(leastLifecycleCostRow(rows([120, 95, 95, 104]))?.thickness).toBeCloseTo(0.03, 12);
    expect(leastLifecycleCostRow(rows([120, 95, 95 * (1 - 1e-13), 104]))?.thickness).toBeCloseTo(0.03, 12);
    expect(leastLifecycleCostRow(rows([120, 95, 95, 104]).reverse())?.thickness).toBeCloseTo(0.03, 12);
  });

  it('skips rows without a cost and gives null when none has one', () => {
    expect(leastLifecycleCostRow(rows([null, 100, null]))?.thickness).toBeCloseTo(0.03, 12);
    expect(leastLifecycleCostRow(rows([null, null]))).toBeNull();
    expect(leastLifecycleCostRow([])).toBeNull();
  });

  it('property: with a convex lifecycle cost it is where the cost stops falling', () => {
    // C(t) = I₀ + b·t + E/(t + d): a rising installed cost and a falling, convex energy cost, the
    // shape of heat loss through insulation (common practice, no source). Over a rising series the
    // least cost is the first row whose next row costs no less.
    const series = fc.uniqueArray(fc.integer({ min: 5, max: 400 }), { minLength: 1, maxLength: 15 }).map((mm) => mm.sort((a, b) => a - b).map((m) => m / 1000));
    fc.assert(
      fc.property(series, fc.double({ min: 0, max: 2000, noNaN: true }), fc.double({ min: 1, max: 1e4, noNaN: true }), fc.double({ min: 0.01, max: 0.3, noNaN: true }), (thicknesses, b, e, d) => {
        const costed = thicknesses.map((thickness) => ({ thickness, lifecycleCost: 10 + b * thickness + e / (thickness + d) }));
        const stop = costed.findIndex((row, k) => k === costed.length - 1 || costed[k + 1]!.lifecycleCost >= row.lifecycleCost);
        const chosen = leastLifecycleCostRow(costed)!;
        const best = Math.min(...costed.map((r) => r.lifecycleCost));
        expect(chosen.lifecycleCost).toBeLessThanOrEqual(best * (1 + 1e-9));
        // Where two neighbours tie within round-off the thinner one is taken, which is where it stopped falling.
        expect(chosen.thickness).toBe(costed[stop]!.thickness);
      }),
    );
  });
});

const HEADER = 'table,basis,pipe outer diameter [mm],thickness [mm],installed cost [per m or per m²],source';
const TEST_CSV = [
  HEADER,
  'Pipe test,per-metre,50,20,10,"test rates, invented"',
  'Pipe test,per-metre,50,40,14,"test rates, invented"',
  'Pipe test,per-metre,100,20,16,"test rates, invented"',
  'Pipe test,per-metre,100,40,24,"test rates, invented"',
  'Pipe test,per-metre,100,60,30,"test rates, invented"',
  'Flat test,per-square-metre,,50,40,test rates',
  'Flat test,per-square-metre,,100,60,test rates',
].join('\n');

describe('installed-cost CSV', () => {
  it('reads tables in SI, each with its rows and sources', () => {
    const [pipe, flat] = parseInstalledCostTables(TEST_CSV);
    expect(pipe).toEqual({
      name: 'Pipe test',
      basis: 'per-metre',
      points: [[0.05, 0.02, 10], [0.05, 0.04, 14], [0.1, 0.02, 16], [0.1, 0.04, 24], [0.1, 0.06, 30]],
      source: 'test rates, invented',
    });
    expect(flat).toEqual({ name: 'Flat test', basis: 'per-square-metre', points: [[0, 0.05, 40], [0, 0.1, 60]], source: 'test rates' });
  });

  it('takes the columns in any order, a byte-order mark, CRLF line ends and blank lines', () => {
    const csv = '\uFEFFsource,thickness [mm],installed cost [per m or per m²],basis,table,pipe outer diameter [mm]\r\n\r\nx,50,40,per-square-metre,Flat,\r\n,,,,,\r\n';
    expect(parseInstalledCostTables(csv)).toEqual([{ name: 'Flat', basis: 'per-square-metre', points: [[0, 0.05, 40]], source: 'x' }]);
  });

  const bad = (row: string) => refusal(() => parseInstalledCostTables(`${HEADER}\nPipe test,per-metre,50,20,10,ok\n${row}`, 'costs.csv')).message;

  it('refuses a bad row in one sentence naming the line and the column', () => {
    expect(bad('Pipe test,per-metre,50,abc,12,ok')).toBe('costs.csv line 3, column 4 (thickness [mm]) must be a number more than 0 and at most 2000 mm (got "abc").');
    expect(bad('Pipe test,per-metre,0,30,12,ok')).toBe('costs.csv line 3, column 3 (pipe outer diameter [mm]) must be a number more than 0 and at most 5000 mm (got "0").');
    expect(bad('Pipe test,per-metre,50,30,-1,ok')).toBe('costs.csv line 3, column 5 (installed cost [per m or per m²]) must be a number at least 0 and at most 10000000 (got "-1").');
    expect(bad('Pipe test,per-metre,50,30,0x10,ok')).toBe('costs.csv line 3, column 5 (installed cost [per m or per m²]) must be a number at least 0 and at most 10000000 (got "0x10").');
    expect(bad('Pipe test,per metre,50,30,12,ok')).toBe("costs.csv line 3, column 2 (basis) must be one of 'per-metre', 'per-square-metre' (got \"per metre\").");
    expect(bad('Pipe test,per-square-metre,,30,12,ok')).toBe("costs.csv line 3, column 2 (basis) must be 'per-metre' like line 2 of the table 'Pipe test' (got \"per-square-metre\").");
    expect(bad('Flat,per-square-metre,60.3,30,12,ok')).toBe('costs.csv line 3, column 3 (pipe outer diameter [mm]) must be empty in a per-square-metre table, which has no pipe diameter (got "60.3").');
    expect(bad(',per-metre,50,30,12,ok')).toBe('costs.csv line 3, column 1 (table) must be text of 1 to 200 characters (got "").');
    expect(bad('Pipe test,per-metre,50,30,12,')).toBe('costs.csv line 3, column 6 (source) must be text of 1 to 300 characters (got "").');
    expect(bad('Pipe test,per-metre,50,30,12')).toBe('costs.csv line 3 has 5 fields where the header has 6.');
    expect(bad('Pipe test,per-metre,50,20,11,ok')).toBe("costs.csv line 3 repeats the pipe outer diameter 50 mm and thickness 20 mm of line 2 in the table 'Pipe test'.");
    expect(bad('Pipe test,per-metre,50,30,12,"not closed')).toBe('costs.csv line 3, column 6 has a quoted field that is not closed on its line.');
  });

  it('refuses a bad header, an empty file and a file without rows', () => {
    expect(refusal(() => parseInstalledCostTables(HEADER.replace('thickness [mm]', 'thickness [in]'), 'costs.csv')).message).toBe(
      "costs.csv line 1, column 4 ('thickness [in]') is not a column of an installed-cost table; the columns are 'table', 'basis', 'pipe outer diameter [mm]', 'thickness [mm]', 'installed cost [per m or per m²]', 'source'.",
    );
    expect(refusal(() => parseInstalledCostTables(HEADER.replace(',source', ''), 'costs.csv')).message).toMatch(/^costs\.csv line 1 lacks the column 'source'; the columns are /);
    expect(refusal(() => parseInstalledCostTables(`${HEADER},table`, 'costs.csv')).message).toBe("costs.csv line 1, column 7 repeats the column 'table'.");
    expect(refusal(() => parseInstalledCostTables(HEADER, 'costs.csv')).message).toBe('costs.csv has no rows of installed costs below its header.');
    expect(refusal(() => parseInstalledCostTables('\n\n', 'costs.csv')).message).toMatch(/^costs\.csv is empty: it needs the header /);
  });

  it('is all or nothing: a bad last row refuses the whole file', () => {
    expect(() => parseInstalledCostTables(`${TEST_CSV}\nFlat test,per-square-metre,,150,oops,test rates`)).toThrow(/line 9, column 5/);
  });

  it('splits a line as a spreadsheet quotes it', () => {
    expect(csvLineFields('a,"b, c","say ""hi""",')).toEqual({ fields: ['a', 'b, c', 'say "hi"', ''] });
    expect(csvLineFields('a,b"c')).toEqual({ problem: 'has a quote inside an unquoted field', column: 2 });
    expect(csvLineFields('"a"b,c')).toEqual({ problem: 'has text after a closing quote', column: 1 });
  });
});

describe('installed cost by interpolation', () => {
  const [pipe, flat] = parseInstalledCostTables(TEST_CSV) as [InstalledCostTable, InstalledCostTable];

  it('is exact at the nodes', () => {
    for (const [d, t, cost] of pipe.points) expect(installedCost(pipe, d, t)).toBe(cost);
    for (const [, t, cost] of flat.points) expect(installedCost(flat, null, t)).toBe(cost);
  });

  it('is linear between the nodes: along a row, across diameters and bilinear inside a cell', () => {
    expect(installedCost(pipe, 0.05, 0.03)).toBeCloseTo(12, 12);
    expect(installedCost(pipe, 0.1, 0.05)).toBeCloseTo(27, 12);
    expect(installedCost(pipe, 0.075, 0.02)).toBeCloseTo(13, 12);
    // Bilinear at the cell's centre: the mean of its four corners (10 + 14 + 16 + 24)/4.
    expect(installedCost(pipe, 0.075, 0.03)).toBeCloseTo(16, 12);
    // At a quarter of each side: Σ weights × corners, weights (3/4·3/4, 3/4·1/4, 1/4·3/4, 1/4·1/4).
    expect(installedCost(pipe, 0.0625, 0.025)).toBeCloseTo((9 * 10 + 3 * 14 + 3 * 16 + 1 * 24) / 16, 12);
    expect(installedCost(flat, null, 0.075)).toBeCloseTo(50, 12);
    expect(installedCost(flat, 0.3, 0.075)).toBeCloseTo(50, 12);
  });

  it('takes a thickness a range series lands a few ulps beyond the last row as on it', () => {
    const justAbove = 0.06 * (1 + 4 * Number.EPSILON);
    expect(justAbove).toBeGreaterThan(0.06);
    expect(installedCost(pipe, 0.1, justAbove)).toBe(30);
    expect(installedCost(pipe, 0.1 * (1 + 4 * Number.EPSILON), 0.04)).toBe(24);
    // A micrometre beyond is outside.
    expect(() => installedCost(pipe, 0.1, 0.060001)).toThrow(InputError);
  });

  it('refuses to extrapolate, naming the thickness or diameter and the range the table covers', () => {
    expect(refusal(() => installedCost(pipe, 0.1, 0.08)).message).toBe(
      "sizing.economics.costTable 'Pipe test' covers thicknesses from 0.02 m to 0.06 m at an outer diameter of 0.1 m, so it gives no cost for 0.08 m (it does not extrapolate).",
    );
    // Between the diameters, the row either side that does not reach the thickness decides.
    expect(refusal(() => installedCost(pipe, 0.075, 0.05)).message).toBe(
      "sizing.economics.costTable 'Pipe test' covers thicknesses from 0.02 m to 0.04 m at an outer diameter of 0.05 m, so it gives no cost for 0.05 m (it does not extrapolate).",
    );
    expect(refusal(() => installedCost(pipe, 0.2, 0.03)).message).toBe(
      "sizing.economics.costTable 'Pipe test' covers pipe outer diameters from 0.05 m to 0.1 m, so it gives no cost for 0.2 m (it does not extrapolate).",
    );
    expect(refusal(() => installedCost(flat, null, 0.01, 'costs')).message).toBe(
      "costs 'Flat test' covers thicknesses from 0.05 m to 0.1 m, so it gives no cost for 0.01 m (it does not extrapolate).",
    );
    expect(refusal(() => installedCost(pipe, null, 0.03)).message).toBe(
      "sizing.economics.costTable 'Pipe test' prices per metre of pipe by outer diameter; a flat surface needs a per-square-metre table.",
    );
  });

  it('writes a thickness a range series makes to six significant figures, not its binary noise', () => {
    // 0.1 + 0.2239 is 0.32389999999999997 in binary floating point (IEEE 754 doubles); the sentence says 0.3239 m.
    const fromRange = 0.1 + 0.2239;
    expect(String(fromRange)).toBe('0.32389999999999997');
    expect(refusal(() => installedCost(pipe, 0.1, fromRange)).message).toBe(
      "sizing.economics.costTable 'Pipe test' covers thicknesses from 0.02 m to 0.06 m at an outer diameter of 0.1 m, so it gives no cost for 0.3239 m (it does not extrapolate).",
    );
    expect(refusal(() => installedCost(flat, null, fromRange)).message).toBe(
      "sizing.economics.costTable 'Flat test' covers thicknesses from 0.05 m to 0.1 m, so it gives no cost for 0.3239 m (it does not extrapolate).",
    );
  });

  it('states the refusal in a project’s units', () => {
    // 1 in = 25.4 mm exactly (NIST SP 811): 0.08 m reads 3.14961 in; the form's text in its own units.
    const error = refusal(() => installedCost(pipe, 0.1, 0.08));
    expect(writeShownSentence(error.sentence!, quantityText('IP'))).toMatch(/so it gives no cost for 3\.1496\d* in/);
  });

  it('finds a table by name and checks its basis', () => {
    expect(findCostTable([pipe, flat], 'Flat test')).toBe(flat);
    expect(refusal(() => findCostTable([pipe, flat], 'Roof')).message).toBe("sizing.economics.costTable names no installed-cost table; the tables are 'Pipe test', 'Flat test' (got \"Roof\").");
    expect(requireCostBasis(pipe, 'per-metre')).toBe(pipe);
    expect(refusal(() => requireCostBasis(flat, 'per-metre')).message).toBe("sizing.economics.costTable 'Flat test' is a per-square-metre table; a pipe needs a per-metre table.");
  });
});

describe('shipped data', () => {
  it('the demo cost tables read whole, marked invented, priced for the demo cases', () => {
    const tables = installedCostCatalogue();
    expect(tables.map((t) => [t.name, t.basis])).toEqual([
      ['Demo mineral wool pipe sections with aluminium jacket', 'per-metre'],
      ['Demo elastomeric foam tubes', 'per-metre'],
      ['Demo mineral wool slabs with aluminium jacket (flat surfaces)', 'per-square-metre'],
    ]);
    for (const t of tables) expect(t.source).toMatch(/demo data, invented.*replace with your own rates/);
    // The demo hot-water (DN100, 114.3 mm, 50 mm) and chilled-water (76.1 mm, 25 mm) lines and the tank wall (100 mm).
    expect(installedCost(tables[0]!, 0.1143, 0.05)).toBeGreaterThan(0);
    expect(installedCost(tables[1]!, 0.0761, 0.025)).toBeGreaterThan(0);
    expect(installedCost(tables[2]!, null, 0.1)).toBeGreaterThan(0);
    // A thicker section of the same pipe costs more (common practice, no source).
    for (const t of tables) {
      for (const [d, th, cost] of t.points) {
        const thicker = t.points.find(([d2, th2]) => d2 === d && th2 > th);
        if (thicker) expect(thicker[2]).toBeGreaterThan(cost);
      }
    }
  });

  it('the emission factors each carry a source, and the recalled or invented ones say so', () => {
    expect(EMISSION_FACTORS.length).toBeGreaterThanOrEqual(4);
    for (const f of EMISSION_FACTORS) {
      expect(f.source.length).toBeGreaterThan(10);
      expect(f.source).toMatch(/from memory|invented/);
      expect(() => validateSizingEconomics({ ...ECONOMICS, emissionFactor: f.factor, emissionSource: f.source })).not.toThrow();
    }
    // IPCC 2006 defaults in kg/TJ (from memory) converted with 1 kWh = 3.6e-6 TJ (definition of the kWh).
    const byId = new Map(EMISSION_FACTORS.map((f) => [f.id, f.factor]));
    expect(byId.get('natural-gas-net')).toBeCloseTo(56_100 * 3.6e-6, 3);
    expect(byId.get('heating-oil-net')).toBeCloseTo(74_100 * 3.6e-6, 3);
    expect(byId.get('lpg-net')).toBeCloseTo(63_100 * 3.6e-6, 3);
    // Natural gas by gross calorific value in the UK government tables: about 0.18 to 0.19 (from memory).
    expect(byId.get('natural-gas-gross')).toBeGreaterThan(0.17);
    expect(byId.get('natural-gas-gross')).toBeLessThan(0.2);
  });

  it('the Node and renderer loaders read the same file', () => {
    const text = readFileSync(new URL('../../data/sizing/installed-costs.csv', import.meta.url), 'utf8');
    expect(parseInstalledCostTables(text, 'data/sizing/installed-costs.csv')).toEqual(installedCostCatalogue());
  });
});

describe('validation of sizing.economics', () => {
  const message = (patch: Record<string, unknown>) => refusal(() => validateSizingEconomics({ ...ECONOMICS, ...patch })).message;

  it('accepts good economics and copies only the known fields', () => {
    expect(validateSizingEconomics(ECONOMICS)).toEqual(ECONOMICS);
    expect(validateSizingEconomics({ ...ECONOMICS, currency: 'EUR' }).currency).toBe('EUR');
    const inline = { name: 'Own', basis: 'per-square-metre', points: [[0, 0.05, 40], [0, 0.1, 60]], source: 'our rates' };
    expect(validateSizingEconomics({ ...ECONOMICS, costTable: inline }).costTable).toEqual(inline);
  });

  it('refuses each field out of range in one sentence naming it and the range', () => {
    expect(message({ discountRate: 0.9 })).toBe('sizing.economics.discountRate must be at least 0 and at most 0.5 (got 0.9).');
    expect(message({ energyPrice: 0 })).toBe('sizing.economics.energyPrice must be more than 0 and at most 1000 (got 0).');
    expect(message({ priceEscalation: 3 })).toBe('sizing.economics.priceEscalation must be at least -0.5 and at most 0.5 (got 3).');
    expect(message({ generationEfficiency: 0 })).toBe('sizing.economics.generationEfficiency must be more than 0 and at most 10 (got 0).');
    expect(message({ emissionFactor: 202 })).toBe('sizing.economics.emissionFactor must be at least 0 and at most 10 kg/kWh (got 202).');
    expect(message({ years: 2.5 })).toBe('sizing.economics.years must be a whole number from 1 to 100 (got 2.5).');
    expect(message({ energyPrice: 'cheap' })).toBe('sizing.economics.energyPrice must be a number, more than 0 and at most 1000 (got "cheap").');
    expect(message({ discountRate: undefined })).toBe('sizing.economics.discountRate must be a number, at least 0 and at most 0.5 (got nothing).');
    expect(message({ emissionSource: '  ' })).toBe('sizing.economics.emissionSource must be text of 1 to 300 characters (got "  ").');
    expect(message({ currency: 'euros of the realm' })).toBe('sizing.economics.currency must be text of 1 to 12 characters (got "euros of the realm").');
    expect(message({ costTable: 7 })).toBe('sizing.economics.costTable must be the name of an installed-cost table or a table { name, basis, points, source }.');
    expect(message({ interest: 0.05 })).toMatch(/^sizing\.economics\.interest is not a known field here; allowed: energyPrice, /);
    expect(refusal(() => validateSizingEconomics(null)).message).toMatch(/^sizing\.economics must be an object/);
  });

  it('refuses a bad inline cost table by its path', () => {
    const table = (patch: Record<string, unknown>) => message({ costTable: { name: 'Own', basis: 'per-metre', points: [[0.06, 0.05, 40]], source: 'ours', ...patch } });
    expect(table({ points: [[0.06, 0.05, 40], [0.06, 0, 50]] })).toBe('sizing.economics.costTable.points[1][1] must be more than 0 and at most 2 m (got 0).');
    expect(table({ points: [[0.06, 0.05, 40], [0.06, 0.05, 50]] })).toBe('sizing.economics.costTable.points[1] repeats the outer diameter and thickness of sizing.economics.costTable.points[0].');
    expect(table({ points: [[0.06, 0.05]] })).toMatch(/^sizing\.economics\.costTable\.points\[0\] must be a list of 3 numbers/);
    expect(table({ basis: 'per-square-metre' })).toBe('sizing.economics.costTable.points[0][0] must be 0 in a per-square-metre table, which has no pipe diameter (got 0.06).');
    expect(table({ points: [] })).toBe('sizing.economics.costTable.points must be a list of 1 to 5000 entries.');
  });

  it('states a rate’s range in per cent in a form that shows per cent', () => {
    const error = refusal(() => validateSizingEconomics({ ...ECONOMICS, discountRate: 0.9 }));
    expect(writeShownSentence(error.sentence!, quantityText('SI'))).toBe('sizing.economics.discountRate must be at least 0 and at most 50 %/a (got 90 %/a).');
    expect(ECONOMICS_RANGES.discountRate.quantity).toBe('ratePerYear');
  });
});
