/**
 * DOIs as stored: the bare name (`10.prefix/suffix`) in lower case. DOIs are case-insensitive,
 * so lower case makes the unique index catch duplicates typed with different case.
 * The form check is the same as the database's `sources_doi_format`.
 */
const DOI = /^10\.\d{4,9}\/\S+$/;
const RESOLVER_PREFIX = /^(?:https?:\/\/(?:dx\.)?doi\.org\/|doi:\s*)/i;

/**
 * The stored form of a DOI typed as a bare name, `doi:` name or resolver URL, or undefined when
 * it is not a DOI. Percent-encoding in URLs is decoded.
 */
export function normalizeDoi(text: string): string | undefined {
  let candidate = text.trim().replace(RESOLVER_PREFIX, '');
  if (candidate !== text.trim()) {
    try {
      candidate = decodeURIComponent(candidate);
    } catch {
      return undefined;
    }
  }
  candidate = candidate.toLowerCase();
  return DOI.test(candidate) ? candidate : undefined;
}

/** True when `text` is already in stored form. */
export function isStoredDoi(text: string): boolean {
  return DOI.test(text) && text === text.toLowerCase();
}
