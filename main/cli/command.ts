/**
 * The shape every command-line subcommand has, so that the dispatcher (lamina.ts), the tests and
 * each command agree without sharing process globals.
 */
export interface CliIO {
  readonly stdout: (text: string) => void;
  readonly stderr: (text: string) => void;
  /** Environment variables (LAMINA_DB and friends). */
  readonly env: Readonly<Record<string, string | undefined>>;
  /** Working directory against which relative paths are resolved. */
  readonly cwd: string;
}

/** Exit codes: 0 success, 1 failure while working (I/O, solver), 2 invalid input or usage. */
export type CliCommand = (args: readonly string[], io: CliIO) => Promise<number>;
