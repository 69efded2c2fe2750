/**
 * The library's letterhead for printed reports, kept as JSON in the settings table under the key
 * 'letterhead'. A library that never saved one prints without (EMPTY_LETTERHEAD). A stored value
 * that no longer passes the checks (edited by hand, or from a later Lamina) is not printed either:
 * reading falls back to the empty letterhead rather than failing every report.
 */
import { EMPTY_LETTERHEAD, type Letterhead } from '../../app/report/project-report.js';
import { inWriteTransaction, type DatabaseContext } from './database-context.js';
import { validateLetterhead } from './letterhead-validation.js';

const LETTERHEAD_KEY = 'letterhead';

export class LetterheadService {
  constructor(private readonly context: DatabaseContext) {}

  get(): Letterhead {
    const row = this.context.db.prepare('SELECT value FROM settings WHERE key = ?').get(LETTERHEAD_KEY) as { value: string } | undefined;
    return row ? parseStoredLetterhead(row.value) ?? EMPTY_LETTERHEAD : EMPTY_LETTERHEAD;
  }

  /** Checks the letterhead, stores it and returns it as stored (texts trimmed). */
  save(letterhead: unknown): Letterhead {
    const checked = validateLetterhead(letterhead);
    inWriteTransaction(this.context, () =>
      this.context.db
        .prepare('INSERT INTO settings (key, value) VALUES (?, ?) ON CONFLICT(key) DO UPDATE SET value = excluded.value')
        .run(LETTERHEAD_KEY, JSON.stringify(checked)),
    );
    return checked;
  }
}

/** A letterhead stored as JSON (settings or a project's own copy), or null when it is not a valid one. */
export function parseStoredLetterhead(json: string): Letterhead | null {
  try {
    return validateLetterhead(JSON.parse(json));
  } catch {
    return null;
  }
}
