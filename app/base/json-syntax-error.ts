/**
 * Where a text stops being JSON (RFC 8259), found in one pass without recursion, so that a refusal
 * can point at the spot by line and column. JSON.parse names no position for most mistakes and
 * repeats the text around them instead, which can be anything the user typed (a bare NaN, a
 * megabyte of one line); a line and a column are short and let the user find it in an editor.
 */
export interface JsonSyntaxError {
  /** Offset in UTF-16 code units of the first character that cannot be there, or the text's length. */
  readonly offset: number;
  /** 1-based line and column of that character. */
  readonly line: number;
  readonly column: number;
  /** True when the text ends before the JSON is complete. */
  readonly atEnd: boolean;
}

type Expecting = 'value' | 'value-or-close' | 'key' | 'key-or-close' | 'colon' | 'comma-or-close' | 'end';

const NUMBER = /-?(?:0|[1-9]\d*)(?:\.\d+)?(?:[eE][+-]?\d+)?/y;
const LITERALS = ['true', 'false', 'null'];
const ESCAPES = '"\\/bfnrt';
const HEX = /^[0-9a-fA-F]{4}$/;

/** The first syntax error in `text`, or null when it is one well-formed JSON value. */
export function findJsonSyntaxError(text: string): JsonSyntaxError | null {
  const open: string[] = [];
  let expecting: Expecting = 'value';
  let i = 0;
  const after = (): Expecting => (open.length === 0 ? 'end' : 'comma-or-close');
  for (;;) {
    while (i < text.length && ' \t\n\r'.includes(text[i]!)) i++;
    if (i >= text.length) return expecting === 'end' ? null : at(text, text.length, true);
    const c = text[i]!;
    switch (expecting) {
      case 'value':
      case 'value-or-close': {
        if (expecting === 'value-or-close' && c === ']') {
          open.pop();
          i++;
        } else if (c === '{' || c === '[') {
          open.push(c);
          i++;
          expecting = c === '{' ? 'key-or-close' : 'value-or-close';
          continue;
        } else if (c === '"') {
          const end = stringEnd(text, i);
          if (end < 0) return at(text, -end - 1, -end - 1 >= text.length);
          i = end;
        } else {
          NUMBER.lastIndex = i;
          const literal = LITERALS.find((word) => text.startsWith(word, i));
          if (literal) i += literal.length;
          else if (NUMBER.test(text)) i = NUMBER.lastIndex;
          else return at(text, i, false);
        }
        expecting = after();
        break;
      }
      case 'key':
      case 'key-or-close': {
        if (expecting === 'key-or-close' && c === '}') {
          open.pop();
          i++;
          expecting = after();
          break;
        }
        if (c !== '"') return at(text, i, false);
        const end = stringEnd(text, i);
        if (end < 0) return at(text, -end - 1, -end - 1 >= text.length);
        i = end;
        expecting = 'colon';
        break;
      }
      case 'colon':
        if (c !== ':') return at(text, i, false);
        i++;
        expecting = 'value';
        break;
      case 'comma-or-close': {
        const top = open[open.length - 1];
        if (c === ',') {
          i++;
          expecting = top === '{' ? 'key' : 'value';
        } else if (c === (top === '{' ? '}' : ']')) {
          open.pop();
          i++;
          expecting = after();
        } else return at(text, i, false);
        break;
      }
      case 'end':
        return at(text, i, false);
    }
  }
}

/** The offset just past the string starting at `start`, or −(offset of the bad character) − 1. */
function stringEnd(text: string, start: number): number {
  let k = start + 1;
  while (k < text.length) {
    const code = text.charCodeAt(k);
    if (code === 0x22) return k + 1;
    if (code < 0x20) return -k - 1;
    if (code === 0x5c) {
      const escape = text[k + 1];
      if (escape === undefined) return -(k + 1) - 1;
      if (escape === 'u') {
        if (!HEX.test(text.slice(k + 2, k + 6))) return -(k + 1) - 1;
        k += 6;
      } else if (ESCAPES.includes(escape)) k += 2;
      else return -(k + 1) - 1;
    } else k++;
  }
  return -text.length - 1;
}

function at(text: string, offset: number, atEnd: boolean): JsonSyntaxError {
  let line = 1;
  let lineStart = 0;
  for (let k = text.indexOf('\n'); k !== -1 && k < offset; k = text.indexOf('\n', k + 1)) {
    line++;
    lineStart = k + 1;
  }
  return { offset, line, column: offset - lineStart + 1, atEnd };
}
