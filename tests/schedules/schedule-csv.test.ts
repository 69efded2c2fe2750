/**
 * Reading and writing a schedule in CSV: a bad row imports nothing and is named by its line and
 * column; units in the header (SI or US) convert at the edge; the export reads back as the same
 * schedule in either system. US factors: 1 ft = 0.3048 m and 1 in = 25.4 mm exactly (NIST SP 811),
 * θ_F = 1.8·θ_C + 32.
 */
import { describe, expect, it } from 'vitest';
import { readScheduleCsv } from '../../app/schedules/schedule-csv-read.js';
import { writeScheduleCsv } from '../../app/schedules/schedule-csv-write.js';
import { mergeRuns } from '../../app/schedules/schedule-import.js';
import { scheduleHeader } from '../../app/schedules/schedule-columns.js';
import { exampleCsv } from './schedule-fixture.js';

const runsOf = (text: string) => {
  const read = readScheduleCsv(text);
  if (!read.ok) throw new Error(JSON.stringify(read.problems));
  return read.runs;
};

describe('schedule CSV', () => {
  it('reads the example schedule: every row, SI, fittings counted', () => {
    const runs = runsOf(exampleCsv);
    expect(runs).toHaveLength(exampleCsv.trim().split('\n').length - 1);
    const first = runs[0]!;
    expect(first).toMatchObject({ reference: 'OVC-HTG-F-001', pipeSeries: 'steel-iso', pipeSize: 'DN100', length: 42, fluidTemperature: 80, location: 'Plant room', thickness: null, fittings: { valves: 4, flanges: 6, bends: 5 } });
    const outdoor = runs.find((r) => r.reference === 'OVC-HTG-F-004')!;
    expect(outdoor).toMatchObject({ location: 'outdoor', airTemperature: -8, relativeHumidity: 0.9, windSpeed: 6, thickness: 0.04 });
  });

  it('a file with bad rows imports nothing, and names each row by line and column in one sentence', () => {
    const lines = exampleCsv.trim().split('\n');
    lines[3] = lines[3]!.replace(',65,80,', ',-65,80,'); // line 4: a negative length
    lines[6] = lines[6]!.replace('copper-en1057', 'copper-xyz'); // line 7: an unknown series
    lines.push(lines[1]!); // a repeated reference at the end
    const read = readScheduleCsv(lines.join('\n'));
    expect(read.ok).toBe(false);
    if (read.ok) return;
    expect(read.problems.map((p) => [p.line, p.column])).toEqual([
      [4, 'length [m]'],
      [7, 'pipe series'],
      [lines.length, 'reference'],
    ]);
    expect(read.problems[0]!.message).toBe('length [m] must be above 0 and at most 100000 (got -65).');
    expect(read.problems[1]!.message).toMatch(/^pipe series must be one of steel-iso, .* \(got "copper-xyz"\)\.$/);
    expect(read.problems[2]!.message).toBe("reference 'OVC-HTG-F-001' is already the reference of line 2; each run needs its own.");
    for (const p of read.problems) expect(p.message.split('. ').length).toBe(1);
  });

  it('refuses a header with an unknown column, a missing required one, or mixed units', () => {
    const bad = (header: string) => {
      const read = readScheduleCsv(`${header}\nA,heating flow,steel-iso,DN50,10,80,Plant room\n`);
      return read.ok ? [] : read.problems.map((p) => p.message);
    };
    expect(bad('reference,service,pipe series,pipe size,length [m],fluid temprature [°C],location')[0]).toMatch(/^Column 'fluid temprature \[°C\]' is not a column of a schedule/);
    expect(bad('reference,service,pipe series,pipe size,length [m],location')).toContain("The header has no column 'fluid temperature [°C]' (or 'fluid temperature [°F]'), which every run needs.");
    expect(bad('reference,service,pipe series,pipe size,length [ft],fluid temperature [°C],location')).toContain('The header mixes SI and US units; write every unit in one system (mm, m, °C, m/s or in, ft, °F, mph).');
  });

  it('reads US units: feet, °F, inches and mph converted to SI', () => {
    const us = `${scheduleHeader('IP').join(',')}\nUS-1,heating flow,steel-asme,4,,100,176,outdoor,14,80,11.1847,horizontal,,1.5,1,2,3\n`;
    const [run] = runsOf(us);
    expect(run!.length).toBeCloseTo(30.48, 12); // 100 ft
    expect(run!.fluidTemperature).toBeCloseTo(80, 12); // 176 °F
    expect(run!.airTemperature).toBeCloseTo(-10, 12); // 14 °F
    expect(run!.thickness).toBeCloseTo(0.0381, 12); // 1.5 in
    expect(run!.windSpeed).toBeCloseTo(5, 4); // 11.1847 mph, 1 mph = 0.44704 m/s
  });

  for (const system of ['SI', 'IP'] as const) {
    it(`an export in ${system} units reads back as the same schedule`, () => {
      const runs = runsOf(exampleCsv);
      const written = writeScheduleCsv(runs, system);
      const again = readScheduleCsv(written);
      expect(again.ok && again.system).toBe(system);
      expect(runsOf(written)).toEqual(runs);
    });
  }

  it('a re-import updates changed runs by reference, adds new ones, keeps the rest, and says what changed', () => {
    const runs = runsOf(exampleCsv);
    const incoming = runs.slice(0, 3).map((r, i) => (i === 1 ? { ...r, length: 50, fluidTemperature: 65 } : r));
    const added = { ...runs[0]!, reference: 'OVC-NEW-001' };
    const { runs: merged, summary } = mergeRuns(runs, [...incoming, added]);
    expect(summary.added).toEqual(['OVC-NEW-001']);
    expect(summary.changed).toEqual([{ reference: runs[1]!.reference, columns: ['length', 'fluid temperature'] }]);
    expect(summary.unchanged).toBe(2);
    expect(summary.kept).toEqual(runs.slice(3).map((r) => r.reference));
    expect(merged).toHaveLength(runs.length + 1);
    expect(merged[1]!.length).toBe(50);
  });
});
