/**
 * The demo project's printed-report model for the HTML rendering tests: the cases of
 * data/demo/demo-project.json (each an example case file with its inline demo materials) solved
 * through reportCases, as the services build it, with an invented letterhead.
 */
import { readFileSync } from 'node:fs';
import path from 'node:path';
import type { UnitSystem } from '../../../app/base/unit-systems.js';
import { reportCases, type StoredCase } from '../../../app/cases/report-cases.js';
import { buildProjectReport, type Letterhead, type ProjectParticulars, type ProjectReport, type ReportedCase } from '../../../app/report/project-report.js';
import { caseContext } from '../../../main/cases/case-context.js';

const DATA = path.resolve(import.meta.dirname, '../../../data');

interface DemoDescription {
  readonly project: Record<string, string>;
  readonly cases: readonly { readonly name: string; readonly example: string }[];
}

export const DEMO = JSON.parse(readFileSync(path.join(DATA, 'demo', 'demo-project.json'), 'utf8')) as DemoDescription;

/** A 1×1 PNG (a valid image file), base64: the smallest logo there is. */
export const TINY_PNG = 'iVBORw0KGgoAAAANSUhEUgAAAAEAAAABCAYAAAAfFcSJAAAADUlEQVR42mNk+M9QDwADhgGAWjR9awAAAABJRU5ErkJggg==';

export const DEMO_LETTERHEAD: Letterhead = {
  firmName: 'Brackwater Thermal Engineering Ltd (invented firm)',
  address: '4 Weir Lane\nBrackwater BW1 2XY (invented)',
  telephone: '+44 1632 960000',
  email: 'office@brackwater.invalid',
  logo: { mediaType: 'image/png', base64: TINY_PNG },
  paper: 'A4',
};

export function demoStoredCases(): StoredCase[] {
  return DEMO.cases.map((c, i) => {
    const { $schema: _schema, ...inputs } = JSON.parse(readFileSync(path.join(DATA, 'examples', c.example), 'utf8')) as Record<string, unknown>;
    return { id: i + 1, name: c.name, inputs };
  });
}

export function demoParticulars(unitSystem: UnitSystem = 'SI'): ProjectParticulars {
  const p = DEMO.project;
  return {
    name: p['name']!,
    client: p['client']!,
    site: p['site']!,
    reference: p['reference']!,
    revision: 'B',
    revisionNote: 'Issued for comment',
    date: '2026-12-02',
    engineer: p['engineer']!,
    checker: 'A. Checker (invented)',
    unitSystem,
  };
}

export function demoCases(unitSystem: UnitSystem = 'SI'): ReportedCase[] {
  return reportCases(demoStoredCases(), { ...caseContext(null), unitSystem });
}

export function demoReport(options: { unitSystem?: UnitSystem; letterhead?: Partial<Letterhead>; cases?: ReportedCase[] } = {}): ProjectReport {
  const unitSystem = options.unitSystem ?? 'SI';
  return buildProjectReport(
    { ...DEMO_LETTERHEAD, ...options.letterhead },
    demoParticulars(unitSystem),
    options.cases ?? demoCases(unitSystem),
    'Lamina 0.1.0',
  );
}
