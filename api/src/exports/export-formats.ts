import { randomUUID } from 'node:crypto';
import path from 'node:path';
import { Transform } from 'node:stream';
import { stringify, type Options as StringifyOptions } from 'csv-stringify/sync';
import { XMLBuilder } from 'fast-xml-parser';
import { SessionThread } from '../shared/session-thread';
import type { SourceRef } from '../species/species.service';
import { CSV_ENCODER_ROLE, CSV_OPTIONS, type CopyLines, type FromEncoder } from './csv-encode-thread';
import { EXPORT_COLUMNS, type ExportRow, type Nasa7Row } from './export.service';
import { nasa7Lines, nasa7Record } from './nasa7-format';

/** What every export states before its data: the release and the sources it cites. */
export interface ExportHeader {
  release: { label: string; status: string; publishedAt: Date | null };
  /** the query string the export was asked with (filters), for the record */
  query: string;
  sources: SourceRef[];
}

export const EXPORT_FORMATS = ['csv', 'json', 'xml', 'nasa7'] as const;
export type ExportFormat = (typeof EXPORT_FORMATS)[number];

export const CONTENT_TYPES: Record<ExportFormat, string> = {
  csv: 'text/csv; charset=utf-8; header=present',
  json: 'application/json; charset=utf-8',
  xml: 'application/xml; charset=utf-8',
  nasa7: 'text/plain; charset=utf-8',
};

export const FILE_EXTENSIONS: Record<ExportFormat, string> = { csv: 'csv', json: 'json', xml: 'xml', nasa7: 'dat' };

const releaseLine = (h: ExportHeader) =>
  `release ${h.release.label} (${h.release.status === 'published' ? `published ${h.release.publishedAt?.toISOString()}` : 'in preparation, not published'})`;

/** A Transform that maps each object to text (or nothing), with a prefix and a suffix. */
function textTransform<T>(map: (row: T) => string | null, prefix: string, suffix: () => string): Transform {
  let started = false;
  const start = (t: Transform) => {
    if (!started) {
      started = true;
      t.push(prefix);
    }
  };
  return new Transform({
    writableObjectMode: true,
    readableObjectMode: false,
    transform(row: T, _encoding, callback) {
      start(this);
      const text = map(row);
      callback(null, text ?? undefined);
    },
    flush(callback) {
      start(this);
      callback(null, suffix());
    },
  });
}

/** Encoder threads an export's pieces are spread over: csv-stringify is the slowest step of a CSV export. */
const CSV_ENCODERS = 2;
/** Pieces of COPY text out at the encoder threads, at most: COPY goes on meanwhile, memory stays bounded. */
const CSV_PIECES_IN_FLIGHT = 8;

/**
 * CSV: `#` comment lines (release, filters, sources), then a header row and one row per value or
 * fit. Takes the rows as PostgreSQL's COPY text (ExportService.csvCopy, columns in EXPORT_COLUMNS
 * order, of the types given) and has csv-stringify write them on the encoder threads
 * (csv-encode-thread.ts), piece by piece, put back in order here.
 */
export function csvStages(header: ExportHeader, columnTypes: number[]): Transform[] {
  const comments = [
    'Kelvindex export (CSV). Values in SI units: J/mol, J/(mol·K), K, Pa. fit_ranges holds a fit\'s ranges as JSON.',
    releaseLine(header),
    `filters: ${header.query || 'none'}`,
    'sources:',
    ...header.sources.map((s) => `  [${s.key}] ${s.citation}`),
  ].map((line) => `# ${line.replace(/[\r\n]+/g, ' ')}\n`).join('');
  const session = randomUUID();
  const file = path.join(__dirname, 'csv-encode-thread.js');
  const encoders = Array.from({ length: CSV_ENCODERS }, (_, i) => SessionThread.of<CopyLines, FromEncoder>(file, CSV_ENCODER_ROLE, i));
  /** the start of a line whose end has not come yet */
  let partial: Buffer = Buffer.alloc(0);
  let sent = 0;
  /** pieces encoded, by place, until the ones before them are out */
  const encoded = new Map<number, string>();
  let out = 0;
  /** the callback held back while CSV_PIECES_IN_FLIGHT pieces are out, or until the last is back */
  let held: ((error?: Error | null) => void) | null = null;
  let ending = false;

  /** Sends `partial` and `chunk` up to `end` (the end of a line) to the next encoder. */
  const send = (chunk: Buffer, end: number) => {
    // Cut at a newline byte, so no UTF-8 character is cut in two.
    const text = partial.length > 0 ? Buffer.concat([partial, chunk.subarray(0, end)]).toString('utf8') : chunk.toString('utf8', 0, end);
    encoders[sent % CSV_ENCODERS].send(session, { seq: sent, text, types: columnTypes });
    sent++;
  };
  /** Lets COPY go on once fewer pieces are out (or, at the end, once every piece is out). */
  const release = () => {
    const callback = held;
    if (!callback || (ending ? out < sent : sent - out >= CSV_PIECES_IN_FLIGHT)) return;
    held = null;
    if (ending) for (const encoder of encoders) encoder.close(session);
    callback();
  };

  const stage = new Transform({
    construct(callback) {
      const fail = (error: Error) => stage.destroy(error);
      for (const encoder of encoders) {
        encoder.open(session, (answer) => {
          if ('error' in answer) return fail(new Error(`the CSV could not be written: ${answer.error}`));
          encoded.set(answer.seq, answer.csv);
          for (let next = encoded.get(out); next !== undefined; next = encoded.get(out)) {
            encoded.delete(out++);
            stage.push(next);
          }
          release();
        }, fail);
      }
      this.push(comments + stringify([], { ...CSV_OPTIONS, header: true }));
      callback();
    },
    transform(chunk: Buffer, _encoding, callback) {
      const end = chunk.lastIndexOf(0x0a) + 1;
      if (end === 0) {
        partial = Buffer.concat([partial, chunk]);
        return callback();
      }
      send(chunk, end);
      // A copy: the chunk's memory may be the connection's to reuse.
      partial = Buffer.from(chunk.subarray(end));
      held = callback;
      release();
    },
    flush(callback) {
      if (partial.length > 0) return callback(new Error('the rows ended in the middle of a line'));
      ending = true;
      held = callback;
      release();
    },
    destroy(error, callback) {
      for (const encoder of encoders) encoder.close(session);
      callback(error);
    },
  });
  return [stage];
}

/** Groups consecutive rows of one species into one record. */
function bySpecies<R>(key: (row: ExportRow) => string, build: (rows: ExportRow[]) => R): Transform {
  let current: ExportRow[] = [];
  return new Transform({
    objectMode: true,
    transform(row: ExportRow, _encoding, callback) {
      if (current.length > 0 && key(current[0]) !== key(row)) {
        this.push(build(current));
        current = [];
      }
      current.push(row);
      callback();
    },
    flush(callback) {
      if (current.length > 0) this.push(build(current));
      callback();
    },
  });
}

interface SpeciesRecord {
  id: string;
  formula: string;
  hillFormula: string;
  name: string;
  charge: number;
  molarMass: number;
  casRn: string | null;
  inchiKey: string | null;
  phases: {
    phase: string;
    polymorph: string | null;
    values: Record<string, unknown>[];
    fits: Record<string, unknown>[];
  }[];
}

function speciesRecord(rows: ExportRow[]): SpeciesRecord {
  const first = rows[0];
  const record: SpeciesRecord = {
    id: first.species_id, formula: first.formula, hillFormula: first.hill_formula, name: first.name, charge: first.charge,
    molarMass: first.molar_mass_g_per_mol, casRn: first.cas_rn, inchiKey: first.inchikey, phases: [],
  };
  for (const row of rows) {
    let phase = record.phases[record.phases.length - 1];
    if (!phase || phase.phase !== row.phase || phase.polymorph !== row.polymorph) {
      phase = { phase: row.phase, polymorph: row.polymorph, values: [], fits: [] };
      record.phases.push(phase);
    }
    if (row.record_kind === 'value') {
      phase.values.push({
        id: row.version_id, lineageId: row.lineage_id, versionNo: row.version_no, quantity: row.quantity, symbol: row.symbol,
        transitionKind: row.transition, recommended: row.recommended, value: row.value, uncertainty: row.uncertainty,
        uncertaintyKind: row.uncertainty_kind, coverageFactor: row.coverage_factor, unit: row.unit, temperature: row.temperature_K,
        pressure: row.pressure_Pa, method: row.method, methodDetail: row.method_detail, source: row.source_key,
      });
    } else {
      phase.fits.push({
        id: row.version_id, lineageId: row.lineage_id, versionNo: row.version_no, form: row.fit_form, tMin: row.t_min_K, tMax: row.t_max_K,
        pressure: row.pressure_Pa, recommended: row.recommended, method: row.method, source: row.source_key, ranges: row.fit_ranges,
      });
    }
  }
  return record;
}

/** JSON: one object, `kelvindex` (the header) first, then `species` streamed one record at a time. */
export function jsonStages(header: ExportHeader): Transform[] {
  const head = {
    format: 'kelvindex-export',
    formatVersion: 1,
    release: header.release,
    filters: header.query,
    units: { energy: 'J/mol', entropy: 'J/(mol·K)', heatCapacity: 'J/(mol·K)', temperature: 'K', pressure: 'Pa', molarMass: 'g/mol' },
    sources: header.sources,
  };
  let count = 0;
  return [
    bySpecies((r) => r.species_id, speciesRecord),
    textTransform<SpeciesRecord>((record) => `${count++ === 0 ? '\n' : ',\n'}${JSON.stringify(record)}`, `{"kelvindex":${JSON.stringify(head)},"species":[`, () => `${count > 0 ? '\n' : ''}]}\n`),
  ];
}

const escapeAttribute = (value: string) => value.replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/>/g, '&gt;').replace(/"/g, '&quot;');

/** Attributes for the builder, leaving out the empty ones. */
function attributes(values: Record<string, unknown>): Record<string, unknown> {
  const out: Record<string, unknown> = {};
  for (const [key, value] of Object.entries(values)) {
    if (value !== null && value !== undefined && value !== '') out[`@_${key}`] = value instanceof Date ? value.toISOString() : value;
  }
  return out;
}

function xmlSpecies(record: SpeciesRecord): Record<string, unknown> {
  return {
    species: {
      ...attributes({ id: record.id, formula: record.formula, hillFormula: record.hillFormula, name: record.name, charge: record.charge, molarMass: record.molarMass, casRn: record.casRn, inchiKey: record.inchiKey }),
      phase: record.phases.map((p) => ({
        ...attributes({ code: p.phase, polymorph: p.polymorph }),
        value: p.values.map((v) => ({
          ...attributes({
            id: v.id, lineageId: v.lineageId, version: v.versionNo, quantity: v.quantity, symbol: v.symbol, transition: v.transitionKind,
            recommended: v.recommended, unit: v.unit, uncertainty: v.uncertainty, uncertaintyKind: v.uncertaintyKind, coverageFactor: v.coverageFactor,
            temperature: v.temperature, pressure: v.pressure, method: v.method, methodDetail: v.methodDetail, source: v.source,
          }),
          '#text': v.value,
        })),
        fit: p.fits.map((f) => ({
          ...attributes({ id: f.id, lineageId: f.lineageId, version: f.versionNo, form: f.form, tMin: f.tMin, tMax: f.tMax, pressure: f.pressure, recommended: f.recommended, method: f.method, source: f.source }),
          range: ((f.ranges ?? []) as { tMin: number; tMax: number; coefficients?: number[]; points?: [number, number][] }[]).map((r) => ({
            ...attributes({ tMin: r.tMin, tMax: r.tMax }),
            ...(r.coefficients ? { coefficient: r.coefficients.map((c, i) => ({ '@_index': i + 1, '#text': c })) } : {}),
            ...(r.points ? { point: r.points.map(([t, cp]) => ({ '@_T': t, '@_Cp': cp })) } : {}),
          })),
        })),
      })),
    },
  };
}

/**
 * XML: a `kelvindexExport` root with the release as attributes, a `sources` list, then one
 * `species` element per species, built by fast-xml-parser's XMLBuilder a record at a time.
 */
export function xmlStages(header: ExportHeader): Transform[] {
  const builder = new XMLBuilder({ ignoreAttributes: false, attributeNamePrefix: '@_', textNodeName: '#text', format: true, indentBy: '  ', suppressEmptyNode: true, suppressBooleanAttributes: false });
  const root = attributes({
    release: header.release.label,
    releaseStatus: header.release.status,
    publishedAt: header.release.publishedAt,
    filters: header.query,
    units: 'SI: J/mol, J/(mol·K), K, Pa; molar mass in g/mol',
  });
  const rootAttributes = Object.entries(root).map(([k, v]) => ` ${k.slice(2)}="${escapeAttribute(String(v))}"`).join('');
  const sources = builder.build({
    sources: { source: header.sources.map((s) => ({ ...attributes({ id: s.id, key: s.key, doi: s.doi }), citation: s.citation })) },
  });
  const indent = (text: string) => text.replace(/^(?=.)/gm, '  ');
  return [
    bySpecies((r) => r.species_id, (rows) => xmlSpecies(speciesRecord(rows))),
    textTransform<Record<string, unknown>>(
      (species) => indent(builder.build(species)),
      `<?xml version="1.0" encoding="UTF-8"?>\n<kelvindexExport${rootAttributes}>\n${indent(sources)}`,
      () => '</kelvindexExport>\n',
    ),
  ];
}

/**
 * NASA-7 polynomials, TM-4513 fixed columns: `!` comment lines (release, sources), THERMO, the
 * default temperatures line, four lines per species, END. Fits the layout cannot hold are named in
 * a comment instead.
 */
export function nasa7Stages(header: ExportHeader): Transform[] {
  const comments = [
    'Kelvindex export: NASA 7-coefficient polynomials in the fixed-column format of NASA TM-4513 (McBride, Gordon & Reno, 1993).',
    'Cp/R = a1 + a2 T + a3 T^2 + a4 T^3 + a5 T^4; H/(RT) = a1 + a2 T/2 + a3 T^2/3 + a4 T^3/4 + a5 T^4/5 + a6/T;',
    'S/R = a1 ln T + a2 T + a3 T^2/2 + a4 T^3/3 + a5 T^4/4 + a7. Only each species phase\'s recommended NASA-7 fit is written.',
    'Columns 19-24 of each first line hold the release label.',
    releaseLine(header),
    `filters: ${header.query || 'none'}`,
    'sources:',
    ...header.sources.map((s) => `  [${s.key}] ${s.citation}`),
  ].map((line) => `! ${line.replace(/[\r\n]+/g, ' ')}\n`).join('');
  return [
    textTransform<Nasa7Row>(
      (row) => {
        const record = nasa7Record({
          name: row.phase === 'g' ? row.formula : `${row.formula}(${row.phase === 'aq,inf' ? 'AQ' : row.phase.toUpperCase()})`,
          code: header.release.label,
          composition: row.composition,
          charge: row.charge,
          phase: row.phase,
          ranges: row.ranges,
        });
        const about = `! ${row.name} (${row.phase}${row.polymorph ? `, ${row.polymorph}` : ''}), species ${row.species_id}, fit ${row.fit_id}, source ${row.source_key}` +
          (row.pressure_pa !== 100000 ? `, given at ${row.pressure_pa} Pa` : '');
        if ('skipped' in record) return `${about}\n! skipped: ${record.skipped}\n`;
        return `${about}\n${nasa7Lines(record).join('\n')}\n`;
      },
      `${comments}THERMO\n   300.000  1000.000  5000.000\n`,
      () => 'END\n',
    ),
  ];
}

/** The stages of the formats written from rows as objects (CSV is written from COPY text: csvStages). */
export function stagesFor(format: Exclude<ExportFormat, 'csv'>, header: ExportHeader): Transform[] {
  switch (format) {
    case 'json':
      return jsonStages(header);
    case 'xml':
      return xmlStages(header);
    case 'nasa7':
      return nasa7Stages(header);
  }
}

