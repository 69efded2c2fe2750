import { createHash } from 'node:crypto';
import fs from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { inWriteTransaction, nowIso, type DatabaseContext } from './database-context.js';
import { parseMaterialsCsv, type ParsedMaterialRow } from './material-csv.js';
import { materialParameters } from './material-rows.js';
import type { MaterialsService } from './materials-service.js';

/** data/materials in the source tree; the packaged app passes its own folder. */
export const DEFAULT_SEED_FOLDER = fileURLToPath(new URL('../../data/materials/', import.meta.url));

/**
 * Loads the built-in materials from the seed CSV files. A built-in is identified by its seed key
 * (its name in the seed file), so a corrected value in a later release updates the built-in in
 * place and every case using it follows. Built-ins dropped from the seed are deleted when unused
 * and kept otherwise. Skipped entirely when the seed files have not changed since the last run.
 */
export function seedBuiltInMaterials(context: DatabaseContext, materials: MaterialsService, folder: string = DEFAULT_SEED_FOLDER): { added: number; updated: number; removed: number } {
  const rows = readSeedFolder(folder);
  const fingerprint = createHash('sha256').update(JSON.stringify(rows.map((r) => r.input), (_k, v) => (v === Infinity ? 'inf' : v))).digest('hex');
  const db = context.db;
  const stored = db.prepare(`SELECT value FROM app_meta WHERE key = 'seed_fingerprint'`).get() as { value: string } | undefined;
  if (stored?.value === fingerprint) return { added: 0, updated: 0, removed: 0 };

  return inWriteTransaction(context, () => {
    let added = 0;
    let updated = 0;
    let removed = 0;
    const keys = new Set<string>();
    for (const { input } of rows) {
      keys.add(input.name);
      const existing = db.prepare('SELECT id, name FROM materials WHERE seed_key = ? AND built_in = 1').get(input.name) as { id: number; name: string } | undefined;
      if (existing) {
        db.prepare(
          `UPDATE materials SET category = @category, conductivity = @conductivity, density = @density, specific_heat = @specific_heat,
             mu = @mu, sd = @sd, emissivity = @emissivity, min_service_temp = @min_service_temp, max_service_temp = @max_service_temp,
             source = @source, notes = @notes, updated_at = @now WHERE id = @id`,
        ).run({ ...materialParameters(input), id: existing.id, now: nowIso() });
        updated++;
      } else {
        // A user material may already have this name: the built-in then takes a marked name.
        const name = materials.findByName(input.name) ? materials.freeName(`${input.name} (built-in)`) : input.name;
        materials.insert({ ...input, name }, { builtIn: true, seedKey: input.name });
        added++;
      }
    }
    const built = db.prepare('SELECT id, seed_key FROM materials WHERE built_in = 1').all() as { id: number; seed_key: string }[];
    for (const b of built) {
      if (keys.has(b.seed_key)) continue;
      const used = db.prepare('SELECT 1 FROM case_materials WHERE material_id = ?').get(b.id);
      if (!used) {
        db.prepare('DELETE FROM materials WHERE id = ?').run(b.id);
        removed++;
      }
    }
    db.prepare(`INSERT INTO app_meta (key, value) VALUES ('seed_fingerprint', ?) ON CONFLICT(key) DO UPDATE SET value = excluded.value`).run(fingerprint);
    return { added, updated, removed };
  });
}

/** Every row of every CSV in the folder; a bad seed file is a bug in the release, reported in full. */
export function readSeedFolder(folder: string): ParsedMaterialRow[] {
  if (!fs.existsSync(folder)) throw new Error(`The built-in materials folder ${folder} is missing; the installation is incomplete.`);
  const files = fs.readdirSync(folder).filter((f) => f.endsWith('.csv')).sort();
  const rows: ParsedMaterialRow[] = [];
  const problems: string[] = [];
  const seen = new Map<string, string>();
  for (const file of files) {
    const parsed = parseMaterialsCsv(fs.readFileSync(path.join(folder, file), 'utf8'));
    problems.push(...parsed.problems.map((p) => `${file} line ${p.line}: ${p.message}`));
    for (const row of parsed.rows) {
      const key = row.input.name.toLowerCase();
      const where = `${file} line ${row.line}`;
      if (seen.has(key)) problems.push(`${where}: name "${row.input.name}" repeats ${seen.get(key)}.`);
      seen.set(key, where);
      rows.push(row);
    }
  }
  if (problems.length > 0) throw new Error(`The built-in materials are invalid:\n${problems.join('\n')}`);
  return rows;
}
