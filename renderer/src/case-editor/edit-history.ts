/**
 * Undo and redo over snapshots of the case. Each edit pushes the case as it was before; typing in
 * one field within a short pause is one step (the caller passes the same `group` for it), so undo
 * takes back a typed number, not a keystroke. Snapshots are immutable values (case-paths makes a
 * new object per edit), so keeping them is cheap and safe.
 */
export class EditHistory<T> {
  private past: { snapshot: T; group: string | null }[] = [];
  private future: T[] = [];

  constructor(private readonly limit = 200) {}

  get canUndo(): boolean {
    return this.past.length > 0;
  }

  get canRedo(): boolean {
    return this.future.length > 0;
  }

  /**
   * Records that `before` is about to be replaced. An edit in the same group as the last one
   * (the same field, typed without a pause) joins that step instead of making a new one.
   */
  record(before: T, group: string | null = null): void {
    this.future = [];
    const last = this.past[this.past.length - 1];
    if (group !== null && last?.group === group) return;
    this.past.push({ snapshot: before, group });
    if (this.past.length > this.limit) this.past.shift();
  }

  /** Ends the current group, so the next edit is a step of its own. */
  seal(): void {
    const last = this.past[this.past.length - 1];
    if (last) last.group = null;
  }

  /** The snapshot to go back to from `current`, or undefined when there is none. */
  undo(current: T): T | undefined {
    const step = this.past.pop();
    if (!step) return undefined;
    this.future.push(current);
    return step.snapshot;
  }

  redo(current: T): T | undefined {
    const next = this.future.pop();
    if (next === undefined) return undefined;
    this.past.push({ snapshot: current, group: null });
    return next;
  }
}
