/**
 * The letterhead of printed reports: its checks (texts, paper, logo type, size and content), its
 * storage in the settings table, and how it travels with a project file. Real SQLite files in
 * temporary folders; the PNG and JPEG logos are real files written by Chromium's encoders
 * (tests/storage/fixtures/logo-24x16.*).
 */
import fs from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { EMPTY_LETTERHEAD, type Letterhead } from '../../app/report/project-report.js';
import { openLamina } from '../../main/services/lamina-services.js';
import { MAX_LOGO_BYTES, svgRefusal, validateLetterhead } from '../../main/services/letterhead-validation.js';
import { PROJECT_FILE_VERSION, projectFileFromJson, projectFileToJson } from '../../main/services/project-file.js';
import { tempDatabasePath } from './temp-folder.js';

const fixture = (name: string) => fs.readFileSync(path.join(__dirname, 'fixtures', name)).toString('base64');
const PNG = fixture('logo-24x16.png');
const JPEG = fixture('logo-24x16.jpg');
const svg64 = (text: string) => Buffer.from(text, 'utf8').toString('base64');
/** A logo of the invented firm: two shapes, a gradient referred to by #fragment, a text. */
const GOOD_SVG = `<?xml version="1.0" encoding="UTF-8"?>
<!-- Fernhill Thermal Consultants mark -->
<svg xmlns="http://www.w3.org/2000/svg" xmlns:xlink="http://www.w3.org/1999/xlink" viewBox="0 0 120 40">
  <defs><linearGradient id="g"><stop offset="0" stop-color="#1d4e6b"/><stop offset="1" stop-color="#e0a030"/></linearGradient></defs>
  <rect width="40" height="40" fill="url(#g)"/>
  <use xlink:href="#g"/>
  <text x="48" y="26" font-family="sans-serif">Fernhill</text>
</svg>`;

const FIRM: Letterhead = {
  firmName: 'Fernhill Thermal Consultants',
  address: '4 Quarry Lane\nMillbrook MB3 9QT',
  telephone: '+44 1632 960 418',
  email: 'office@fernhill-thermal.example',
  logo: { mediaType: 'image/png', base64: PNG },
  paper: 'A4',
};

const refusalOf = (value: unknown): string => {
  try {
    validateLetterhead(value);
  } catch (error) {
    return (error as Error).message;
  }
  return 'accepted';
};
const withLogo = (mediaType: string, base64: string) => ({ ...FIRM, logo: { mediaType, base64 } });

describe('letterhead checks', () => {
  it('accepts the firm with a PNG, a JPEG or a clean SVG logo, and no logo at all', () => {
    expect(validateLetterhead(FIRM)).toEqual(FIRM);
    expect(validateLetterhead(withLogo('image/jpeg', JPEG)).logo?.mediaType).toBe('image/jpeg');
    expect(validateLetterhead(withLogo('image/svg+xml', svg64(GOOD_SVG))).logo?.mediaType).toBe('image/svg+xml');
    expect(validateLetterhead({})).toEqual(EMPTY_LETTERHEAD);
    // Windows line ends in the address become \n.
    expect(validateLetterhead({ ...FIRM, address: '4 Quarry Lane  \r\nMillbrook' }).address).toBe('4 Quarry Lane\nMillbrook');
  });

  it('refuses each bad field in one sentence naming it', () => {
    expect(refusalOf({ ...FIRM, firmName: 'x'.repeat(201) })).toBe('firmName must be at most 200 characters long.');
    expect(refusalOf({ ...FIRM, address: 'x'.repeat(501) })).toBe('address must be at most 500 characters long.');
    expect(refusalOf({ ...FIRM, telephone: 42 })).toBe('telephone must be text.');
    expect(refusalOf({ ...FIRM, email: 'office at fernhill' })).toBe('email must be an address like name@example.org, or empty.');
    expect(refusalOf({ ...FIRM, paper: 'A3' })).toBe('paper must be one of A4, Letter.');
    expect(refusalOf({ ...FIRM, colour: 'blue' })).toMatch(/^letterhead\.colour is not a known field here/);
  });

  it('refuses a logo of another type, bad base64, more than 1 MB, or bytes that do not match the declared type', () => {
    expect(refusalOf(withLogo('image/gif', PNG))).toBe('logo must be a PNG, JPEG or SVG image (mediaType one of image/png, image/jpeg, image/svg+xml).');
    expect(refusalOf(withLogo('image/png', 'not base64!'))).toMatch(/^logo must be the image file in base64/);
    expect(refusalOf(withLogo('image/png', PNG.slice(0, -1)))).toMatch(/^logo must be the image file in base64/);
    // A JPEG declared as PNG and the other way round: the magic bytes decide (PNG spec 5.2; JPEG SOI/EOI, ITU T.81 B.1).
    expect(refusalOf(withLogo('image/png', JPEG))).toBe('logo is declared image/png but the file is not a PNG image.');
    expect(refusalOf(withLogo('image/jpeg', PNG))).toBe('logo is declared image/jpeg but the file is not a JPEG image.');
    expect(refusalOf(withLogo('image/svg+xml', PNG))).toBe('logo is declared image/svg+xml but the file is not UTF-8 text.');
    // 1 MiB is the limit: a PNG padded to exactly the limit passes, one byte more is refused.
    const png = Buffer.from(PNG, 'base64');
    const atLimit = Buffer.concat([png, Buffer.alloc(MAX_LOGO_BYTES - png.length)]);
    expect(validateLetterhead(withLogo('image/png', atLimit.toString('base64'))).logo).not.toBeNull();
    const over = Buffer.concat([atLimit, Buffer.alloc(1)]).toString('base64');
    expect(refusalOf(withLogo('image/png', over))).toBe(`logo must be at most 1 MB (${MAX_LOGO_BYTES} bytes); this one is ${MAX_LOGO_BYTES + 1} bytes.`);
  });

  it('refuses an SVG with a script, an event attribute, embedded HTML, javascript: or an outside reference', () => {
    const svg = (inner: string, attributes = '') => `<svg xmlns="http://www.w3.org/2000/svg"${attributes} viewBox="0 0 10 10">${inner}</svg>`;
    const cases: [string, string, RegExp][] = [
      ['a script element', svg('<script>alert(1)</script>'), /<script> element/],
      ['a script element in capitals', svg('<SCRIPT>alert(1)</SCRIPT>'), /<script> element/],
      ['an onload attribute', svg('<rect/>', ' onload="alert(1)"'), /event attributes/],
      ['an onclick attribute on a shape', svg('<rect width="1" onclick=\'x()\'/>'), /event attributes/],
      ['a foreignObject', svg('<foreignObject><p>hi</p></foreignObject>'), /<foreignObject>/],
      ['a javascript: link', svg('<a href="javascript:alert(1)"><rect/></a>'), /javascript:/],
      ['an external image', svg('<image href="https://example.org/logo.png"/>'), /outside itself \(found "https:\/\/example.org/],
      ['an external xlink:href', svg('<use xlink:href="other.svg#mark"/>', ' xmlns:xlink="http://www.w3.org/1999/xlink"'), /outside itself \(found "other.svg#mark"/],
      ['an external url() fill', svg('<rect fill="url(https://example.org/p.svg#g)"/>'), /outside itself \(found url\(https/],
      ['an external url() in a style element', svg('<style>rect { fill: url(\'/etc/p.svg\') }</style><rect/>'), /outside itself/],
      ['an embedded SVG as data:', svg('<image href="data:image/svg+xml;base64,PHN2Zz4="/>'), /outside itself/],
      ['an @import', svg('<style>@import "x.css";</style>'), /@import/],
      ['a DOCTYPE with entities', `<!DOCTYPE svg [<!ENTITY x "y">]>${svg('<rect/>')}`, /DOCTYPE or ENTITY/],
      ['an HTML document', '<html><body><svg></svg></body></html>', /root element is <svg>/],
      ['plain text', 'Fernhill', /root element is <svg>/],
    ];
    for (const [what, text, reason] of cases) {
      const message = refusalOf(withLogo('image/svg+xml', svg64(text)));
      expect(message, what).toMatch(/^logo /);
      expect(message, what).toMatch(reason);
    }
    // Internal references and embedded raster images are fine.
    expect(svgRefusal(svg('<rect fill="url(#g)"/><image href="data:image/png;base64,AAAA"/>'))).toBeUndefined();
    expect(svgRefusal(GOOD_SVG)).toBeUndefined();
  });
});

describe('the letterhead in the library and in project files', () => {
  it('is empty in a new library, is stored in the settings and survives reopening', async () => {
    const file = tempDatabasePath();
    const lamina = await openLamina(file);
    expect(lamina.letterhead.get()).toEqual(EMPTY_LETTERHEAD);
    expect(() => lamina.letterhead.save({ ...FIRM, paper: 'B5' })).toThrow('paper must be one of A4, Letter.');
    expect(lamina.letterhead.get()).toEqual(EMPTY_LETTERHEAD);
    expect(lamina.letterhead.save({ ...FIRM, firmName: '  Fernhill Thermal Consultants ' })).toEqual(FIRM);
    lamina.close();
    const again = await openLamina(file);
    try {
      expect(again.letterhead.get()).toEqual(FIRM);
      expect(again.letterhead.save({ ...FIRM, logo: null, paper: 'Letter' })).toEqual({ ...FIRM, logo: null, paper: 'Letter' });
      expect(again.letterhead.get().paper).toBe('Letter');
    } finally {
      again.close();
    }
  });

  it('travels with an exported project, with its checker and revision note; an older file without it still imports', async () => {
    const office = await openLamina(tempDatabasePath());
    const colleague = await openLamina(tempDatabasePath());
    try {
      office.letterhead.save(FIRM);
      const project = office.projects.create({
        name: 'Millbrook creamery steam mains', client: 'Millbrook Dairy Co-operative', reference: 'FTC-2291',
        engineer: 'R. Okafor', checker: 'J. Lindqvist', revision: 'B', revisionNote: 'Issued for comment',
      });
      expect(project.checker).toBe('J. Lindqvist');
      expect(project.revisionNote).toBe('Issued for comment');
      const file = office.projects.exportProject(project.id);
      expect(file.formatVersion).toBe(PROJECT_FILE_VERSION);
      expect(file.letterhead).toEqual(FIRM);

      // The colleague's own letterhead stays theirs; the imported project prints with the file's.
      colleague.letterhead.save({ ...EMPTY_LETTERHEAD, firmName: 'Another office' });
      const imported = colleague.projects.importProject(projectFileFromJson(projectFileToJson(file))).project;
      expect(imported.checker).toBe('J. Lindqvist');
      expect(imported.revisionNote).toBe('Issued for comment');
      expect(colleague.projects.letterheadOf(imported.id)).toEqual(FIRM);
      expect(colleague.letterhead.get().firmName).toBe('Another office');
      // Exported again, it carries the letterhead it prints with; a duplicate prints the same too.
      expect(colleague.projects.exportProject(imported.id).letterhead).toEqual(FIRM);
      const copy = colleague.projects.duplicate(imported.id);
      expect(colleague.projects.letterheadOf(copy.id)).toEqual(FIRM);
      expect(copy.checker).toBe('J. Lindqvist');

      // A version 1 file (before letterheads): no letterhead, no checker; it prints with the library's.
      const { letterhead: _l, ...v2 } = file;
      const { checker: _c, revisionNote: _r, ...oldFields } = file.project;
      const v1 = { ...v2, formatVersion: 1, project: { ...oldFields, name: 'Older export' } };
      const old = colleague.projects.importProject(v1).project;
      expect(old.checker).toBe('');
      expect(colleague.projects.letterheadOf(old.id).firmName).toBe('Another office');
      // A version 1 file cannot carry a letterhead; a bad letterhead in a version 2 file is named.
      expect(() => colleague.projects.importProject({ ...v1, letterhead: FIRM })).toThrow(/^file\.letterhead is not a known field here/);
      expect(() => colleague.projects.importProject({ ...file, project: { ...file.project, name: 'Bad logo' }, letterhead: withLogo('image/png', JPEG) }))
        .toThrow("The file's letterhead cannot be used: logo is declared image/png but the file is not a PNG image.");
      expect(() => colleague.projects.importProject({ ...file, formatVersion: PROJECT_FILE_VERSION + 1 })).toThrow('formatVersion must be 1, 2 or 3 (the file was written by a Lamina this version cannot read).');
    } finally {
      office.close();
      colleague.close();
    }
  });
});
