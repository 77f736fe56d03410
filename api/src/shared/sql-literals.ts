/**
 * A statement with its parameters written in as literals, for COPY, which takes no parameters.
 * Each value goes through `escapeLiteral` (pg's Client#escapeLiteral: quotes doubled, and
 * backslashes too in an E'' literal); arrays become array literals, as pg sends them.
 */
export function inlineParameters(text: string, values: readonly unknown[], escapeLiteral: (text: string) => string): string {
  return text.replace(/\$(\d+)\b/g, (_match, n: string) => {
    const index = Number(n) - 1;
    if (index >= values.length) throw new Error(`the statement uses $${n} but has ${values.length} parameters`);
    return literal(values[index], escapeLiteral);
  });
}

function literal(value: unknown, escapeLiteral: (text: string) => string): string {
  if (value === null || value === undefined) return 'NULL';
  if (typeof value === 'number' || typeof value === 'bigint') {
    if (typeof value === 'number' && !Number.isFinite(value)) throw new Error(`cannot write the number ${value} as a literal`);
    return String(value);
  }
  if (typeof value === 'boolean') return value ? 'true' : 'false';
  if (Array.isArray(value)) {
    return escapeLiteral(`{${value.map((v) => (v === null ? 'NULL' : `"${String(v).replace(/\\/g, '\\\\').replace(/"/g, '\\"')}"`)).join(',')}}`);
  }
  if (typeof value === 'object') return escapeLiteral(JSON.stringify(value));
  return escapeLiteral(String(value));
}
