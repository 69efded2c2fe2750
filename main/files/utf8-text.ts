/**
 * Bytes from a file as text, refusing anything that is not UTF-8: a lone 0xFF or a file saved as
 * UTF-16 would otherwise turn into U+FFFD replacement characters inside a title or a material
 * name, silently. A UTF-8 byte-order mark at the start is accepted and dropped (spreadsheet
 * programs write one). The refusal names the byte offset, so the user can find the spot.
 */
export class NotUtf8Error extends Error {
  override readonly name = 'NotUtf8Error';
  constructor(readonly offset: number) {
    super(`is not UTF-8 text: the byte at offset ${offset} cannot start or continue a character (save the file as UTF-8)`);
  }
}

const strict = new TextDecoder('utf-8', { fatal: true, ignoreBOM: false });

/** The text of `bytes`; throws NotUtf8Error with the offset of the first byte that is not UTF-8. */
export function decodeUtf8(bytes: Uint8Array): string {
  try {
    return strict.decode(bytes);
  } catch {
    throw new NotUtf8Error(firstInvalidUtf8Offset(bytes));
  }
}

/** Offset of the first byte that breaks UTF-8 (RFC 3629: no overlongs, no surrogates, ≤ U+10FFFF). */
export function firstInvalidUtf8Offset(bytes: Uint8Array): number {
  let i = 0;
  while (i < bytes.length) {
    const b = bytes[i]!;
    let length: number;
    let low = 0x80;
    let high = 0xbf;
    if (b < 0x80) length = 1;
    else if (b >= 0xc2 && b <= 0xdf) length = 2;
    else if (b >= 0xe0 && b <= 0xef) {
      length = 3;
      if (b === 0xe0) low = 0xa0;
      if (b === 0xed) high = 0x9f;
    } else if (b >= 0xf0 && b <= 0xf4) {
      length = 4;
      if (b === 0xf0) low = 0x90;
      if (b === 0xf4) high = 0x8f;
    } else return i;
    for (let k = 1; k < length; k++) {
      const c = bytes[i + k];
      const [min, max] = k === 1 ? [low, high] : [0x80, 0xbf];
      if (c === undefined || c < min || c > max) return i + k < bytes.length ? i + k : i;
    }
    i += length;
  }
  return bytes.length;
}
