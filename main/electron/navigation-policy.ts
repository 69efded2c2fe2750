/**
 * Where the desktop window may go, as pure functions of URLs so that the rules are unit-tested on
 * machines where Electron cannot run (main.ts only wires them to Electron's events).
 *
 * The window shows exactly one document: the built renderer's index.html, loaded from disk. Its
 * own fragment may change (that is not a navigation); any other address, another file beside it,
 * a query string, a web page, and any frame inside the page are refused. Lamina's page has no
 * frames, so a frame navigating anywhere is something other than Lamina.
 */

/** True when `url` is the app's page itself, whatever its fragment. A malformed URL is not. */
export function isAppPage(url: string, appPageUrl: string): boolean {
  let parsed: URL;
  try {
    parsed = new URL(url);
  } catch {
    return false;
  }
  parsed.hash = '';
  return parsed.href === appPageUrl;
}

/** What Electron tells us about a navigation it is about to start. */
export interface NavigationAttempt {
  url: string;
  isMainFrame: boolean;
}

/** The main frame may (re)load the app's page; nothing else may load anywhere. */
export function mayNavigate(attempt: NavigationAttempt, appPageUrl: string): boolean {
  return attempt.isMainFrame && isAppPage(attempt.url, appPageUrl);
}
