import { judgeMediaType, normalizeDeclared, sniffMediaType } from './media-type';

// Signatures: PDF "%PDF-" (ISO 32000-1 §7.5.2), PNG 89 50 4E 47 0D 0A 1A 0A (PNG spec §5.2),
// JPEG SOI FF D8 FF (JFIF/Exif), ZIP local file header "PK\3\4" (APPNOTE.TXT §4.3.7).
const PDF = Buffer.from('%PDF-1.7\n1 0 obj\n<< /Type /Catalog >>\nendobj\n%%EOF\n', 'latin1');
const PNG = Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a, 0, 0, 0, 13, 0x49, 0x48, 0x44, 0x52]);
const JPEG = Buffer.from([0xff, 0xd8, 0xff, 0xe0, 0, 16, 0x4a, 0x46, 0x49, 0x46, 0]);
const ZIP = Buffer.from([0x50, 0x4b, 0x03, 0x04, 20, 0, 0, 0, 8, 0]);
const CSV = Buffer.from('T_K,Cp\n280,136.9\n290,140.6\n298.15,144.2\n# a comment line\n');
const JSON_TEXT = Buffer.from('{"runs": [1, 2, 3]}\n');
const TEXT = Buffer.from('Calibration note: sapphire disc, three runs.\nDrift 0.4 %.\n');
const BINARY = Buffer.from([0x00, 0x01, 0x02, 0xfe, 0xff, 0x10, 0x00]);
const EXE = Buffer.from([0x4d, 0x5a, 0x90, 0x00, 0x03, 0x00]);

describe('evidence media types, by content', () => {
  const sniffs: [string, Buffer, string | undefined][] = [
    ['PDF', PDF, 'application/pdf'],
    ['PNG', PNG, 'image/png'],
    ['JPEG', JPEG, 'image/jpeg'],
    ['ZIP', ZIP, 'application/zip'],
    ['CSV', CSV, 'text/csv'],
    ['JSON', JSON_TEXT, 'application/json'],
    ['text', TEXT, 'text/plain'],
    ['binary', BINARY, undefined],
    ['a Windows executable', EXE, undefined],
    ['nothing', Buffer.alloc(0), undefined],
    ['invalid UTF-8', Buffer.from([0x48, 0x69, 0xc3, 0x28]), undefined],
  ];
  for (const [what, bytes, expected] of sniffs) {
    it(`recognises ${what}`, () => expect(sniffMediaType(bytes) as string | undefined).toBe(expected));
  }

  const verdicts: [string, string, Buffer, string | false][] = [
    ['a PDF declared as PDF', 'application/pdf', PDF, 'application/pdf'],
    ['a PNG declared with parameters', 'image/png; charset=binary', PNG, 'image/png'],
    ['a JPEG declared as image/jpg', 'image/jpg', JPEG, 'image/jpeg'],
    ['any accepted content declared as octet-stream', 'application/octet-stream', ZIP, 'application/zip'],
    ['CSV declared as text/plain', 'text/plain', CSV, 'text/plain'],
    ['one-column text declared as CSV', 'text/csv', TEXT, 'text/csv'],
    ['text declared as PDF', 'application/pdf', TEXT, false],
    ['a PNG declared as JPEG', 'image/jpeg', PNG, false],
    ['a PDF declared as CSV', 'text/csv', PDF, false],
    ['plain text declared as JSON', 'application/json', TEXT, false],
    ['binary declared as text', 'text/plain', BINARY, false],
    ['an executable declared as octet-stream', 'application/octet-stream', EXE, false],
    ['a type we do not take', 'application/msword', TEXT, false],
  ];
  for (const [what, declared, bytes, expected] of verdicts) {
    it(`${expected ? 'accepts' : 'refuses'} ${what}`, () => {
      const verdict = judgeMediaType(declared, bytes);
      if (expected) expect(verdict).toEqual(jasmine.objectContaining({ ok: true, mediaType: expected }));
      else {
        expect(verdict.ok).toBeFalse();
        if (!verdict.ok) expect(verdict.reason.length).toBeGreaterThan(20);
      }
    });
  }

  it('names the mismatch', () => {
    const verdict = judgeMediaType('application/pdf', PNG);
    expect(verdict).toEqual({ ok: false, reason: 'The file was declared as application/pdf but its content is a PNG image' });
    expect(normalizeDeclared(' Text/CSV ; charset=utf-8')).toBe('text/csv');
  });
});
