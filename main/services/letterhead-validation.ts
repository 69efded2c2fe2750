/**
 * Checks a letterhead before it is stored (from the settings screen or from an imported project
 * file): the firm's texts by length, the paper size, and the logo by type, size and content. A
 * logo is printed into every report, so an SVG may hold drawing only: no script, no event
 * handler, no embedded HTML, no reference to anything outside itself (the report is offline and
 * must look the same on a colleague's machine).
 */
import { LETTERHEAD_LIMITS, MAX_LOGO_BYTES } from '../../app/api/letterhead-limits.js';
import { InputError } from '../../app/index.js';
import { LOGO_MEDIA_TYPES, PAPER_SIZES, type Letterhead, type LetterheadLogo } from '../../app/report/project-report.js';
import { optionalText, rejectUnknownKeys, requireObject, requireOneOf } from './validate.js';

export { LETTERHEAD_LIMITS, MAX_LOGO_BYTES };

const LETTERHEAD_KEYS = ['firmName', 'address', 'telephone', 'email', 'logo', 'paper'] as const;

export function validateLetterhead(value: unknown, field = 'letterhead'): Letterhead {
  const raw = requireObject(value, field);
  rejectUnknownKeys(raw, LETTERHEAD_KEYS, field);
  return {
    firmName: optionalText(raw['firmName'], 'firmName', LETTERHEAD_LIMITS.firmName),
    address: normaliseLines(optionalText(raw['address'], 'address', LETTERHEAD_LIMITS.address)),
    telephone: optionalText(raw['telephone'], 'telephone', LETTERHEAD_LIMITS.telephone),
    email: validateEmail(optionalText(raw['email'], 'email', LETTERHEAD_LIMITS.email)),
    logo: raw['logo'] === undefined || raw['logo'] === null ? null : validateLogo(raw['logo']),
    paper: raw['paper'] === undefined ? 'A4' : requireOneOf(raw['paper'], 'paper', PAPER_SIZES),
  };
}

/** Windows line ends become \n, and each line loses trailing spaces, so the printed address lines up. */
function normaliseLines(text: string): string {
  return text.replace(/\r\n?/g, '\n').split('\n').map((line) => line.trimEnd()).join('\n');
}

function validateEmail(text: string): string {
  if (text !== '' && !/^[^\s@]+@[^\s@]+$/.test(text)) {
    throw new InputError('email', 'email must be an address like name@example.org, or empty.');
  }
  return text;
}

const logoRefusal = (reason: string) => new InputError('logo', `logo ${reason}`);

export function validateLogo(value: unknown): LetterheadLogo {
  const raw = requireObject(value, 'logo');
  rejectUnknownKeys(raw, ['mediaType', 'base64'], 'logo');
  const mediaType = raw['mediaType'];
  if (typeof mediaType !== 'string' || !(LOGO_MEDIA_TYPES as readonly string[]).includes(mediaType)) {
    throw logoRefusal(`must be a PNG, JPEG or SVG image (mediaType one of ${LOGO_MEDIA_TYPES.join(', ')}).`);
  }
  const base64 = raw['base64'];
  // Checked as text before decoding: Buffer.from(…, 'base64') skips characters it does not know.
  if (typeof base64 !== 'string' || base64.length === 0 || base64.length % 4 !== 0 || !/^[A-Za-z0-9+/]*={0,2}$/.test(base64)) {
    throw logoRefusal('must be the image file in base64 (letters, digits, + and /, padded with = to a multiple of 4 characters).');
  }
  if ((base64.length / 4) * 3 > MAX_LOGO_BYTES + 2) throw logoRefusal(`must be at most 1 MB (${MAX_LOGO_BYTES} bytes).`);
  const bytes = Buffer.from(base64, 'base64');
  if (bytes.length > MAX_LOGO_BYTES) throw logoRefusal(`must be at most 1 MB (${MAX_LOGO_BYTES} bytes); this one is ${bytes.length} bytes.`);
  const type = mediaType as LetterheadLogo['mediaType'];
  if (type === 'image/png') checkPng(bytes);
  else if (type === 'image/jpeg') checkJpeg(bytes);
  else checkSvg(bytes);
  return { mediaType: type, base64 };
}

const PNG_SIGNATURE = [0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a];

function checkPng(bytes: Buffer): void {
  // The signature, then the IHDR chunk first (PNG specification, section 5.2 and 11.2.2).
  const signed = PNG_SIGNATURE.every((b, i) => bytes[i] === b);
  if (!signed || bytes.length < 33 || bytes.toString('latin1', 12, 16) !== 'IHDR') {
    throw logoRefusal('is declared image/png but the file is not a PNG image.');
  }
}

function checkJpeg(bytes: Buffer): void {
  // Start-of-image marker FF D8 followed by another marker (FF xx), and end-of-image FF D9 (ITU T.81, annex B).
  const starts = bytes.length >= 4 && bytes[0] === 0xff && bytes[1] === 0xd8 && bytes[2] === 0xff;
  const ends = bytes.length >= 4 && bytes[bytes.length - 2] === 0xff && bytes[bytes.length - 1] === 0xd9;
  if (!starts || !ends) throw logoRefusal('is declared image/jpeg but the file is not a JPEG image.');
}

function checkSvg(bytes: Buffer): void {
  let text: string;
  try {
    text = new TextDecoder('utf-8', { fatal: true }).decode(bytes);
  } catch {
    throw logoRefusal('is declared image/svg+xml but the file is not UTF-8 text.');
  }
  const refusal = svgRefusal(text);
  if (refusal) throw logoRefusal(refusal);
}

/**
 * Why an SVG text may not be printed, or undefined when it may. A textual check, on purpose
 * strict: a logo that trips it can be saved again without the feature (or as a PNG).
 */
export function svgRefusal(text: string): string | undefined {
  const body = text.replace(/^\uFEFF/, '');
  if (/<!DOCTYPE|<!ENTITY/i.test(body)) return 'SVG must not contain a DOCTYPE or ENTITY declaration.';
  // Comments, the XML declaration and processing instructions may precede the root element.
  const rest = body.replace(/<!--[\s\S]*?-->/g, '').replace(/<\?[\s\S]*?\?>/g, '').trim();
  if (!/^<svg[\s>/]/.test(rest) || !/<\/svg\s*>$|\/>$/.test(rest)) return 'must be an SVG document whose root element is <svg>.';
  if (/<\s*script\b/i.test(rest)) return 'SVG must not contain a <script> element.';
  if (/<\s*foreignObject\b/i.test(rest)) return 'SVG must not contain a <foreignObject> element.';
  if (/[\s"'/]on[a-z]+\s*=/i.test(rest)) return 'SVG must not contain event attributes (onload=, onclick=, …).';
  if (/javascript\s*:/i.test(rest)) return 'SVG must not contain javascript: addresses.';
  for (const m of rest.matchAll(/(?:\b(?:xlink:)?href|\bsrc)\s*=\s*("([^"]*)"|'([^']*)')/gi)) {
    const target = (m[2] ?? m[3] ?? '').trim();
    if (!isInternalReference(target)) return `SVG must not refer to anything outside itself (found "${target.slice(0, 40)}"; only #fragments and data:image addresses are allowed).`;
  }
  for (const m of rest.matchAll(/url\(\s*(?:"([^"]*)"|'([^']*)'|([^)]*))\s*\)/gi)) {
    const target = (m[1] ?? m[2] ?? m[3] ?? '').trim();
    if (!isInternalReference(target)) return `SVG must not refer to anything outside itself (found url(${target.slice(0, 40)}); only #fragments and data:image addresses are allowed).`;
  }
  if (/@import/i.test(rest)) return 'SVG must not import style sheets (@import).';
  return undefined;
}

function isInternalReference(target: string): boolean {
  return target.startsWith('#') || /^data:image\/(png|jpeg|gif|webp);/i.test(target);
}
