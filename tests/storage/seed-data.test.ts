import fs from 'node:fs';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { conductivityAt } from '../../app/fe/conductivity.js';
import { parseCsv } from '../../main/storage/csv.js';
import { DEFAULT_SEED_FOLDER, readSeedFolder } from '../../main/services/seed-materials.js';

const DATA = fileURLToPath(new URL('../../data/', import.meta.url));
const table = (file: string) => {
  const [header, ...rows] = parseCsv(fs.readFileSync(DATA + file, 'utf8'));
  return { header: header!.fields, rows: rows.map((r) => r.fields) };
};

describe('seed data files', () => {
  it('every material row validates and names its source', () => {
    const rows = readSeedFolder(DEFAULT_SEED_FOLDER);
    expect(rows.length).toBeGreaterThan(50);
    for (const { input } of rows) expect(input.source.length, input.name).toBeGreaterThan(10);
  });

  it('carries published values where the reference notes have them', () => {
    const byName = new Map(readSeedFolder(DEFAULT_SEED_FOLDER).map((r) => [r.input.name, r.input]));
    // ISO 10456 / EN 12524 generic values (reference notes §5.1): steel 50, copper 380, aluminium 160 W/(m·K).
    expect(byName.get('Carbon steel pipe')!.conductivity).toEqual({ kind: 'constant', value: 50 });
    expect(byName.get('Copper pipe')!.conductivity).toEqual({ kind: 'constant', value: 380 });
    // ISO 12241 cladding emissivities (from memory, reference notes §1.6).
    expect(byName.get('Aluminium cladding, bright rolled')!.emissivity).toBe(0.05);
    expect(byName.get('Galvanised steel cladding, dusty')!.emissivity).toBe(0.44);
    // Rock wool typical curve (indicative, common practice, no source): 0.046 at 100 °C, 0.054 halfway to 200 °C.
    const rock = byName.get('Rock wool pipe section, typical curve')!;
    expect(conductivityAt(rock.conductivity, 100)).toBeCloseTo(0.046, 12);
    expect(conductivityAt(rock.conductivity, 150)).toBeCloseTo(0.054, 12);
    expect(rock.source).toMatch(/indicative/);
  });

  it('pipe size tables have units in the header, a source on every row and rising diameters', () => {
    for (const file of ['pipe-sizes/steel.csv', 'pipe-sizes/copper-en1057.csv', 'pipe-sizes/copper-astm-b88.csv', 'pipe-sizes/plastic-metric.csv', 'insulation-thickness-series.csv']) {
      const { header, rows } = table(file);
      expect(header.some((h) => /\[mm\]/.test(h)), file).toBe(true);
      expect(header[header.length - 1]).toBe('source');
      for (const row of rows) expect(row[row.length - 1]!.length, file).toBeGreaterThan(5);
      const mm = header.findIndex((h) => /\[mm\]/.test(h));
      const values = rows.map((r) => Number(r[mm]));
      values.forEach((v) => expect(Number.isFinite(v) && v > 0).toBe(true));
      if (!file.startsWith('insulation')) expect(values).toEqual([...values].sort((a, b) => a - b));
    }
    // ISO 4200 / ASME B36.10M (from memory, reference notes §7): DN100 = 114.3 mm, DN65 76.1 vs NPS 2½ 73.0 mm.
    const steel = table('pipe-sizes/steel.csv').rows;
    expect(steel.find((r) => r[0] === '100')!.slice(2, 4)).toEqual(['114.3', '114.3']);
    expect(steel.find((r) => r[0] === '65')!.slice(2, 4)).toEqual(['76.1', '73.0']);
    // ASTM B88: OD = nominal + 1/8 in (reference notes §7).
    for (const [nominal, od] of table('pipe-sizes/copper-astm-b88.csv').rows) {
      const inches = nominal!.split(' ').reduce((s, part) => s + (part.includes('/') ? Number(part.split('/')[0]) / Number(part.split('/')[1]) : Number(part)), 0);
      expect(Number(od)).toBeCloseTo((inches + 0.125) * 25.4, 1);
    }
  });
});
