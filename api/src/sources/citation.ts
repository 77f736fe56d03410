/** The parts of a CSL-JSON record a one-line citation uses. */
interface CslName {
  family?: string;
  given?: string;
  suffix?: string;
  literal?: string;
}

type Csl = Record<string, unknown>;

/** What the sources table holds besides the CSL-JSON, used when the record lacks a field. */
export interface CitationFallback {
  title: string;
  year: number | null;
  doi: string | null;
}

const MAX_AUTHORS = 10;

function text(value: unknown): string | undefined {
  if (typeof value === 'string') return value.trim() || undefined;
  if (typeof value === 'number') return String(value);
  return undefined;
}

function name(n: CslName): string {
  if (n.literal) return n.literal;
  const base = [n.family, n.given].filter(Boolean).join(', ');
  return n.suffix ? `${base}, ${n.suffix}` : base;
}

function authors(csl: Csl): string | undefined {
  const list = (Array.isArray(csl.author) ? csl.author : Array.isArray(csl.editor) ? csl.editor : []) as CslName[];
  const names = list.map(name).filter(Boolean);
  if (names.length === 0) return undefined;
  const shown = names.slice(0, MAX_AUTHORS).join('; ');
  return names.length > MAX_AUTHORS ? `${shown}; et al.` : shown;
}

function year(csl: Csl, fallback: number | null): string | undefined {
  const issued = csl.issued as { 'date-parts'?: unknown[][] } | undefined;
  const first = issued?.['date-parts']?.[0]?.[0];
  return text(first) ?? (fallback === null ? undefined : String(fallback));
}

const endWithPeriod = (s: string) => (/[.?!]$/.test(s) ? s : `${s}.`);

/**
 * A one-line citation in the author–title–container–year order of the chemistry journals (ACS
 * style, simplified), built from the source's CSL-JSON; the DOI, when known, as a link.
 * Deterministic and dependency-free, so exports can cite every source without a formatter engine.
 */
export function formatCitation(csl: Csl | null | undefined, fallback: CitationFallback): string {
  const record = csl ?? {};
  const title = text(record.title) ?? fallback.title;
  const who = authors(record);
  const when = year(record, fallback.year);
  const container = text(record['container-title']);
  const parts: string[] = [];
  if (who) parts.push(endWithPeriod(who));
  parts.push(endWithPeriod(title));
  if (container) {
    const volume = text(record.volume);
    const issue = text(record.issue);
    const page = text(record.page);
    const collection = text(record['collection-title']);
    let line = container;
    if (when) line += ` ${when}`;
    if (volume) line += `, ${volume}${issue ? ` (${issue})` : ''}`;
    if (collection) line += `, ${collection}`;
    if (page) line += `, ${page}`;
    parts.push(endWithPeriod(line));
  } else {
    const series = [text(record['collection-title']), text(record.number)].filter(Boolean).join('; ');
    const publisher = text(record.publisher);
    const place = text(record['publisher-place']);
    let line = series;
    if (publisher) line += `${line ? '; ' : ''}${publisher}${place ? `: ${place}` : ''}`;
    if (when) line += `${line ? ', ' : ''}${when}`;
    if (line) parts.push(endWithPeriod(line));
  }
  const doi = text(record.DOI) ?? fallback.doi ?? undefined;
  if (doi) parts.push(`https://doi.org/${doi}`);
  return parts.join(' ');
}
