/**
 * Which stored sizings still count: those of runs whose case has not changed since. Its own
 * module, free of the engine, so the page can use it without loading the solver.
 */

/** The stored sizings that still belong to their runs' current cases (not in `stale`), by reference. */
export function upToDateSizing<S>(sizing: Readonly<Record<string, S>>, stale: readonly string[]): Map<string, S> {
  const changed = new Set(stale);
  return new Map(Object.entries(sizing).filter(([reference]) => !changed.has(reference)));
}
