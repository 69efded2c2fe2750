/**
 * Paths and foreign text repeated in storage messages are shortened so that a message stays one
 * readable line under 400 characters, whatever the user or SQLite handed us.
 */
export const SHOWN_PATH_MAX = 60;
const ELLIPSIS = '…';

/** A path cut to at most 60 characters; the end is kept because it names the file. */
export function shownPath(filePath: string): string {
  if (filePath.length <= SHOWN_PATH_MAX) return filePath;
  return ELLIPSIS + filePath.slice(filePath.length - (SHOWN_PATH_MAX - ELLIPSIS.length));
}

/** Text from elsewhere (an SQLite report) cut to `max` characters, on one line. */
export function clippedText(text: string, max = 100): string {
  const line = text.replace(/\s+/g, ' ').trim();
  return line.length <= max ? line : line.slice(0, max - ELLIPSIS.length) + ELLIPSIS;
}
