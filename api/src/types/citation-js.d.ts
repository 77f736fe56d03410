// citation-js 0.7 ships CommonJS without type declarations; only what api/src/sources/bibliography-formats.ts uses.
declare module '@citation-js/core' {
  export class Cite {
    constructor(data: unknown, options?: { forceType?: string; generateGraph?: boolean });
    data: Record<string, unknown>[];
    format(format: 'bibtex' | 'data' | 'bibliography', options?: Record<string, unknown>): string;
  }
  export const plugins: { input: { has(type: string): boolean } };
}
declare module '@citation-js/plugin-bibtex';
declare module '@citation-js/plugin-ris';
