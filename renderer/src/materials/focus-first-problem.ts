/**
 * After a refused save: the first error message in the form (in reading order) is brought into
 * view and the focus goes to the field it describes (the control whose aria-describedby names it),
 * or to the message itself when it belongs to no single field. With no message in the form the
 * refusal is in `notice`, which is focused instead. The fit panel's own messages are left out:
 * they answer the Fit button, not the save.
 */
export function focusFirstProblem(form: HTMLElement, notice: HTMLElement | null): void {
  const message = Array.from(form.querySelectorAll<HTMLElement>('.field-error')).find((element) => !element.closest('#fit-panel'));
  const control = message?.id ? form.querySelector<HTMLElement>(`[aria-describedby~="${CSS.escape(message.id)}"]`) : null;
  const target = control ?? message ?? notice;
  if (!target) return;
  if (target !== control) target.tabIndex = -1;
  // Centred, so the field and its message just below it are both in view.
  target.scrollIntoView({ block: 'center' });
  target.focus({ preventScroll: true });
}
