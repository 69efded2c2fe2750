/**
 * The printed report of a whole project, as plain data: the firm's letterhead, the project's
 * particulars, a summary line per case and each case's own report model. The HTML rendering
 * (app/report/html) and every way of printing it (the app's preview, Electron's printToPDF, the
 * command line) start from this one model, so the paper says what the screens say.
 *
 * Values stay SI inside the case reports; `unitSystem` says in which units the paper is written.
 */
import type { UnitSystem } from '../base/unit-systems.js';
import { GENERAL_CAUTION } from './general-caution.js';
import type { CaseReport, ReportFigure, ReportSection, ReportVerdict } from './report-model.js';

export const PAPER_SIZES = ['A4', 'Letter'] as const;
export type PaperSize = (typeof PAPER_SIZES)[number];

export const LOGO_MEDIA_TYPES = ['image/png', 'image/jpeg', 'image/svg+xml'] as const;
export type LogoMediaType = (typeof LOGO_MEDIA_TYPES)[number];

/** A logo image, already checked by the service that stored it (type, size, no script in an SVG). */
export interface LetterheadLogo {
  readonly mediaType: LogoMediaType;
  /** The image file, base64. */
  readonly base64: string;
}

/** The firm that issues the report. Every text may be empty; an empty letterhead prints none. */
export interface Letterhead {
  readonly firmName: string;
  /** Postal address, one line per line. */
  readonly address: string;
  readonly telephone: string;
  readonly email: string;
  readonly logo: LetterheadLogo | null;
  readonly paper: PaperSize;
}

export const EMPTY_LETTERHEAD: Letterhead = { firmName: '', address: '', telephone: '', email: '', logo: null, paper: 'A4' };

/** What the cover and every footer say about the project. */
export interface ProjectParticulars {
  readonly name: string;
  readonly client: string;
  readonly site: string;
  readonly reference: string;
  readonly revision: string;
  /** What the revision changed or why it is issued ("Issued for comment"). */
  readonly revisionNote: string;
  /** YYYY-MM-DD or empty. */
  readonly date: string;
  readonly engineer: string;
  readonly checker: string;
  readonly unitSystem: UnitSystem;
}

/** A case as the report shows it: its report, or the sentence that says why it could not be calculated. */
export type ReportedCase =
  | { readonly id: number; readonly name: string; readonly kind: string; readonly report: CaseReport }
  | { readonly id: number; readonly name: string; readonly kind: string; readonly error: string };

/** One line of the summary table. */
export interface SummaryLine {
  readonly caseId: number;
  readonly kind: string;
  readonly title: string;
  /** The build-up and size in one line (the case report's subject). */
  readonly subject: string;
  /** The figure a reader looks at first, or null for a case that could not be calculated. */
  readonly keyFigure: ReportFigure | null;
  readonly verdicts: readonly Pick<ReportVerdict, 'check' | 'title' | 'verdict'>[];
  /** Set for a case that could not be calculated. */
  readonly error?: string;
}

export interface ProjectReport {
  readonly letterhead: Letterhead;
  readonly project: ProjectParticulars;
  readonly summary: readonly SummaryLine[];
  readonly cases: readonly ReportedCase[];
  /** Every distinct caution of every case, and the general one, each once. */
  readonly cautions: readonly string[];
  /** The footer line on every page: "REF-001 revision B". */
  readonly footer: string;
  /** What made the report ("Lamina 0.1.0"), printed small on the cover. */
  readonly producedBy: string;
  /** The project's schedule of pipe runs and its bill of quantities, after the cases (absent without a schedule). */
  readonly schedule?: readonly ReportSection[];
}

export function buildProjectReport(
  letterhead: Letterhead,
  project: ProjectParticulars,
  cases: readonly ReportedCase[],
  producedBy: string,
  schedule?: { readonly sections: readonly ReportSection[]; readonly caution: string },
): ProjectReport {
  const summary = cases.map((c): SummaryLine =>
    'report' in c
      ? {
          caseId: c.id,
          kind: c.kind,
          title: c.name,
          subject: c.report.subject,
          keyFigure: c.report.keyFigures[0] ?? null,
          verdicts: c.report.verdicts.map(({ check, title, verdict }) => ({ check, title, verdict })),
        }
      : { caseId: c.id, kind: c.kind, title: c.name, subject: '', keyFigure: null, verdicts: [], error: c.error },
  );
  const cautions = [...new Set([...cases.flatMap((c) => ('report' in c ? c.report.cautions : [])), ...(schedule ? [schedule.caution] : []), GENERAL_CAUTION])];
  return { letterhead, project, summary, cases, cautions, footer: footerLine(project), producedBy, ...(schedule ? { schedule: schedule.sections } : {}) };
}

/** "REF-001 revision B", or whichever of the two is given, or the project's name. */
export function footerLine(project: Pick<ProjectParticulars, 'name' | 'reference' | 'revision'>): string {
  const revision = project.revision.trim() ? `revision ${project.revision.trim()}` : '';
  const parts = [project.reference.trim(), revision].filter(Boolean);
  return parts.length > 0 ? parts.join(' ') : project.name.trim();
}
