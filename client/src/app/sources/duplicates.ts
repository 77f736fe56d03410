import { Source } from '../shared/sources/sources-api';

/** Two sources that look like one publication: the one to merge and the one to keep. */
export interface DuplicatePair {
  readonly duplicate: Source;
  readonly keep: Source;
  readonly reason: string;
}

/** A title reduced to its letters and digits, for comparing. */
export function titleKey(title: string): string {
  return title.normalize('NFKD').toLowerCase().replace(/[^a-z0-9]+/g, '');
}

/** The DOI a placeholder source was created from ("DOI 10.1000/x", made from a DOI alone). */
function placeholderDoi(source: Source): string | null {
  const match = /^DOI (10\.\S+)$/.exec(source.title);
  return match ? match[1].toLowerCase() : null;
}

/**
 * Likely duplicates among `sources`: the same title (and year, when both have one), or a source
 * made from its DOI alone next to one carrying that DOI in its record. The source with a DOI and
 * the fuller record is kept; merging moves open items and evidence to it (and the DOI, if it has none).
 */
export function likelyDuplicates(sources: readonly Source[]): DuplicatePair[] {
  const live = sources.filter((s) => !s.mergedIntoId);
  const pairs: DuplicatePair[] = [];
  const seen = new Set<string>();
  for (let i = 0; i < live.length; i++) {
    for (let j = i + 1; j < live.length; j++) {
      const a = live[i];
      const b = live[j];
      if (a.doi && b.doi && a.doi !== b.doi) {
        continue;
      }
      let reason: string | null = null;
      if (titleKey(a.title) === titleKey(b.title) && (a.year === null || b.year === null || a.year === b.year)) {
        reason = 'same title';
      } else if (placeholderDoi(a) && placeholderDoi(a) === (b.doi ?? '').toLowerCase()) {
        reason = `made from DOI ${b.doi} alone`;
      } else if (placeholderDoi(b) && placeholderDoi(b) === (a.doi ?? '').toLowerCase()) {
        reason = `made from DOI ${a.doi} alone`;
      }
      if (!reason) {
        continue;
      }
      const key = [a.id, b.id].sort().join('|');
      if (seen.has(key)) {
        continue;
      }
      seen.add(key);
      const [keep, duplicate] = richness(a) >= richness(b) ? [a, b] : [b, a];
      pairs.push({ duplicate, keep, reason });
    }
  }
  return pairs;
}

/** How much a record says: a DOI, authors, a year, a real title. */
function richness(source: Source): number {
  return (source.doi ? 4 : 0) + (Array.isArray(source.csl['author']) ? 2 : 0) + (source.year ? 1 : 0) + (placeholderDoi(source) ? -4 : 0);
}
