/**
 * What the browser tests read from, and do to, an open case editor: the key figures on screen, the
 * engine's figures for the stored case, the time from a keystroke in a box to the new figures, the solve time the editor shows, and whether
 * each drop-down's chosen label fits its box. Shared by the case-editor and demo-case tests.
 */
import type { Browser, Page } from 'playwright-core';
import { expect } from 'vitest';
import { solveCase, type CaseReport } from '../../app/index.js';
import { formatQuantity } from '../../app/report/format-quantity.js';
import type { UnitSystem } from '../../app/base/unit-systems.js';
import { caseContext } from '../../main/cases/case-context.js';
import type { LaminaServices } from '../../main/services/lamina-services.js';

/** The key figures on screen, label -> shown value. */
export async function shownFigures(page: Page): Promise<Record<string, string>> {
  return page.locator('.case-editor .key-figures .figure').evaluateAll((rows) =>
    Object.fromEntries(rows.map((r) => [r.querySelector('dt')!.textContent!.trim(), r.querySelector('.value')!.textContent!.trim()])),
  );
}

/** The engine's figures for the case as stored, written as the screen writes them. */
export function engineFigures(services: LaminaServices, caseId: number, system: UnitSystem): { figures: Record<string, string>; report: CaseReport } {
  const stored = services.projects.getCase(caseId);
  // Solved in the project's units, as the page solves it: the labels read in them ("per foot").
  const report = solveCase(stored.inputs, { ...caseContext(services.materials), unitSystem: system }).report;
  return { report, figures: Object.fromEntries(report.keyFigures.map((f) => [f.label, formatQuantity(f.value, f.quantity, system)])) };
}

/**
 * Types `text` into the box `selector` inside the page (one input event, as a keystroke gives) and
 * waits for the key figures to change: ms from the keystroke to the new figures. Refuses (the test
 * fails) when the figures have not changed within `timeoutMs`, so every measured edit moved them.
 * Each keystroke starts on a settled page, as a person's next keystroke does (typing leaves 100 ms
 * or more between keys): the sections of the previous edit (tables, drawing, charts), drawn after
 * its figures have been painted (CaseReportView's `detailsAfterPaint`, then ReportChart a frame
 * later), are drawn before the clock starts.
 */
export function keystrokeToFigures(page: Page, selector: string, text: string, timeoutMs = 5000): Promise<number> {
  return page.evaluate(
    async ([sel, value, timeout]) => {
      await new Promise<void>((settled) => requestAnimationFrame(() => requestAnimationFrame(() => requestAnimationFrame(() => setTimeout(settled)))));
      return new Promise<number>((resolve, reject) => {
        const box = document.querySelector<HTMLInputElement>(sel as string)!;
        const figures = document.querySelector('.case-editor .key-figures')!;
        const before = figures.textContent;
        const started = performance.now();
        const observer = new MutationObserver(() => {
          if (figures.textContent !== before) {
            observer.disconnect();
            clearTimeout(timer);
            resolve(performance.now() - started);
          }
        });
        const timer = setTimeout(() => {
          observer.disconnect();
          reject(new Error(`The key figures did not change within ${timeout} ms of typing "${value}" into ${sel}.`));
        }, timeout as number);
        observer.observe(figures, { subtree: true, characterData: true, childList: true });
        box.value = value as string;
        box.dispatchEvent(new Event('input', { bubbles: true }));
      });
    },
    [selector, text, timeoutMs] as const,
  );
}

/** The words of the report's sections and lists on screen (tables, drawings' keys, charts' tables), which follow the figures a frame later. */
export async function shownDetails(page: Page): Promise<string> {
  return page.locator('.case-editor .case-report').evaluate((report) =>
    Array.from(report.querySelectorAll('[data-section], [data-list]'), (part) => part.textContent ?? '').join('\n'),
  );
}

/**
 * The times the editor shows after a solve ("Solved in 1.4 ms (3 ms to the screen)"), in ms: the
 * solve in the worker, and from sending the case to its answer reaching the page; null while none is shown.
 */
export async function shownSolveTimes(page: Page): Promise<{ solveMs: number; roundTripMs: number | null } | null> {
  const text = (await page.textContent('[data-testid="solve-time"]')) ?? '';
  const match = /Solved in ([\d.]+) ms(?: \(([\d.]+) ms to the screen\))?/.exec(text);
  return match ? { solveMs: Number(match[1]), roundTripMs: match[2] === undefined ? null : Number(match[2]) } : null;
}

export function median(values: readonly number[]): number {
  const sorted = [...values].sort((a, b) => a - b);
  const middle = Math.floor(sorted.length / 2);
  return sorted.length % 2 === 1 ? sorted[middle]! : (sorted[middle - 1]! + sorted[middle]!) / 2;
}

export interface ClippedChoice {
  readonly id: string;
  /** The chosen label, or the longest other choice, that would be cut off. */
  readonly label: string;
  /** Width that label needs in this select (the browser's own layout of a box holding only it), px. */
  readonly needs: number;
  readonly has: number;
}

/**
 * The drop-downs under `root` with a label cut off: the chosen one, and (with `everyChoice`) any
 * other choice once chosen. For each visible select and each label, a hidden copy holding only that
 * option is laid out at its natural width with the same styles (the browser adds the arrow and
 * padding itself); the label fits when that width is no more than the real box's plus `slackPx`.
 */
export function clippedChoices(page: Page, root: string, { everyChoice = true, slackPx = 2 } = {}): Promise<ClippedChoice[]> {
  return page.evaluate(
    ([rootSelector, every, slack]) => {
      const clipped: { id: string; label: string; needs: number; has: number }[] = [];
      for (const select of Array.from(document.querySelectorAll<HTMLSelectElement>(`${rootSelector as string} select`))) {
        if (select.offsetParent === null) continue;
        const has = select.getBoundingClientRect().width;
        const labels = every ? Array.from(select.options).map((o: HTMLOptionElement) => o.textContent ?? '') : [select.selectedOptions[0]?.textContent ?? ''];
        let worst: { label: string; needs: number } | undefined;
        for (const label of labels) {
          const probe = select.cloneNode(false) as HTMLSelectElement;
          probe.removeAttribute('id');
          probe.append(new Option(label));
          Object.assign(probe.style, { position: 'absolute', visibility: 'hidden', width: 'auto', minWidth: '0', maxWidth: 'none', left: '0', top: '0' });
          select.parentElement!.append(probe);
          const needs = probe.getBoundingClientRect().width;
          probe.remove();
          if (needs > has + (slack as number) && (!worst || needs > worst.needs)) worst = { label, needs };
        }
        if (worst) clipped.push({ id: select.id, label: worst.label, needs: Math.round(worst.needs), has: Math.round(has) });
      }
      return clipped;
    },
    [root, everyChoice, slackPx] as const,
  );
}

/** Whether the page scrolls sideways: its content wider than the window. */
export function scrollsSideways(page: Page): Promise<boolean> {
  return page.evaluate(() => document.documentElement.scrollWidth > window.innerWidth);
}

/**
 * A new page on the projects list, with the project opened and its case in the editor (its key
 * figures shown); `problems` collects the page's console errors and uncaught exceptions.
 */
export async function openCaseEditor(browser: Browser, url: string, projectName: string, caseId: number, viewport = { width: 1366, height: 800 }): Promise<{ page: Page; problems: string[] }> {
  const problems: string[] = [];
  const page = await browser.newPage({ viewport });
  page.on('console', (m) => { if (m.type() === 'error') problems.push(m.text()); });
  page.on('pageerror', (e) => problems.push(e.message));
  await page.goto(url);
  await page.locator('[data-testid="project-row"]').getByRole('button', { name: projectName, exact: true }).click();
  await page.click(`#case-open-${caseId}`);
  await page.locator('.case-editor .key-figures').waitFor().catch(async (error: unknown) => {
    throw new Error(`The case did not show its figures: ${(await page.textContent('.case-editor'))?.slice(0, 300)}`, { cause: error });
  });
  return { page, problems };
}

/** Waits until the editor says the case is stored. */
export const caseSaved = (page: Page) => expect.poll(async () => (await page.locator('[data-testid="case-save-status"]').textContent())?.trim(), { timeout: 10_000 }).toBe('Saved');
