import { readFileSync } from "node:fs";
import { PDFDocument, PDFName, PDFNumber, StandardFonts, degrees } from "pdf-lib";
import { deflateSync } from "node:zlib";
import { beforeAll, describe, expect, it } from "vitest";
import { inspectPdf, PdfRejected, type PdfRejectReason } from "./inspect";

/**
 * Encrypted fixtures were made once with Debian's qpdf 11.3 from a one-page pdf-lib file (see
 * tests/fixtures/README.md): AES-256 with user password "open-sesame", and AES-256 with an owner password only.
 */
const fixture = (name: string) => new Uint8Array(readFileSync(new URL(`../../tests/fixtures/${name}`, import.meta.url)));

async function rejection(bytes: Uint8Array, limits?: Parameters<typeof inspectPdf>[1]): Promise<PdfRejected> {
  try {
    await inspectPdf(bytes, limits);
  } catch (error) {
    if (error instanceof PdfRejected) return error;
    throw error;
  }
  throw new Error("expected the PDF to be rejected");
}

async function expectRejected(bytes: Uint8Array, reason: PdfRejectReason, limits?: Parameters<typeof inspectPdf>[1]) {
  const error = await rejection(bytes, limits);
  expect(error.reason).toBe(reason);
  expect(error.message.length).toBeGreaterThan(10);
  return error;
}

/**
 * Five pages: letter portrait; ARCH D with /Rotate 90 and its title block bottom-right as displayed;
 * a UserUnit 2 sheet; a crop box inside the media box; /Rotate -90 (which means 270).
 */
async function mixedSet(): Promise<Uint8Array> {
  const doc = await PDFDocument.create();
  const font = await doc.embedFont(StandardFonts.HelveticaBold);
  doc.addPage([612, 792]).drawText("COVER", { x: 72, y: 700, size: 24, font });

  const turned = doc.addPage([1728, 2592]);
  turned.setRotation(degrees(90));
  // Shown turned a quarter clockwise, user (x, y) appears at (y, 1728 - x) (y up): A-301 ends up
  // bottom-right as displayed, A-999 bottom-left — though A-999 is the bottom-right one in user space.
  turned.drawText("A-301", { x: 1680, y: 2450, size: 36, font, rotate: degrees(90) });
  turned.drawText("A-999", { x: 1680, y: 60, size: 36, font, rotate: degrees(90) });
  turned.drawText("SEE 3/A-501 AND A-502", { x: 900, y: 1300, size: 8, font });

  const big = doc.addPage([1296, 864]);
  big.node.set(PDFName.of("UserUnit"), PDFNumber.of(2));
  big.drawText("A2.01", { x: 1180, y: 20, size: 18, font });

  const cropped = doc.addPage([2592, 1728]);
  cropped.setCropBox(36, 36, 2520, 1656); // x, y, width, height
  cropped.drawText("A-101.1", { x: 2300, y: 60, size: 30, font });

  doc.addPage([792, 612]).setRotation(degrees(-90));
  return doc.save();
}

/** One page whose content stream is `decodedBytes` of harmless operators, flate-compressed. */
async function inflatingPdf(decodedBytes: number, dict: Record<string, string> = {}): Promise<Uint8Array> {
  const doc = await PDFDocument.create();
  const page = doc.addPage([612, 792]);
  const content = deflateSync(Buffer.alloc(decodedBytes, " q Q\n"), { level: 9 });
  const stream = doc.context.stream(content, { Filter: "FlateDecode", ...dict });
  page.node.set(PDFName.of("Contents"), doc.context.register(stream));
  return doc.save({ useObjectStreams: false });
}

describe("inspectPdf", () => {
  let good: Uint8Array;
  beforeAll(async () => {
    good = await mixedSet();
  });

  it("reads size, rotation, UserUnit and sheet number of every page", async () => {
    const result = await inspectPdf(good);
    expect(result).toEqual({
      pageCount: 5,
      pages: [
        { pageNumber: 1, width: 612, height: 792, rotation: 0, userUnit: 1, label: null },
        { pageNumber: 2, width: 1728, height: 2592, rotation: 90, userUnit: 1, label: "A-301" },
        { pageNumber: 3, width: 1296, height: 864, rotation: 0, userUnit: 2, label: "A2.01" },
        { pageNumber: 4, width: 2520, height: 1656, rotation: 0, userUnit: 1, label: "A-101.1" },
        { pageNumber: 5, width: 792, height: 612, rotation: 270, userUnit: 1, label: null },
      ],
    });
  });

  it("leaves the caller's bytes usable (pdf.js transfers the buffer it is given)", async () => {
    const copy = good.slice();
    await inspectPdf(copy);
    expect(copy.byteLength).toBe(good.byteLength);
    expect(Buffer.from(copy).equals(Buffer.from(good))).toBe(true);
  });

  it("refuses a file that is not a PDF", async () => {
    await expectRejected(new TextEncoder().encode("hello, this is a text file"), "not-pdf");
    await expectRejected(new Uint8Array([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]), "not-pdf");
    await expectRejected(new Uint8Array(0), "not-pdf");
  });

  it("refuses a file cut short", async () => {
    const error = await expectRejected(good.slice(0, Math.floor(good.length / 2)), "truncated");
    expect(error.message).toMatch(/incomplete/);
  });

  it("refuses garbage behind a PDF header quickly, with or without an end marker", async () => {
    // Deterministic noise (xorshift32), so a failure can be reproduced.
    let s = 0x9e3779b9;
    const noise = new Uint8Array(256 * 1024).map(() => {
      s ^= s << 13;
      s ^= s >>> 17;
      s ^= s << 5;
      return s & 0xff;
    });
    const header = new TextEncoder().encode("%PDF-1.7\n");
    const eof = new TextEncoder().encode("\n%%EOF\n");
    await expectRejected(new Uint8Array([...header, ...noise]), "truncated");
    await expectRejected(new Uint8Array([...header, ...noise, ...eof]), "damaged");
  });

  it("refuses a password-protected PDF", async () => {
    const error = await expectRejected(fixture("encrypted-user-password.pdf"), "encrypted");
    expect(error.message).toMatch(/password/);
  });

  it("accepts a PDF encrypted only against editing (no password to open)", async () => {
    const result = await inspectPdf(fixture("encrypted-owner-only.pdf"));
    expect(result.pages).toEqual([{ pageNumber: 1, width: 612, height: 396, rotation: 0, userUnit: 1, label: "A-101" }]);
  });

  it("refuses a PDF with no pages", async () => {
    const empty = await (await PDFDocument.create()).save({ addDefaultPage: false });
    await expectRejected(empty, "empty");
  });

  it("refuses a file over the size limit before parsing it", async () => {
    const error = await expectRejected(good, "too-large", { maxBytes: 1000 });
    expect(error.message).toMatch(/limit is 1 KB/);
    // Not a PDF either, but size is checked first: nothing of an oversized upload is parsed.
    await expectRejected(new Uint8Array(2000), "too-large", { maxBytes: 1000 });
  });

  it("refuses more pages than the limit", async () => {
    const error = await expectRejected(good, "too-many-pages", { maxPages: 4 });
    expect(error.message).toMatch(/5 pages; the limit is 4/);
    expect((await inspectPdf(good, { maxPages: 5 })).pageCount).toBe(5);
  });

  it("refuses a decompression bomb before pdf.js inflates it, naming the cap", async () => {
    const bomb = await inflatingPdf(3 * 1024 * 1024);
    expect(bomb.byteLength).toBeLessThan(64 * 1024);
    const error = await expectRejected(bomb, "decoded-too-large", { maxDecodedStreamBytes: 1024 * 1024 });
    expect(error.message).toMatch(/more than 1 MB/);
    // Under the cap the same file is an ordinary one-page set.
    expect((await inspectPdf(bomb, { maxDecodedStreamBytes: 4 * 1024 * 1024 })).pageCount).toBe(1);
  });

  it("counts content streams against the whole-file cap, but not images", async () => {
    await expectRejected(await inflatingPdf(2 * 1024 * 1024), "decoded-too-large", { maxDecodedBytes: 1024 * 1024 });
    const image = await inflatingPdf(2 * 1024 * 1024, { Subtype: "Image" });
    expect((await inspectPdf(image, { maxDecodedBytes: 1024 * 1024 })).pageCount).toBe(1);
  });

  it("stops when the time budget is spent", async () => {
    await expectRejected(good, "too-slow", { timeoutMs: 0 });
  });
});
