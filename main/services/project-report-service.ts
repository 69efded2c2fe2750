/**
 * The printed report of a stored project (app/report/project-report.ts): every case recomputed
 * from its inputs in the project's units, the project's particulars and the letterhead it prints
 * with (its own from an imported file, else the library's). The app's preview, Electron's
 * printToPDF and `lamina projects report` all start here, so they print the same thing.
 */
import { reportCases } from '../../app/cases/report-cases.js';
import { buildProjectReport, type ProjectReport } from '../../app/report/project-report.js';
import { caseContext } from '../cases/case-context.js';
import type { MaterialsService } from './materials-service.js';
import type { ProjectsService } from './projects-service.js';
import type { SchedulesService } from './schedules-service.js';
import { SCHEDULE_CAUTION, scheduleReportSections } from '../../app/schedules/schedule-report.js';
import { upToDateSizing } from '../../app/schedules/up-to-date-sizing.js';

export function projectReport(
  services: { readonly projects: ProjectsService; readonly materials: MaterialsService; readonly schedules?: SchedulesService },
  id: number,
  producedBy: string,
): ProjectReport {
  const project = services.projects.open(id);
  const letterhead = services.projects.letterheadOf(project.id);
  const { name, client, site, reference, revision, revisionNote, date, engineer, checker, unitSystem } = project;
  const cases = reportCases(project.cases, { ...caseContext(services.materials), unitSystem });
  return buildProjectReport(letterhead, { name, client, site, reference, revision, revisionNote, date, engineer, checker, unitSystem }, cases, producedBy, scheduleOf(services.schedules, project.id));
}

/** The schedule's sections with the sizing as stored (runs changed since their sizing print as not sized yet). */
function scheduleOf(schedules: SchedulesService | undefined, projectId: number) {
  const schedule = schedules?.get(projectId);
  if (!schedules || !schedule || schedule.runs.length === 0) return undefined;
  return { sections: scheduleReportSections(schedule.runs, upToDateSizing(schedule.sizing, schedule.stale), schedules.billOf(schedule)), caution: SCHEDULE_CAUTION };
}
