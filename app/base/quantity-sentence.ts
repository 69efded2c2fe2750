/**
 * A sentence with figures in it, kept as parts until it is read: plain text, and figures tagged
 * with their SI value and quantity kind. A refusal of bad input (InputError) and a warning of the
 * surface physics are built this way, where the value is known but the project's units are not;
 * the edge that knows them (solveCase, a case report) writes the sentence with the one QuantityText
 * of its unit system. Values stay SI.
 *
 * Each figure carries the text the SI sentence has always had for it (`si`), so an SI sentence
 * reads exactly as before, digit for digit; in another system the figure is converted and written
 * by QuantityText: a computed value at its kind's precision (`figure`), a value the user typed or a
 * documented bound in its shortest form (`entered`), a range of bounds, or just the unit.
 */
import type { NumberRange } from './number-range.js';
import type { QuantityName } from './quantities.js';
import { SI_TEXT, type QuantityText } from './quantity-text.js';

/** A computed figure ("41.3 °C"): in other systems at its kind's precision, with its unit unless `bare`. */
export interface ComputedFigurePart {
  readonly kind: 'figure';
  readonly value: number;
  readonly quantity: QuantityName;
  readonly si: string;
  readonly bare?: boolean;
}

/** A value the user gave or a documented bound ("2 m"): in other systems in its shortest form, with its unit unless `bare`. */
export interface EnteredFigurePart {
  readonly kind: 'entered';
  readonly value: number;
  readonly quantity: QuantityName;
  readonly si: string;
  readonly bare?: boolean;
}

/** An allowed range ("at least 0.001 and at most 2 m"), worded as app/base/number-range words it. */
export interface RangePart {
  readonly kind: 'range';
  readonly range: NumberRange;
  readonly quantity: QuantityName;
  readonly si: string;
}

/** The unit of a kind alone ("in °C" of "must be a finite number in °C"). */
export interface UnitPart {
  readonly kind: 'unit';
  readonly quantity: QuantityName;
  readonly si: string;
}

export type SentencePart = string | ComputedFigurePart | EnteredFigurePart | RangePart | UnitPart;
export type QuantitySentence = readonly SentencePart[];
/** A sentence with no figure to convert is plain text. */
export type Sentence = string | QuantitySentence;

/** Builders, so a sentence reads as a template at its call site. */
export const figurePart = (value: number, quantity: QuantityName, si: string, bare = false): ComputedFigurePart => ({ kind: 'figure', value, quantity, si, ...(bare ? { bare } : {}) });
export const enteredPart = (value: number, quantity: QuantityName, si: string, bare = false): EnteredFigurePart => ({ kind: 'entered', value, quantity, si, ...(bare ? { bare } : {}) });
export const rangePart = (range: NumberRange, quantity: QuantityName, si: string): RangePart => ({ kind: 'range', range, quantity, si });
export const unitPart = (quantity: QuantityName, si: string): UnitPart => ({ kind: 'unit', quantity, si });

/** "at least 0.0000393701 and at most 78.7402 in": the range of number-range's describeRange, converted. */
function rangeText(range: NumberRange, quantity: QuantityName, text: QuantityText): string {
  const low = `${range.minExclusive ? 'more than' : 'at least'} ${text.enteredNumber(range.min, quantity)}`;
  const high = `${range.maxExclusive ? 'less than' : 'at most'} ${text.enteredNumber(range.max, quantity)}`;
  const unit = text.unit(quantity);
  return `${low} and ${high}${unit ? ` ${unit}` : ''}`;
}

/** A part's text; `keepSi` gives a figure the SI sentence's own text (the command line's metres, fractions). */
function partText(part: SentencePart, text: QuantityText, keepSi: boolean): string {
  if (typeof part === 'string') return part;
  if (keepSi) return part.si;
  switch (part.kind) {
    case 'figure':
      return part.bare ? text.number(part.value, part.quantity) : text.figure(part.value, part.quantity);
    case 'entered':
      return part.bare ? text.enteredNumber(part.value, part.quantity) : text.entered(part.value, part.quantity);
    case 'range':
      return rangeText(part.range, part.quantity, text);
    case 'unit':
      return text.unit(part.quantity);
  }
}

/** The sentence in the units of `text` (SI unless told). */
export function writeSentence(sentence: Sentence, text: QuantityText = SI_TEXT): string {
  return typeof sentence === 'string' ? sentence : sentence.map((part) => partText(part, text, text.system === 'SI')).join('');
}

/**
 * The sentence as a form shows it beside its boxes: every figure in the units the boxes show,
 * the display units of `text`'s system, in SI too ("at most 2000 mm" beside a millimetre box,
 * where the command line's SI sentence says "2 m"; a humidity in %, not as a fraction).
 */
export function writeShownSentence(sentence: Sentence, text: QuantityText): string {
  return typeof sentence === 'string' ? sentence : sentence.map((part) => partText(part, text, false)).join('');
}

/** Sentences without repeats, compared as their SI text (two correlations may flag the same air properties). */
export function distinctSentences(sentences: readonly Sentence[]): Sentence[] {
  const seen = new Set<string>();
  return sentences.filter((s) => {
    const key = writeSentence(s);
    if (seen.has(key)) return false;
    seen.add(key);
    return true;
  });
}
