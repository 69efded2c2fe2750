/**
 * The one escape of the HTML rendering: every text of the report model (a firm's name, a case's
 * name, a material's name from a colleague's project file) goes through here before it enters the
 * markup, so no text can become markup. Element content goes through escapeHtml (HTML) or
 * escapeSvgText (an SVG <text>); quoted attribute values and the <title> through escapeAttribute.
 *
 * The report's font (Source Sans 3, its latin, latin-ext and greek subsets) has the Latin-1
 * superscripts ¹ ² ³ but not ⁰ ⁴–⁹ ⁺ ⁻, which Chromium would otherwise take from a system font.
 * So a run of superscript characters holding any outside Latin-1 ("10⁻¹⁴", "10⁵") is written
 * raised, with ordinary digits and the minus sign U+2212, which the font has; "m²" and "m³" keep
 * their own glyphs.
 */
const ENTITIES: Readonly<Record<string, string>> = { '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' };

const SUPERSCRIPTS: Readonly<Record<string, string>> = {
  '⁰': '0', '¹': '1', '²': '2', '³': '3', '⁴': '4', '⁵': '5', '⁶': '6', '⁷': '7', '⁸': '8', '⁹': '9',
  '⁺': '+', '⁻': '\u2212', '⁼': '=', '⁽': '(', '⁾': ')', 'ⁿ': 'n', 'ⁱ': 'i',
};
const SUPERSCRIPT_RUN = /[⁰¹²³⁴-⁹⁺-⁾ⁿⁱ]+/g;

/** Text for a quoted attribute value or the <title>: escaped, nothing else changed. */
export function escapeAttribute(text: string): string {
  return text.replace(/[&<>"']/g, (c) => ENTITIES[c]!);
}

/** Text for HTML element content: escaped, a superscript run the font lacks as <sup>. */
export function escapeHtml(text: string): string {
  return raised(escapeAttribute(text), (digits) => `<sup>${digits}</sup>`);
}

/** Text for the content of an SVG <text> or <tspan>: escaped, a superscript run the font lacks as a raised <tspan>. */
export function escapeSvgText(text: string): string {
  return raised(escapeAttribute(text), (digits) => `<tspan class="sup" baseline-shift="super" font-size="70%">${digits}</tspan>`);
}

/** The ordinary characters of a superscript run: "⁻¹⁴" → "−14". */
export function unraised(run: string): string {
  return [...run].map((c) => SUPERSCRIPTS[c] ?? c).join('');
}

function raised(escaped: string, write: (digits: string) => string): string {
  return escaped.replace(SUPERSCRIPT_RUN, (run) => ([...run].some((c) => c.codePointAt(0)! > 0xff) ? write(unraised(run)) : run));
}
