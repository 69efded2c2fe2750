/**
 * The report's escape (app/report/html/escape-html): markup characters escaped everywhere, and a
 * superscript run the report's font lacks (Source Sans 3's shipped subsets have ¹ ² ³ of Latin-1,
 * not ⁰ ⁴–⁹ ⁻: @fontsource/source-sans-3 unicode.json) raised with ordinary digits and U+2212.
 */
import { describe, expect, it } from 'vitest';
import { escapeAttribute, escapeHtml, escapeSvgText } from '../../../app/report/html/escape-html.js';

describe('escapeHtml', () => {
  it('escapes the five markup characters', () => {
    expect(escapeHtml(`<a href="x">'&'</a>`)).toBe('&lt;a href=&quot;x&quot;&gt;&#39;&amp;&#39;&lt;/a&gt;');
  });

  it('raises "10⁻¹⁴" and "10⁵" as <sup> with ordinary digits and the minus sign', () => {
    expect(escapeHtml('9.4 × 10⁻¹⁴')).toBe('9.4 × 10<sup>\u221214</sup>');
    expect(escapeHtml('Re = 5·10⁵, up to 10⁸')).toBe('Re = 5·10<sup>5</sup>, up to 10<sup>8</sup>');
  });

  it('keeps m², m³ and 10³ as they are: the font has those glyphs', () => {
    expect(escapeHtml('kg/m³ and W/(m²·K), 10³')).toBe('kg/m³ and W/(m²·K), 10³');
  });
});

describe('escapeSvgText and escapeAttribute', () => {
  it('raises a run in an SVG text as a <tspan>, and leaves an attribute value unchanged but escaped', () => {
    expect(escapeSvgText('10⁻⁶ <')).toBe('10<tspan class="sup" baseline-shift="super" font-size="70%">\u22126</tspan> &lt;');
    expect(escapeAttribute('10⁻⁶ "x"')).toBe('10⁻⁶ &quot;x&quot;');
  });
});
