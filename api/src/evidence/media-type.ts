/**
 * What an uploaded evidence file is, judged by its bytes, not by its name or the type the browser
 * declared: magic numbers for PDF, PNG, JPEG and ZIP (incl. office documents, which are ZIP
 * containers); for text, valid UTF-8 without NUL bytes, then JSON if it parses, CSV if most lines
 * split into the same number of fields.
 */
export const ACCEPTED_MEDIA_TYPES = ['application/pdf', 'image/png', 'image/jpeg', 'application/zip', 'text/plain', 'text/csv', 'application/json'] as const;
export type AcceptedMediaType = (typeof ACCEPTED_MEDIA_TYPES)[number];

const ALIASES: Readonly<Record<string, AcceptedMediaType>> = {
  'application/x-pdf': 'application/pdf',
  'image/jpg': 'image/jpeg',
  'image/pjpeg': 'image/jpeg',
  'application/x-zip-compressed': 'application/zip',
  'application/x-zip': 'application/zip',
  'application/csv': 'text/csv',
  'text/comma-separated-values': 'text/csv',
  'text/x-csv': 'text/csv',
  'text/json': 'application/json',
};

/** Declared types that say nothing about the content: the sniffed type is used. */
const UNSPECIFIC = new Set(['', 'application/octet-stream', 'binary/octet-stream', 'application/unknown']);

const startsWith = (bytes: Buffer, signature: number[], offset = 0) => signature.every((b, i) => bytes[offset + i] === b);

/** The type the content shows, or undefined for anything not accepted (binary of another kind, invalid UTF-8…). */
export function sniffMediaType(bytes: Buffer): AcceptedMediaType | undefined {
  if (bytes.length === 0) return undefined;
  // PDF: "%PDF-" within the first 1024 bytes (ISO 32000-1, 7.5.2 allows leading bytes in practice).
  if (bytes.subarray(0, 1024).indexOf('%PDF-') !== -1) return 'application/pdf';
  if (startsWith(bytes, [0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a])) return 'image/png';
  if (startsWith(bytes, [0xff, 0xd8, 0xff])) return 'image/jpeg';
  if (startsWith(bytes, [0x50, 0x4b]) && ((bytes[2] === 0x03 && bytes[3] === 0x04) || (bytes[2] === 0x05 && bytes[3] === 0x06) || (bytes[2] === 0x07 && bytes[3] === 0x08))) {
    return 'application/zip';
  }
  const text = decodeText(bytes);
  if (text === undefined) return undefined;
  const trimmed = text.trim();
  if ((trimmed.startsWith('{') || trimmed.startsWith('[')) && parsesAsJson(trimmed)) return 'application/json';
  if (looksLikeCsv(text)) return 'text/csv';
  return 'text/plain';
}

/** UTF-8 text (BOM allowed) without NUL bytes and with almost no control characters; else undefined. */
function decodeText(bytes: Buffer): string | undefined {
  if (bytes.includes(0)) return undefined;
  let text: string;
  try {
    text = new TextDecoder('utf-8', { fatal: true, ignoreBOM: false }).decode(bytes);
  } catch {
    return undefined;
  }
  // eslint-disable-next-line no-control-regex
  const controls = text.match(/[\u0001-\u0008\u000b\u000e-\u001f\u007f]/g)?.length ?? 0;
  return controls > Math.max(2, text.length / 1000) ? undefined : text;
}

function parsesAsJson(text: string): boolean {
  try {
    JSON.parse(text);
    return true;
  } catch {
    return false;
  }
}

/**
 * At least two data lines, and at least 80 % of the first 50 non-blank lines split into the same
 * number (≥ 2) of fields on one of `,` `;` or tab (quotes respected).
 */
function looksLikeCsv(text: string): boolean {
  const lines = text.split(/\r?\n/).filter((l) => l.trim().length > 0).slice(0, 50);
  if (lines.length < 2) return false;
  return [',', ';', '\t'].some((delimiter) => {
    const counts = lines.map((l) => fieldCount(l, delimiter));
    const first = counts[0];
    if (first < 2) return false;
    return counts.filter((c) => c === first).length >= 0.8 * counts.length;
  });
}

function fieldCount(line: string, delimiter: string): number {
  let fields = 1;
  let quoted = false;
  for (const ch of line) {
    if (ch === '"') quoted = !quoted;
    else if (ch === delimiter && !quoted) fields++;
  }
  return fields;
}

/** The declared type without parameters, lower case, with common aliases folded. */
export function normalizeDeclared(declared: string | undefined): string {
  const bare = (declared ?? '').split(';')[0].trim().toLowerCase();
  return ALIASES[bare] ?? bare;
}

export type MediaVerdict =
  | { ok: true; mediaType: AcceptedMediaType; sniffed: AcceptedMediaType }
  | { ok: false; reason: string };

const TEXT_FAMILY: readonly AcceptedMediaType[] = ['text/plain', 'text/csv', 'application/json'];

/**
 * Whether content and declared type agree. Plain text accepts any text (CSV and JSON are text);
 * CSV accepts text (a one-column CSV has no delimiter); JSON must parse; the binary formats must
 * carry their signature. An unspecific declaration takes the sniffed type.
 */
export function judgeMediaType(declared: string | undefined, bytes: Buffer): MediaVerdict {
  const claimed = normalizeDeclared(declared);
  const sniffed = sniffMediaType(bytes);
  if (!sniffed) {
    return { ok: false, reason: `The content is not one of the accepted kinds (PDF, PNG, JPEG, ZIP, plain text, CSV, JSON)${claimed && !UNSPECIFIC.has(claimed) ? `, although it was declared as ${claimed}` : ''}` };
  }
  if (UNSPECIFIC.has(claimed)) return { ok: true, mediaType: sniffed, sniffed };
  if (!(ACCEPTED_MEDIA_TYPES as readonly string[]).includes(claimed)) {
    return { ok: false, reason: `Files of type ${claimed} are not accepted; send PDF, PNG, JPEG, ZIP, plain text, CSV or JSON` };
  }
  const type = claimed as AcceptedMediaType;
  const agrees =
    type === sniffed ||
    (type === 'text/plain' && TEXT_FAMILY.includes(sniffed)) ||
    (type === 'text/csv' && (sniffed === 'text/plain' || sniffed === 'text/csv'));
  if (!agrees) return { ok: false, reason: `The file was declared as ${type} but its content is ${describe(sniffed)}` };
  return { ok: true, mediaType: type, sniffed };
}

function describe(type: AcceptedMediaType): string {
  switch (type) {
    case 'application/pdf': return 'a PDF document';
    case 'image/png': return 'a PNG image';
    case 'image/jpeg': return 'a JPEG image';
    case 'application/zip': return 'a ZIP archive';
    case 'application/json': return 'JSON';
    case 'text/csv': return 'CSV text';
    case 'text/plain': return 'plain text';
  }
}
