/**
 * The per-launch key of browser mode. Loopback is shared by every process and every user of the
 * machine, so listening on 127.0.0.1 alone would let any of them call the API; a random key made
 * at start, shown only in the address Lamina prints, tells the person who started it from the rest.
 *
 * The browser trades the key once for a cookie (see browser-server.ts); other clients send it in
 * the LAUNCH_KEY_HEADER header. The key lives only in memory, so an address from an earlier
 * launch no longer opens anything.
 */
import { createHash, randomBytes, timingSafeEqual } from 'node:crypto';

/** 256 random bits: far beyond guessing, even at the rate a local process can send requests. */
const KEY_BYTES = 32;

/** The query parameter of the printed address: http://127.0.0.1:PORT/?k=<key>. */
export const LAUNCH_KEY_PARAMETER = 'k';

/** The request header that carries the key for clients that are not a browser (lower case, as Node reports headers). */
export const LAUNCH_KEY_HEADER = 'x-lamina-key';

export class LaunchKey {
  /** The key as it appears in the address: base64url, 43 characters. */
  readonly value = randomBytes(KEY_BYTES).toString('base64url');
  private readonly digest = sha256(this.value);

  /**
   * Whether a presented key is this one, in time that does not depend on where the two differ.
   * Both sides are hashed first, so timingSafeEqual always compares equal-length buffers and a
   * wrong length reveals nothing either.
   */
  matches(candidate: string | undefined): boolean {
    if (candidate === undefined) return false;
    return timingSafeEqual(sha256(candidate), this.digest);
  }
}

function sha256(text: string): Buffer {
  return createHash('sha256').update(text, 'utf8').digest();
}

/**
 * The cookie's name carries the port: browsers share cookies between all ports of one host, so two
 * Lamina servers on 127.0.0.1 would otherwise overwrite each other's key.
 */
export function launchCookieName(port: number): string {
  return `lamina-key-${port}`;
}

/**
 * The Set-Cookie value that stores the key: for this origin's whole path, never readable by the
 * page's scripts, never sent with a request another site starts, and gone when the browser closes.
 */
export function launchCookie(port: number, key: LaunchKey): string {
  return `${launchCookieName(port)}=${key.value}; Path=/; HttpOnly; SameSite=Strict`;
}

/** Every value the Cookie header gives for one name (a browser may send the same name twice). */
export function cookieValues(header: string | undefined, name: string): string[] {
  if (!header) return [];
  const values: string[] = [];
  for (const pair of header.split(';')) {
    const separator = pair.indexOf('=');
    if (separator < 0) continue;
    if (pair.slice(0, separator).trim() === name) values.push(pair.slice(separator + 1).trim());
  }
  return values;
}
