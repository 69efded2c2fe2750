/**
 * findJsonSyntaxError (app/base/json-syntax-error.ts) against JSON.parse, the reference reader of
 * RFC 8259 in the runtime: a text is well formed for one exactly when it is for the other, on
 * hand-picked mistakes and on random texts from fast-check; the reported place is checked by hand
 * for the mistakes a user makes in a case file.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { findJsonSyntaxError } from '../../app/base/json-syntax-error.js';

const parses = (text: string) => {
  try {
    JSON.parse(text);
    return true;
  } catch {
    return false;
  }
};

describe('findJsonSyntaxError', () => {
  it('places the mistakes a user makes by line and column', () => {
    const place = (text: string) => {
      const e = findJsonSyntaxError(text);
      return e && [e.line, e.column, e.atEnd];
    };
    expect(place('{ "kind": ')).toEqual([1, 11, true]);
    expect(place('{"value": NaN}')).toEqual([1, 11, false]);
    expect(place('{\n  "a": 1,\n  "b": Infinity\n}')).toEqual([3, 8, false]);
    expect(place('{"a": 1,}')).toEqual([1, 9, false]);
    expect(place("{'a': 1}")).toEqual([1, 2, false]);
    expect(place('{"a": 1} x')).toEqual([1, 10, false]);
    expect(place('{"a": "tab\tin a string"}')).toEqual([1, 11, false]);
    expect(place('{"a": "\\x"}')).toEqual([1, 9, false]);
    expect(place('[1, 2')).toEqual([1, 6, true]);
    expect(place('{"a": 01}')).toEqual([1, 8, false]);
    expect(place('')).toEqual([1, 1, true]);
  });

  it('finds nothing wrong in well-formed JSON, however deep', () => {
    expect(findJsonSyntaxError('{"a": [1, -2.5e3, true, false, null, "\\u00e9\\n", {"b": {}}], "c": []}')).toBeNull();
    expect(findJsonSyntaxError(`${'['.repeat(100_000)}${']'.repeat(100_000)}`)).toBeNull();
  });

  it('agrees with JSON.parse on random JSON and on random damage to it', () => {
    fc.assert(
      fc.property(fc.json(), fc.nat(), fc.string({ maxLength: 3 }), fc.nat({ max: 3 }), (json, at, inserted, removed) => {
        expect(findJsonSyntaxError(json)).toBeNull();
        const k = at % (json.length + 1);
        const damaged = json.slice(0, k) + inserted + json.slice(k + removed);
        expect(findJsonSyntaxError(damaged) === null).toBe(parses(damaged));
      }),
      { numRuns: 2000 },
    );
  });

  it('agrees with JSON.parse on short random texts of JSON characters', () => {
    const piece = fc.constantFrom('{', '}', '[', ']', ',', ':', '"', '\\', 'u', '0', '1', '-', '.', 'e', '+', ' ', '\n', 'true', 'null', 'x');
    fc.assert(
      fc.property(fc.array(piece, { maxLength: 12 }), (pieces) => {
        const text = pieces.join('');
        expect(findJsonSyntaxError(text) === null).toBe(parses(text));
      }),
      { numRuns: 5000 },
    );
  });
});
