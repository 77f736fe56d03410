import { SourceRef } from './species-record';

/** What a citation of one value says; every field already in display form. */
export interface CitedValue {
  readonly speciesName: string;
  readonly formula: string;
  /** Phase as written after the formula, e.g. `g` or `cr, graphite`. */
  readonly phase: string;
  readonly quantityCode: string;
  /** E.g. `ΔfH°`. */
  readonly symbol: string;
  /** Value, uncertainty and unit as shown, e.g. `-241.826 ± 0.040 kJ/mol`. */
  readonly valueText: string;
  /** E.g. `standard uncertainty` or `expanded uncertainty, k = 2`; empty without one. */
  readonly uncertaintyNote: string;
  /** K, or null when the quantity has no reference temperature. */
  readonly temperature: number | null;
  readonly source: SourceRef;
  readonly release: string;
  readonly valueId: string | number;
  /** Link to the species page pinned to the release. */
  readonly url: string;
  readonly accessed: Date;
}

/** A sentence to paste into a report: the value, its original source and the Kelvindex release. */
export function citationText(cited: CitedValue): string {
  const conditions = [cited.formula, cited.phase, cited.temperature !== null ? `${cited.temperature} K` : null]
    .filter(Boolean)
    .join(', ');
  const uncertainty = cited.uncertaintyNote ? ` (${cited.uncertaintyNote})` : '';
  const doi = cited.source.doi ? ` https://doi.org/${cited.source.doi}.` : '';
  return (
    `${cited.symbol}(${conditions}) = ${cited.valueText}${uncertainty}, ${cited.speciesName}. ` +
    `Source: ${withFullStop(cited.source.citation)}${doi} ` +
    `Retrieved from Kelvindex release ${cited.release} (value ${cited.valueId}), ${cited.url} (accessed ${isoDate(cited.accessed)}).`
  );
}

/**
 * Two BibTeX entries: the value as published in the Kelvindex release, and its original source
 * (whose citation text is kept whole in `note`, since the API gives it as one string).
 */
export function citationBibtex(cited: CitedValue): string {
  const key = bibtexKey(['kelvindex', cited.release, cited.formula, cited.phase, cited.quantityCode]);
  const temperature = cited.temperature !== null ? ` at ${cited.temperature} K` : '';
  const uncertainty = cited.uncertaintyNote ? ` (${cited.uncertaintyNote})` : '';
  const valueEntry = bibtexEntry('misc', key, [
    ['title', `{${cited.symbol}} of ${cited.speciesName} (${cited.formula}, ${cited.phase})${temperature}: ${cited.valueText}${uncertainty}`],
    ['author', '{Kelvindex}'],
    ['howpublished', `Kelvindex release ${cited.release}, value ${cited.valueId}`],
    ['note', `Original source: ${cited.source.citation}`],
    ['url', cited.url],
    ['urldate', isoDate(cited.accessed)],
    ['year', String(cited.accessed.getFullYear())],
  ]);
  const sourceFields: [string, string][] = [['note', cited.source.citation]];
  if (cited.source.doi) {
    sourceFields.push(['doi', cited.source.doi]);
  }
  const sourceEntry = bibtexEntry('misc', bibtexKey([cited.source.key]), sourceFields);
  return `${valueEntry}\n\n${sourceEntry}\n`;
}

function bibtexEntry(type: string, key: string, fields: readonly [string, string][]): string {
  const width = Math.max(...fields.map(([name]) => name.length));
  const lines = fields.map(([name, value]) => {
    // url and doi are verbatim in BibTeX; everything else is escaped, except braces we added on purpose.
    const text = name === 'url' || name === 'doi' ? value : escapeBibtex(value);
    return `  ${name.padEnd(width)} = {${text}}`;
  });
  return `@${type}{${key},\n${lines.join(',\n')}\n}`;
}

/** Escapes LaTeX's special characters; `{…}` groups written by this module survive as braces. */
export function escapeBibtex(text: string): string {
  return text
    .replace(/\\/g, '\\textbackslash ')
    .replace(/([&%$#_])/g, '\\$1')
    .replace(/~/g, '\\textasciitilde ')
    .replace(/\^/g, '\\textasciicircum ');
}

function bibtexKey(parts: readonly string[]): string {
  return parts
    .join('_')
    .normalize('NFKD')
    .replace(/[^A-Za-z0-9_:-]+/g, '_')
    .replace(/_+/g, '_')
    .replace(/^_|_$/g, '');
}

function withFullStop(text: string): string {
  return /[.!?]$/.test(text.trim()) ? text.trim() : `${text.trim()}.`;
}

function isoDate(date: Date): string {
  return `${date.getFullYear()}-${String(date.getMonth() + 1).padStart(2, '0')}-${String(date.getDate()).padStart(2, '0')}`;
}
