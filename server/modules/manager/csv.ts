// CSV as RFC 4180 describes it: fields separated by commas, records by CRLF; a field holding a
// comma, a double quote, CR or LF is wrapped in double quotes, and its quotes are doubled (a
// field holding ";" is quoted too, which RFC 4180 allows for any field).

/**
 * A spreadsheet treats a cell that begins with = + - @ (or a tab or CR, which some spreadsheets
 * strip before looking) as a formula, so a fault text such as `=HYPERLINK(...)` typed at a press
 * could run when the manager opens the export (OWASP "CSV injection"). Such a cell gets a leading
 * apostrophe: the spreadsheet shows the text as typed and evaluates nothing. Numbers we write
 * ourselves are never negative, so no figure is changed by this.
 *
 * Spreadsheets in locales whose list separator is ";" split a line on ";" too, so `a;=cmd` would
 * start a new cell with a formula. A cell holding ";" followed by a formula character gets the
 * apostrophe as well, and every cell holding ";" is quoted, so it stays one cell in either reading.
 */
const FORMULA_START = /^[=+\-@\t\r]/;
const FORMULA_AFTER_SEMICOLON = /;[=+\-@\t\r]/;
const NEEDS_QUOTES = /[",;\r\n]/;

export function csvCell(value: string | number | null | undefined): string {
  if (value === null || value === undefined) return '';
  let text = String(value);
  if (FORMULA_START.test(text) || FORMULA_AFTER_SEMICOLON.test(text)) text = `'${text}`;
  return NEEDS_QUOTES.test(text) ? `"${text.replace(/"/g, '""')}"` : text;
}

export const csvRecord = (cells: ReadonlyArray<string | number | null | undefined>) => `${cells.map(csvCell).join(',')}\r\n`;

/** Lets Excel recognise UTF-8 (names with accents); other readers skip it. */
export const UTF8_BOM = '\uFEFF';
