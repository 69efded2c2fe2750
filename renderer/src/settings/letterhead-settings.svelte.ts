/**
 * The Settings screen's letterhead: the firm's details and logo as typed, saved together with one
 * press of Save. The Node side checks everything (lengths, the logo's type and size, no script or
 * outside reference in an SVG); a refusal is one sentence shown beside the field it names. A logo
 * file is read in the page (FileReader) and sent as base64, so no file path crosses the API.
 */
import type { Letterhead, LetterheadLogo, PaperSize } from '../../../app/api/contract.js';
import { LOGO_MEDIA_TYPES, PAPER_SIZES } from '../../../app/report/project-report.js';
import { MAX_LOGO_BYTES } from '../../../app/api/letterhead-limits.js';
import { fieldOf, laminaApi, messageOf } from '../bridge/lamina-api.js';
import { openedWithName } from '../shared/named-refusal.js';

export const LETTERHEAD_FIELDS = ['firmName', 'address', 'telephone', 'email', 'paper', 'logo'] as const;
export type LetterheadField = (typeof LETTERHEAD_FIELDS)[number];

export const LETTERHEAD_LABELS: Readonly<Record<LetterheadField, string>> = {
  firmName: 'Firm name',
  address: 'Address',
  telephone: 'Telephone',
  email: 'E-mail',
  paper: 'Paper size',
  logo: 'Logo',
};

export interface LetterheadDraft {
  firmName: string;
  address: string;
  telephone: string;
  email: string;
  paper: PaperSize;
  logo: LetterheadLogo | null;
  /** The file chosen since the last save, for the line beside the preview (not stored). */
  logoFileName: string;
}

export type SettingsNotice = { readonly kind: 'done' | 'refused'; readonly text: string };

/** Which field a refusal names ("letterhead.logo", "logo.base64", "firmName" → its box), if any. */
export function letterheadFieldOf(serverField: string | undefined): LetterheadField | undefined {
  const parts = serverField?.split('.') ?? [];
  return parts.find((part): part is LetterheadField => (LETTERHEAD_FIELDS as readonly string[]).includes(part));
}

/**
 * A refusal in the words of the form: the Node side names the field by its request key
 * ("firmName must be at most 200 characters long."), the screen by its label ("Firm name must …").
 */
export function inFormWords(field: LetterheadField, message: string): string {
  return openedWithName(message, field, LETTERHEAD_LABELS[field]);
}

/** The media type of a chosen file: its own type, else its extension (some systems give SVG no type). */
export function logoMediaTypeOf(file: { readonly name: string; readonly type: string }): LetterheadLogo['mediaType'] | undefined {
  if ((LOGO_MEDIA_TYPES as readonly string[]).includes(file.type)) return file.type as LetterheadLogo['mediaType'];
  const extension = file.name.toLowerCase().split('.').pop();
  if (extension === 'png') return 'image/png';
  if (extension === 'jpg' || extension === 'jpeg') return 'image/jpeg';
  if (extension === 'svg') return 'image/svg+xml';
  return undefined;
}

function draftOf(letterhead: Letterhead): LetterheadDraft {
  const { firmName, address, telephone, email, paper, logo } = letterhead;
  return { firmName, address, telephone, email, paper, logo, logoFileName: '' };
}

function letterheadOf(draft: LetterheadDraft): Letterhead {
  const { firmName, address, telephone, email, paper, logo } = draft;
  return { firmName: firmName.trim(), address: address.trim(), telephone: telephone.trim(), email: email.trim(), paper, logo };
}

export class LetterheadSettings {
  draft = $state<LetterheadDraft | undefined>(undefined);
  notice = $state<SettingsNotice | undefined>(undefined);
  busy = $state(false);
  /** A refusal (from the Node side, or the page's own file check) and the field it belongs to. */
  private refusal = $state<{ field: LetterheadField; message: string } | undefined>(undefined);

  readonly paperSizes = PAPER_SIZES;

  async load(): Promise<void> {
    try {
      this.draft = draftOf(await laminaApi().settings.letterhead());
    } catch (error) {
      this.notice = { kind: 'refused', text: `The letterhead could not be read: ${messageOf(error)}` };
    }
  }

  errorFor(field: LetterheadField): string | undefined {
    return this.refusal?.field === field ? this.refusal.message : undefined;
  }

  /** Any edit takes back the sentence it answers (it may no longer hold) and the last "saved". */
  changed(field: LetterheadField): void {
    if (this.refusal?.field === field) this.refusal = undefined;
    if (this.notice?.kind === 'done') this.notice = undefined;
  }

  async chooseLogo(file: File): Promise<void> {
    if (!this.draft) return;
    this.changed('logo');
    const mediaType = logoMediaTypeOf(file);
    if (!mediaType) {
      this.refusal = { field: 'logo', message: `Logo must be a PNG, JPEG or SVG image; ${file.name} is none of these.` };
      return;
    }
    if (file.size > MAX_LOGO_BYTES) {
      this.refusal = { field: 'logo', message: `Logo must be at most 1 MB (${MAX_LOGO_BYTES} bytes); ${file.name} is ${file.size} bytes.` };
      return;
    }
    try {
      this.draft.logo = { mediaType, base64: await base64Of(file) };
      this.draft.logoFileName = file.name;
    } catch (error) {
      this.refusal = { field: 'logo', message: `Logo: ${file.name} could not be read (${messageOf(error)}).` };
    }
  }

  removeLogo(): void {
    if (!this.draft) return;
    this.changed('logo');
    this.draft.logo = null;
    this.draft.logoFileName = '';
  }

  /** Saves the whole letterhead; true when stored. */
  async save(): Promise<boolean> {
    if (!this.draft || this.busy) return false;
    this.busy = true;
    this.refusal = undefined;
    this.notice = undefined;
    try {
      this.draft = draftOf(await laminaApi().settings.saveLetterhead({ letterhead: letterheadOf(this.draft) }));
      this.notice = { kind: 'done', text: 'Letterhead saved. Reports printed from now on carry it.' };
      return true;
    } catch (error) {
      const field = letterheadFieldOf(fieldOf(error));
      if (field) this.refusal = { field, message: inFormWords(field, messageOf(error)) };
      else this.notice = { kind: 'refused', text: messageOf(error) };
      return false;
    } finally {
      this.busy = false;
    }
  }
}

/** The file's bytes as base64 (FileReader's data: URL without its "data:<type>;base64," head). */
function base64Of(file: Blob): Promise<string> {
  return new Promise((resolve, reject) => {
    const reader = new FileReader();
    reader.onload = () => {
      const url = String(reader.result);
      resolve(url.slice(url.indexOf(',') + 1));
    };
    reader.onerror = () => reject(reader.error ?? new Error('the file could not be read'));
    reader.readAsDataURL(file);
  });
}
