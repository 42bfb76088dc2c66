import { describe, expect, it } from "vitest";
import { readItemsCsv } from "./csv";
import { decodeCsvBytes } from "./csv-encoding";

/** Windows-1252 bytes of a string of Latin-1 letters (É = 0xC9, é = 0xE9): what a Western European Windows spreadsheet saves. */
const cp1252 = (text: string) => Uint8Array.from([...text].map((c) => c.charCodeAt(0)));
const utf16le = (text: string) => {
  const out = new Uint8Array(2 + text.length * 2);
  out.set([0xff, 0xfe]);
  for (let i = 0; i < text.length; i++) out.set([text.charCodeAt(i) & 0xff, text.charCodeAt(i) >> 8], 2 + i * 2);
  return out;
};
const HEADER = "name,kind,face_width,thickness,species,supplier_code,price 8'";

describe("decoding an uploaded file", () => {
  it("reads a Windows-1252 file's accented letters instead of replacing them, and says which encoding it used", () => {
    const decoded = decodeCsvBytes(cp1252(`${HEADER}\r\nCasing,casing,2 1/2",11/16",Érable,C-1,9.10\r\n`));
    expect(decoded).toMatchObject({ ok: true, encoding: "Windows-1252" });
    const read = readItemsCsv(decoded.ok ? decoded.text : "");
    expect(read.rows[0]?.item?.species).toBe("Érable");
  });

  it("keeps UTF-8 as UTF-8 (with or without the byte-order mark) and honours a UTF-16 byte-order mark", () => {
    const text = `${HEADER}\nCasing,casing,2 1/2",11/16",Érable,C-1,9.10\n`;
    expect(decodeCsvBytes(new TextEncoder().encode(text))).toEqual({ ok: true, encoding: "UTF-8", text });
    expect(decodeCsvBytes(new TextEncoder().encode(`\uFEFF${text}`))).toMatchObject({ ok: true, encoding: "UTF-8", text });
    expect(decodeCsvBytes(utf16le(text))).toEqual({ ok: true, encoding: "UTF-16LE", text });
  });

  it("refuses bytes that are no spreadsheet's text, asking for UTF-8", () => {
    expect(decodeCsvBytes(Uint8Array.from([0x6e, 0x61, 0x00, 0x81, 0x02]))).toEqual({ ok: false, message: expect.stringMatching(/CSV UTF-8/) });
  });

  it("refuses text that already lost its letters (U+FFFD) rather than importing \"�rable\"", () => {
    const read = readItemsCsv(`${HEADER}\nCasing,casing,2 1/2",11/16",\uFFFDrable,C-1,9.10\n`);
    expect(read.rows).toEqual([]);
    expect(read.fileErrors).toEqual([{ line: 2, message: expect.stringMatching(/could not be read .*CSV UTF-8/) }]);
  });
});

describe("tab-separated files", () => {
  it("are read like CSV, with a note, instead of failing on one unknown column", () => {
    const tsv = `${HEADER.replaceAll(",", "\t")}\nCasing, colonial\tcasing\t2 1/2"\t11/16"\tPoplar\tC-1\t9.10\n`;
    const read = readItemsCsv(tsv);
    expect(read.fileErrors).toEqual([]);
    expect(read.fileNotes).toEqual([{ line: 1, message: expect.stringMatching(/tab-separated/) }]);
    expect(read.rows[0]?.item).toMatchObject({ name: "Casing, colonial", faceWidth: 2.5, thickness: 0.6875, stock: [{ length: 96, price: 9.1 }] });
  });
});

describe("metric values", () => {
  it("are rounded to the nearest 1/16\" and each rounding is said", () => {
    const read = readItemsCsv(`name,kind,face_width,thickness,species,supplier_code,price 2400 mm\nMetric casing,casing,64 mm,18 mm,Beech,M-1,12.00\n`);
    expect(read.fileErrors).toEqual([]);
    expect(read.rows[0]?.item).toMatchObject({ faceWidth: 2.5, thickness: 0.6875, stock: [{ length: 94.5, price: 12 }] });
    expect(read.rows[0]?.notes).toEqual([
      'Face width 64 mm read as 2 1/2" (rounded to the nearest 1/16").',
      'Thickness 18 mm read as 11/16" (rounded to the nearest 1/16").',
    ]);
    expect(read.fileNotes).toEqual([{ line: 1, message: `Column "price 2400 mm": 2400 mm read as 94 1/2" (rounded to the nearest 1/16").` }]);
  });

  it("leaves inch values exactly as written", () => {
    const read = readItemsCsv(`${HEADER}\nCasing,casing,2 1/2",3/32",,,9.10\n`);
    expect(read.rows[0]?.item).toMatchObject({ faceWidth: 2.5, thickness: 3 / 32 });
    expect(read.rows[0]?.notes).toEqual([]);
  });
});
