import { PropertyKey, PropertyRow } from './species-record';

/** A column of the temperature table as exported: its heading and the unit of its numbers. */
export interface ExportColumn {
  readonly key: PropertyKey;
  readonly header: string;
  readonly unit: string;
}

/** Where the exported numbers come from, repeated in every CSV row so that none is orphaned. */
export interface ExportContext {
  readonly formula: string;
  readonly name: string;
  readonly phase: string;
  readonly release: string;
}

/**
 * The table as shown, as CSV (RFC 4180, CRLF line ends): species, phase, release, T, the
 * extrapolation flag, then each shown column's value and uncertainty with the unit in the heading.
 * Numbers are written with all the digits the API sent, not rounded for display.
 */
export function propertyRowsToCsv(context: ExportContext, columns: readonly ExportColumn[], rows: readonly PropertyRow[]): string {
  const header = ['species', 'formula', 'phase', 'release', 'T (K)', 'extrapolated'];
  for (const column of columns) {
    const unit = column.unit ? ` (${column.unit})` : '';
    header.push(`${column.header}${unit}`, `u(${column.header})${unit}`);
  }
  const lines = [header.map(csvField)];
  for (const row of rows) {
    const fields = [csvField(context.name), csvField(context.formula), csvField(context.phase), csvField(context.release), String(row.T), String(row.extrapolated)];
    for (const column of columns) {
      const cell = row[column.key];
      fields.push(cell ? String(cell.value) : '', cell?.uncertainty != null ? String(cell.uncertainty) : '');
    }
    lines.push(fields);
  }
  return lines.map((fields) => fields.join(',')).join('\r\n') + '\r\n';
}

/** The table as shown, as JSON, with the context and units stated once. */
export function propertyRowsToJson(context: ExportContext, columns: readonly ExportColumn[], rows: readonly PropertyRow[]): string {
  const document = {
    source: 'Kelvindex',
    ...context,
    columns: [{ key: 'T', header: 'T', unit: 'K' }, ...columns],
    rows: rows.map((row) => {
      const values: Record<string, unknown> = { T: row.T, extrapolated: row.extrapolated };
      for (const column of columns) {
        const cell = row[column.key];
        values[column.key] = cell ? { value: cell.value, uncertainty: cell.uncertainty } : null;
      }
      return values;
    }),
  };
  return JSON.stringify(document, null, 2) + '\n';
}

/**
 * Quotes a text field when it needs it, and defuses text a spreadsheet would run as a formula
 * (a leading =, +, - or @) by prefixing an apostrophe.
 */
export function csvField(text: string): string {
  const safe = /^[=+\-@\t\r]/.test(text) ? `'${text}` : text;
  return /[",\r\n]/.test(safe) ? `"${safe.replace(/"/g, '""')}"` : safe;
}

/** Hands `text` to the browser as a download named `fileName`. */
export function saveTextFile(fileName: string, mimeType: string, text: string): void {
  const url = URL.createObjectURL(new Blob([text], { type: mimeType }));
  const link = document.createElement('a');
  link.href = url;
  link.download = fileName;
  link.style.display = 'none';
  document.body.appendChild(link);
  link.click();
  link.remove();
  setTimeout(() => URL.revokeObjectURL(url), 1000);
}

/** A file name safe on every system: `kelvindex-H2O-g-2025.1.csv`. */
export function exportFileName(context: ExportContext, extension: string): string {
  const stem = ['kelvindex', context.formula, context.phase, context.release]
    .join('-')
    .replace(/[^A-Za-z0-9.-]+/g, '_');
  return `${stem}.${extension}`;
}
