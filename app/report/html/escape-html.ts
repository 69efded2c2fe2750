/**
 * The one escape of the HTML rendering: every text of the report model (a firm's name, a case's
 * name, a material's name from a colleague's project file) goes through here before it enters the
 * markup, in element content and in quoted attribute values alike, so no text can become markup.
 */
const ENTITIES: Readonly<Record<string, string>> = { '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' };

export function escapeHtml(text: string): string {
  return text.replace(/[&<>"']/g, (c) => ENTITIES[c]!);
}
