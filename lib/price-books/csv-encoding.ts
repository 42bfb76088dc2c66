/**
 * The bytes of an uploaded CSV as text. Spreadsheets save "CSV" in the computer's own code page unless
 * told otherwise (Windows-1252 on a Western European Windows), "Unicode text" as UTF-16 with a
 * byte-order mark, and "CSV UTF-8" as UTF-8; reading them all as UTF-8 turns "Érable" into "�rable"
 * without a word. So: a byte-order mark decides; else strict UTF-8; else Windows-1252, said out loud
 * in the preview; else (control characters that no spreadsheet writes) refuse.
 */
export type CsvEncoding = "UTF-8" | "UTF-16LE" | "UTF-16BE" | "Windows-1252";
export type DecodedCsv = { ok: true; text: string; encoding: CsvEncoding } | { ok: false; message: string };

export const SAVE_AS_UTF8 = 'Save the file as "CSV UTF-8" from your spreadsheet and import it again.';

// C0 controls other than tab, line feed and carriage return, and the C1 block Windows-1252 leaves unassigned.
const CONTROL = /[\u0000-\u0008\u000b\u000c\u000e-\u001f\u0081\u008d\u008f\u0090\u009d]/;

function decode(bytes: Uint8Array, label: string, fatal: boolean): string | null {
  try {
    return new TextDecoder(label, { fatal, ignoreBOM: false }).decode(bytes);
  } catch {
    return null;
  }
}

export function decodeCsvBytes(bytes: Uint8Array): DecodedCsv {
  const [a, b] = bytes;
  const bom = a === 0xff && b === 0xfe ? "UTF-16LE" : a === 0xfe && b === 0xff ? "UTF-16BE" : null;
  const tries: CsvEncoding[] = bom ? [bom] : ["UTF-8", "Windows-1252"];
  for (const encoding of tries) {
    const text = decode(bytes, encoding.toLowerCase(), true);
    if (text !== null && !CONTROL.test(text)) return { ok: true, text, encoding };
  }
  return { ok: false, message: `The file is not text in an encoding Miterwise recognises. ${SAVE_AS_UTF8}` };
}

/** Text that went through a wrong decoding on the way here carries U+FFFD where letters were. */
export const hasReplacementCharacter = (text: string) => text.includes("\uFFFD");
