/**
 * CSV as RFC 4180 writes it, read the way spreadsheets save it: a UTF-8 byte-order mark is skipped,
 * CRLF, LF or CR end a record, quoted values may hold commas, doubled quotes and line breaks. A quote
 * inside an unquoted value is kept as a character, because lengths are written with inch marks
 * (11/16") and people editing by hand rarely quote them.
 */

export interface CsvRecord {
  /** The line of the file the record starts on, counting from 1: what an error message points at. */
  line: number;
  fields: string[];
}

export type CsvParse = { ok: true; records: CsvRecord[] } | { ok: false; line: number; message: string };

/** `delimiter` is a comma, or a tab for the tab-separated text spreadsheets also save. */
export function parseCsv(input: string, delimiter: "," | "\t" = ","): CsvParse {
  const text = input.charCodeAt(0) === 0xfeff ? input.slice(1) : input;
  const records: CsvRecord[] = [];
  let fields: string[] = [];
  let field = "";
  let line = 1;
  let recordLine = 1;
  let quoted = false; // inside "…"
  let closed = false; // just after the closing quote of a quoted value
  let quoteLine = 1;

  const endField = () => {
    fields.push(field);
    field = "";
    closed = false;
  };
  const endRecord = () => {
    endField();
    records.push({ line: recordLine, fields });
    fields = [];
  };

  for (let i = 0; i < text.length; i++) {
    const c = text[i]!;
    if (quoted) {
      if (c === '"') {
        if (text[i + 1] === '"') {
          field += '"';
          i++;
        } else {
          quoted = false;
          closed = true;
        }
      } else {
        if (c === "\n" || (c === "\r" && text[i + 1] !== "\n")) line++;
        field += c;
      }
      continue;
    }
    if (c === delimiter) {
      endField();
    } else if (c === "\r" || c === "\n") {
      if (c === "\r" && text[i + 1] === "\n") i++;
      endRecord();
      line++;
      recordLine = line;
    } else if (closed) {
      // Spaces after a closing quote are harmless; anything else means a quote was not doubled.
      if (c !== " " && c !== "\t") {
        return { ok: false, line, message: `Text after a closing quote: a quote inside a quoted value must be doubled ("").` };
      }
    } else if (c === '"' && field.trim() === "") {
      field = "";
      quoted = true;
      quoteLine = line;
    } else {
      field += c;
    }
  }
  if (quoted) return { ok: false, line: quoteLine, message: "A quoted value is never closed: a quote is missing." };
  // A final line break ends the last record; it does not start an empty one.
  if (field !== "" || fields.length > 0 || closed) endRecord();
  return { ok: true, records };
}

// Writing lives in lib/csv/write.ts: one writer, with the spreadsheet-formula guard, for every export.
