// PostgreSQL type oids (pg_type.oid), fixed since PostgreSQL 7.
const BOOL = 16;
const NAME = 19;
const INT8 = 20;
const INT2 = 21;
const INT4 = 23;
const TEXT = 25;
const JSON_TYPE = 114;
const FLOAT4 = 700;
const FLOAT8 = 701;
const BPCHAR = 1042;
const VARCHAR = 1043;
const NUMERIC = 1700;
const UUID = 2950;
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

const asItIs = (text: string) => text;
const booleanText = (text: string) => (text === 't' ? 'true' : 'false');
const jsonText = (text: string) => JSON.stringify(JSON.parse(text));

/**
 * How a field of type `oid`, as PostgreSQL prints it (COPY's text, less its escapes), is written
 * in the CSV: as `String()` of the value pg would have parsed it into (`-74873`, `1e-7`, `true`,
 * JSON without spaces), so the CSV holds the same bytes as when every field was parsed first, at
 * a fraction of the cost (an export converts millions of numbers). Undefined for a type the
 * export does not know how to write so (a date, an array): the export's columns are chosen to
 * have none.
 */
export function csvFieldWriter(oid: number): ((text: string) => string) | undefined {
  switch (oid) {
    case FLOAT4:
    case FLOAT8:
      return floatText;
    case BOOL:
      return booleanText;
    case JSON_TYPE:
    case JSONB:
      return jsonText;
    // pg keeps int8 and numeric as text; int2 and int4 it parses, and String() gives the text back.
    case INT2:
    case INT4:
    case INT8:
    case NUMERIC:
    case TEXT:
    case VARCHAR:
    case BPCHAR:
    case NAME:
    case UUID:
      return asItIs;
    default:
      return undefined;
  }
}
