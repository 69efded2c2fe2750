import { homedir } from 'node:os';
import path from 'node:path';

/**
 * Where the database lives when nobody says otherwise.
 *
 * Electron passes its own userData folder; the command line and the browser-mode server use
 * `--db PATH`, then the LAMINA_DB environment variable, then these per-system defaults:
 *   Linux    $XDG_DATA_HOME/lamina/lamina.sqlite (default ~/.local/share/lamina/lamina.sqlite)
 *   Windows  %APPDATA%\Lamina\lamina.sqlite
 *   macOS    ~/Library/Application Support/Lamina/lamina.sqlite
 */
export const DATABASE_FILE_NAME = 'lamina.sqlite';

export interface PathContext {
  readonly platform: NodeJS.Platform;
  readonly env: Readonly<Record<string, string | undefined>>;
  readonly home: string;
}

export function defaultDatabasePath(context: PathContext = { platform: process.platform, env: process.env, home: homedir() }): string {
  const { platform, env, home } = context;
  if (platform === 'win32') {
    const appData = env['APPDATA'] || path.win32.join(home, 'AppData', 'Roaming');
    return path.win32.join(appData, 'Lamina', DATABASE_FILE_NAME);
  }
  if (platform === 'darwin') return path.posix.join(home, 'Library', 'Application Support', 'Lamina', DATABASE_FILE_NAME);
  const dataHome = env['XDG_DATA_HOME'] || path.posix.join(home, '.local', 'share');
  return path.posix.join(dataHome, 'lamina', DATABASE_FILE_NAME);
}

/** The database path for a command: an explicit option wins, then LAMINA_DB, then the default. */
export function resolveDatabasePath(option: string | undefined, env: Readonly<Record<string, string | undefined>>, cwd: string): string {
  return resolveDatabaseLocation(option, env, cwd).path;
}

/**
 * The same, saying whether the user named the path: Lamina creates its own default folder on
 * first use, but a folder the user typed must exist, so a typing mistake is reported, not made.
 */
export function resolveDatabaseLocation(option: string | undefined, env: Readonly<Record<string, string | undefined>>, cwd: string): { path: string; chosenByUser: boolean } {
  const chosen = option || env['LAMINA_DB'];
  if (chosen) return { path: path.resolve(cwd, chosen), chosenByUser: true };
  return { path: defaultDatabasePath({ platform: process.platform, env, home: env['HOME'] || homedir() }), chosenByUser: false };
}
