import { Cite } from '@citation-js/core';
import '@citation-js/plugin-bibtex';
import '@citation-js/plugin-ris';

/**
 * BibTeX and RIS in, CSL-JSON and BibTeX out, through citation-js (0.7, CommonJS). Every use of
 * citation-js goes through here: its input detection is permissive (it would happily read a URL
 * or a DOI and try to fetch it), so the input type is always forced and no network lookup runs.
 */
export type BibliographyFormat = 'bibtex' | 'ris';

const FORCED_TYPE: Readonly<Record<BibliographyFormat, string>> = {
  bibtex: '@biblatex/text',
  ris: '@ris/file',
};

export class BibliographyError extends Error {}

/** BibTeX when the text starts an entry with `@type{`, RIS when a line starts with `TY  - `. */
export function detectFormat(text: string): BibliographyFormat | undefined {
  if (/^\s*@[A-Za-z]+\s*[{(]/m.test(text)) return 'bibtex';
  if (/^TY {2}- /m.test(text)) return 'ris';
  return undefined;
}

/** The entries of a BibTeX or RIS text as CSL-JSON items (internal `_…` fields and temporary ids removed). */
export function parseBibliography(text: string, format: BibliographyFormat): Record<string, unknown>[] {
  let items: Record<string, unknown>[];
  try {
    items = new Cite(text, { forceType: FORCED_TYPE[format], generateGraph: false }).data;
  } catch (error) {
    throw new BibliographyError(`The ${format === 'bibtex' ? 'BibTeX' : 'RIS'} text cannot be read: ${(error as Error).message}`);
  }
  return items.map((item) => {
    const clean: Record<string, unknown> = {};
    for (const [key, value] of Object.entries(item)) {
      if (key.startsWith('_') || key === 'id') continue;
      clean[key] = value;
    }
    return clean;
  });
}

/** A CSL-JSON item as a BibTeX entry with the given citation key. */
export function toBibtex(csl: Record<string, unknown>, key: string): string {
  const { _graph: _g, ...rest } = csl;
  const entry = new Cite({ ...rest, id: key }, { forceType: '@csl/object', generateGraph: false }).format('bibtex').trim();
  // citation-js makes its own label (Author + year + title word); ours is the source's short key.
  return `${entry.replace(/^@(\w+)\{[^,\n]*,/, `@$1{${key},`)}\n`;
}
