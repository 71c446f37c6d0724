import Papa from 'papaparse';

/**
 * OWASP's CSV-injection guidance: a cell that starts with = + - @ tab or carriage return is read as a
 * formula by spreadsheet programs, so it is prefixed with a single quote (and the cell quoted).
 * Papa Parse's own `escapeFormulae: true` pattern ends in `.*$`, which misses such a cell when it holds a
 * line break; this one looks at the first character only.
 */
export const FORMULA_START = /^[=+\-@\t\r]/;

export type CsvCell = string | number | null;

/** A CSV text (RFC 4180 quoting by Papa Parse) with a header row; numbers stay numbers. */
export function toCsv(header: string[], rows: CsvCell[][]): string {
  return Papa.unparse({ fields: header, data: rows.map((r) => r.map((c) => c ?? '')) }, { escapeFormulae: FORMULA_START, newline: '\r\n' });
}

/** Hands the CSV text to the browser as a file download. */
export function downloadCsv(filename: string, text: string): void {
  const url = URL.createObjectURL(new Blob([text], { type: 'text/csv;charset=utf-8' }));
  const link = document.createElement('a');
  link.href = url;
  link.download = filename;
  document.body.append(link);
  link.click();
  link.remove();
  URL.revokeObjectURL(url);
}
