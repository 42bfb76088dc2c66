import { describe, expect, it } from "vitest";
import { parseCsv } from "@/lib/price-books/csv-grammar";
import { writeCsv } from "./write";

describe("writeCsv", () => {
  it("puts every text cell that a spreadsheet would run behind an apostrophe", () => {
    const csv = writeCsv([["=HYPERLINK(\"http://x.test\")", "+1", "-2+3", "@SUM(A1)", "\tx", "\rx", "plain", "a=b"]]);
    const parsed = parseCsv(csv);
    expect(parsed.ok && parsed.records[0]?.fields).toEqual([`'=HYPERLINK("http://x.test")`, "'+1", "'-2+3", "'@SUM(A1)", "'\tx", "'\rx", "plain", "a=b"]);
  });

  it("writes numbers as numbers, quotes what RFC 4180 needs quoted, ends records with CRLF", () => {
    expect(writeCsv([[-3, 'say "hi", ok', " padded"], ["x"]])).toBe(`-3,"say ""hi"", ok"," padded"\r\nx\r\n`);
  });

  it("starts with a byte-order mark when asked", () => {
    expect(writeCsv([["a"]], { bom: true })).toBe("\uFEFFa\r\n");
  });
});
