import { isUtf8 } from 'node:buffer';
import { XMLParser, XMLValidator } from 'fast-xml-parser';

/**
 * Reading a bulk-import file (CSV or XML, layouts in FORMAT.md) into rows of text fields, each
 * with the line it starts on. Only the form is checked here; what the fields mean is checked by
 * import-rows.ts.
 */

/** The columns (CSV) or child elements (XML) of a value row. */
export const IMPORT_COLUMNS = [
  'formula', 'name', 'phase', 'polymorph', 'quantity', 'transition', 'value', 'unit', 'uncertainty', 'uncertaintyKind', 'coverageFactor',
  'temperature', 'pressure', 'method', 'methodDetail', 'sourceKey', 'doi', 'sourceLocator', 'notes',
] as const;
export type ImportColumn = (typeof IMPORT_COLUMNS)[number];

export const REQUIRED_COLUMNS: readonly ImportColumn[] = ['formula', 'phase', 'quantity', 'value', 'unit', 'pressure', 'method'];

export interface ImportRow {
  /** 1-based line of the file where the row starts */
  line: number;
  fields: Partial<Record<ImportColumn, string>>;
}

export interface ImportProblem {
  line: number;
  field?: string;
  message: string;
}

export interface ParsedFile {
  rows: ImportRow[];
  problems: ImportProblem[];
  /** data records in the file, including those too malformed to become rows */
  records: number;
}

const byLowerName = new Map<string, ImportColumn>(IMPORT_COLUMNS.map((c) => [c.toLowerCase(), c]));
/** Spellings of column names people use, folded to ours. */
const COLUMN_ALIASES: Readonly<Record<string, ImportColumn>> = {
  'source': 'sourceKey', 'source_key': 'sourceKey', 'sourcekey': 'sourceKey', 'uncertainty_kind': 'uncertaintyKind', 'coverage_factor': 'coverageFactor',
  'k': 'coverageFactor', 'method_detail': 'methodDetail', 'temperature_k': 'temperature', 'pressure_pa': 'pressure', 'source_locator': 'sourceLocator',
  'transitionkind': 'transition', 'transition_kind': 'transition',
};

function columnFor(header: string): ImportColumn | undefined {
  const key = header.trim().toLowerCase();
  return byLowerName.get(key) ?? COLUMN_ALIASES[key];
}

/** A decoded file's text: UTF-8 only (a BOM is dropped); anything else is a problem at line 1. */
export function decodeUtf8(bytes: Buffer): { text: string } | { problem: ImportProblem } {
  if (!isUtf8(bytes)) return { problem: { line: 1, message: 'the file is not UTF-8 text' } };
  if (bytes.includes(0)) return { problem: { line: 1, message: 'the file holds NUL bytes: it is not a text file' } };
  return { text: bytes.toString('utf8') };
}

/**
 * CSV after RFC 4180: comma-separated (a header line names the columns, in any order, case
 * ignored), fields in double quotes may hold commas, quotes ("") and line breaks; blank lines and
 * lines starting with # are skipped.
 */
export function parseCsv(text: string): ParsedFile {
  const reader = csvRows(text);
  const rows = reader.next(Number.POSITIVE_INFINITY);
  return { rows, problems: reader.problems, records: reader.records };
}

/** A file's rows, read as they are asked for: a large file can be checked (and written) while it is still being read. */
export interface RowReader {
  /** problems of the file's form found so far (header, malformed records) */
  readonly problems: ImportProblem[];
  /** data records read so far, including those too malformed to become rows */
  readonly records: number;
  /** up to `max` more rows; fewer (or none) at the end of the file */
  next(max: number): ImportRow[];
}

/** The rows of a file read at once (XML), handed out as asked for. */
export function rowsOf(parsed: ParsedFile): RowReader {
  let at = 0;
  return {
    problems: parsed.problems,
    records: parsed.records,
    next(max) {
      const rows = parsed.rows.slice(at, at + max);
      at += rows.length;
      return rows;
    },
  };
}

/** The CSV rows of `text` (see parseCsv), read as they are asked for; the header is read at once. */
export function csvRows(text: string): RowReader {
  const problems: ImportProblem[] = [];
  const records = csvRecords(text, problems);
  const first = records.next();
  if (first.done) {
    problems.push({ line: 1, message: 'the file is empty: it needs a header line naming the columns' });
    return { problems, records: 0, next: () => [] };
  }
  const header = first.value;
  const columns = header.fields.map((name, index) => {
    const column = columnFor(name);
    if (!column) problems.push({ line: header.line, field: name, message: `unknown column "${name}" (columns: ${IMPORT_COLUMNS.join(', ')})` });
    return { column, index };
  });
  const seen = new Set<ImportColumn>();
  for (const { column } of columns) {
    if (!column) continue;
    if (seen.has(column)) problems.push({ line: header.line, field: column, message: `column ${column} appears twice` });
    seen.add(column);
  }
  for (const required of REQUIRED_COLUMNS) {
    if (!seen.has(required)) problems.push({ line: header.line, field: required, message: `column ${required} is required` });
  }
  if (!seen.has('sourceKey') && !seen.has('doi')) problems.push({ line: header.line, field: 'sourceKey', message: 'a sourceKey or doi column is required: no value without a source' });
  const reader = {
    problems,
    records: 0,
    next(max: number): ImportRow[] {
      const rows: ImportRow[] = [];
      while (rows.length < max) {
        const next = records.next();
        if (next.done) break;
        const record = next.value;
        reader.records++;
        if (record.fields.length !== header.fields.length) {
          problems.push({ line: record.line, message: `${record.fields.length} field${record.fields.length === 1 ? '' : 's'} where the header has ${header.fields.length}` });
          continue;
        }
        const fields: ImportRow['fields'] = {};
        for (const { column, index } of columns) {
          const value = record.fields[index].trim();
          if (column && value !== '') fields[column] = value;
        }
        rows.push({ line: record.line, fields });
      }
      return rows;
    },
  };
  return reader;
}

const COMMA = 44;
const LF = 10;
const CR = 13;

/** Records with the line each starts on, one at a time; blank and # lines dropped. Fields are sliced, not built char by char. */
function* csvRecords(text: string, problems: ImportProblem[]): Generator<{ line: number; fields: string[] }> {
  const source = text.charCodeAt(0) === 0xfeff ? text.slice(1) : text;
  const n = source.length;
  let line = 1;
  let i = 0;
  // The text each field position held in the record before: files repeat a unit, a phase, a method
  // on every row, and the same string object again costs no memory (and hashes once).
  const before: string[] = [];
  const endOfLine = (at: number) => {
    const c = source.charCodeAt(at);
    return c === LF || (c === CR && source.charCodeAt(at + 1) === LF);
  };
  while (i < n) {
    if (endOfLine(i)) {
      i += source[i] === '\r' ? 2 : 1;
      line++;
      continue;
    }
    if (source[i] === '#') {
      const next = source.indexOf('\n', i);
      i = next === -1 ? n : next + 1;
      line++;
      continue;
    }
    const start = line;
    const fields: string[] = [];
    for (;;) {
      if (source[i] === '"') {
        // Quoted: runs up to the closing quote; "" is a quote; line breaks inside are kept.
        let value = '';
        let from = i + 1;
        let closed = false;
        while (from <= n) {
          const quote = source.indexOf('"', from);
          if (quote === -1) break;
          value += source.slice(from, quote);
          for (let k = from; k < quote; k++) if (source.charCodeAt(k) === 10) line++;
          if (source[quote + 1] === '"') {
            value += '"';
            from = quote + 2;
          } else {
            closed = true;
            from = quote + 1;
            break;
          }
        }
        if (!closed) {
          problems.push({ line: start, message: 'a quoted field is not closed before the end of the file' });
          fields.push(value + source.slice(from));
          i = n;
          break;
        }
        i = from;
        // Anything between the closing quote and the delimiter is kept, as RFC 4180 readers do.
        let stop = i;
        while (stop < n && source.charCodeAt(stop) !== COMMA && !endOfLine(stop)) stop++;
        fields.push(value + source.slice(i, stop));
        i = stop;
      } else {
        let stop = i;
        for (let c = source.charCodeAt(stop); stop < n && c !== COMMA && c !== LF && !(c === CR && source.charCodeAt(stop + 1) === LF); c = source.charCodeAt(++stop));
        const same = before[fields.length];
        const value = same !== undefined && same.length === stop - i && source.startsWith(same, i) ? same : source.slice(i, stop);
        before[fields.length] = value;
        if (value.includes('"')) problems.push({ line, message: 'a double quote inside an unquoted field: quote the whole field and double the quote ("")' });
        fields.push(value);
        i = stop;
      }
      if (i < n && source[i] === ',') {
        i++;
        continue;
      }
      if (i < n) {
        i += source[i] === '\r' ? 2 : 1;
        line++;
      }
      break;
    }
    yield { line: start, fields };
  }
}

/**
 * XML (FORMAT.md): `<kelvindex-import>` holding `<record>` elements, one child element per
 * column. Parsed by fast-xml-parser with entity processing off; a DOCTYPE or ENTITY declaration
 * is refused outright (no entity expansion, no external entities, no billion laughs).
 */
export function parseXml(text: string): ParsedFile {
  const lineOf = lineIndex(text);
  const declaration = /<!(DOCTYPE|ENTITY)/i.exec(text);
  if (declaration) {
    return { rows: [], records: 0, problems: [{ line: lineOf(declaration.index), message: `${declaration[1].toUpperCase()} declarations are not accepted in import files (no DTDs, no entities)` }] };
  }
  const valid = XMLValidator.validate(text, { allowBooleanAttributes: false });
  if (valid !== true) return { rows: [], records: 0, problems: [{ line: valid.err.line, message: `the XML is not well-formed: ${valid.err.msg}` }] };

  const parser = new XMLParser({
    processEntities: false,
    htmlEntities: false,
    ignoreAttributes: true,
    ignoreDeclaration: true,
    ignorePiTags: true,
    parseTagValue: false,
    trimValues: true,
    captureMetaData: true,
    isArray: (name) => name === 'record',
  });
  const doc = parser.parse(text) as Record<string, unknown>;
  const meta = XMLParser.getMetaDataSymbol() as unknown as symbol;
  const root = doc['kelvindex-import'] as Record<string | symbol, unknown> | string | undefined;
  const rootNames = Object.keys(doc);
  if (root === undefined || rootNames.length !== 1) {
    return { rows: [], records: 0, problems: [{ line: 1, message: `the root element must be <kelvindex-import> (found ${rootNames.map((r) => `<${r}>`).join(', ') || 'none'})` }] };
  }
  const problems: ImportProblem[] = [];
  const rows: ImportRow[] = [];
  if (typeof root === 'object') {
    for (const name of Object.keys(root)) {
      if (name !== 'record') problems.push({ line: lineOf(startOf(root, meta)), message: `<kelvindex-import> holds only <record> elements (found <${name}>)` });
    }
    for (const element of (root.record as unknown[] | undefined) ?? []) {
      const line = typeof element === 'object' && element !== null ? lineOf(startOf(element as Record<symbol, unknown>, meta)) : lineOf(0);
      if (typeof element !== 'object' || element === null) {
        problems.push({ line, message: '<record> must hold one element per column, e.g. <formula>H2O</formula>' });
        continue;
      }
      const fields: ImportRow['fields'] = {};
      for (const [name, content] of Object.entries(element)) {
        const column = columnFor(name);
        if (!column) {
          problems.push({ line, field: name, message: `unknown element <${name}> (elements: ${IMPORT_COLUMNS.join(', ')})` });
          continue;
        }
        if (Array.isArray(content)) {
          problems.push({ line, field: column, message: `<${name}> appears more than once in this <record>` });
          continue;
        }
        if (typeof content === 'object' && content !== null) {
          problems.push({ line, field: column, message: `<${name}> must hold text only` });
          continue;
        }
        const value = String(content ?? '').trim();
        if (value !== '') fields[column] = value;
      }
      rows.push({ line, fields });
    }
  }
  return { rows, problems, records: rows.length };
}

function startOf(node: Record<symbol, unknown>, meta: symbol): number {
  const data = node[meta] as { startIndex?: number } | undefined;
  return data?.startIndex ?? 0;
}

/** Character offset → 1-based line, by binary search over the line starts. */
function lineIndex(text: string): (offset: number) => number {
  const starts = [0];
  for (let i = 0; i < text.length; i++) if (text.charCodeAt(i) === 10) starts.push(i + 1);
  return (offset) => {
    let lo = 0;
    let hi = starts.length - 1;
    while (lo < hi) {
      const mid = (lo + hi + 1) >> 1;
      if (starts[mid] <= offset) lo = mid;
      else hi = mid - 1;
    }
    return lo + 1;
  };
}
