import { types, type CustomTypesConfig } from 'pg';

// PostgreSQL type oids (pg_type.oid), fixed since PostgreSQL 7.
const BOOL = 16;
const INT2 = 21;
const INT4 = 23;
const FLOAT4 = 700;
const FLOAT8 = 701;
const JSON_TYPE = 114;
const JSONB = 3802;

/**
 * A float as PostgreSQL prints it → as JavaScript prints the same number (`String(Number(text))`),
 * without parsing it in the common case. Both print the shortest digits that read back as the
 * same double (PostgreSQL ≥ 12 with extra_float_digits ≥ 1; with fewer digits, the text has at
 * most 15 significant digits, which is what JavaScript prints for the double it reads as). They
 * differ only in spelling: PostgreSQL writes an exponent below 1e-4 and from 1e15 (`1e-05`,
 * `1e+15`) and keeps the sign of negative zero, where JavaScript writes `0.00001`,
 * `1000000000000000` and `0`.
 */
export function floatText(text: string): string {
  return text.includes('e') || text === '-0' ? String(Number(text)) : text;
}

const integerText = (text: string) => text;
const booleanText = (text: string) => (text === 't' ? 'true' : 'false');
/** JSON stays PostgreSQL's text; the CSV encoder (csv-encode-thread.ts) writes it as JSON.stringify would. */
const jsonText = (text: string) => text;

/**
 * Type parsers for reading rows that are only written out as text (the CSV export): numbers and
 * booleans stay text, spelt as `String()` of the value pg would have parsed (`-74873`, `1e-7`,
 * `true`), so the CSV holds the same bytes as when every field was parsed first, at a fraction of
 * the cost (a CSV export converts millions of numbers). JSON stays text too. Every other type is
 * parsed as usual.
 */
export const CSV_FIELD_TYPES: CustomTypesConfig = {
  getTypeParser: (oid: number, format?: 'text' | 'binary') => {
    switch (oid) {
      case FLOAT4:
      case FLOAT8:
        return floatText;
      case INT2:
      case INT4:
        return integerText;
      case BOOL:
        return booleanText;
      case JSON_TYPE:
      case JSONB:
        return jsonText;
      default:
        return types.getTypeParser(oid, format);
    }
  },
};
