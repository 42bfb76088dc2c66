/**
 * The one CSV writer for every download (material order, price book): RFC 4180 quoting, CRLF records,
 * and the spreadsheet-formula guard, so no export can forget it.
 *
 * A text cell that starts with =, +, -, @, a tab or a carriage return is run as a formula by spreadsheet
 * programs ("CSV injection", OWASP: https://owasp.org/www-community/attacks/CSV_Injection), so it is
 * written behind an apostrophe, which spreadsheets hide. Readers of our own files take it off again
 * (the price-book import does), so a round trip is exact. Numbers are not formulas and are written as is.
 */
export type CsvCell = string | number;

const FORMULA_START = /^[=+\-@\t\r]/;
const NEEDS_QUOTES = /[",\r\n]|^\s|\s$/;

/** The apostrophe guard on its own, for readers that must recognise what the writer did. */
export const guardFormula = (value: string): string => (FORMULA_START.test(value) ? `'${value}` : value);

function cellText(cell: CsvCell): string {
  const value = typeof cell === "number" ? String(cell) : guardFormula(cell);
  return NEEDS_QUOTES.test(value) ? `"${value.replace(/"/g, '""')}"` : value;
}

/**
 * Records joined with CRLF, the line ending RFC 4180 names and every spreadsheet reads. `bom` puts a
 * UTF-8 byte-order mark first, so spreadsheets read accented names and × as UTF-8.
 */
export function writeCsv(rows: readonly (readonly CsvCell[])[], options: { bom?: boolean } = {}): string {
  const body = rows.map((r) => r.map(cellText).join(",")).join("\r\n") + "\r\n";
  return options.bom ? `\uFEFF${body}` : body;
}
