// CSV as RFC 4180 describes it: fields separated by commas, records by CRLF; a field holding a
// comma, a double quote, CR or LF is wrapped in double quotes, and its quotes are doubled.

/**
 * A spreadsheet treats a cell that begins with = + - @ (or a tab or CR, which some spreadsheets
 * strip before looking) as a formula, so a fault text such as `=HYPERLINK(...)` typed at a press
 * could run when the manager opens the export (OWASP "CSV injection"). Such a cell gets a leading
 * apostrophe: the spreadsheet shows the text as typed and evaluates nothing. Numbers we write
 * ourselves are never negative, so no figure is changed by this.
 */
const FORMULA_START = /^[=+\-@\t\r]/;

export function csvCell(value: string | number | null | undefined): string {
  if (value === null || value === undefined) return '';
  let text = String(value);
  if (FORMULA_START.test(text)) text = `'${text}`;
  return /[",\r\n]/.test(text) ? `"${text.replace(/"/g, '""')}"` : text;
}

export const csvRecord = (cells: ReadonlyArray<string | number | null | undefined>) => `${cells.map(csvCell).join(',')}\r\n`;

/** Lets Excel recognise UTF-8 (names with accents); other readers skip it. */
export const UTF8_BOM = '\uFEFF';
