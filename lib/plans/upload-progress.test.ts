import { createHash } from "node:crypto";
import { describe, expect, it } from "vitest";
import { bytesText, fileDigest, uploadPercent } from "./upload-progress";

describe("uploadPercent", () => {
  it.each([
    [0, 0, null], // an empty file: no NaN%
    [0, 2048, 0],
    [1024, 2048, 50],
    [2047, 2048, 99], // never shows 100% before the last byte
    [4096, 2048, 100], // a chunk counted twice does not pass 100
    [Number.NaN, 2048, null],
    [-5, 2048, 0],
  ])("%d of %d bytes → %s", (loaded, size, expected) => {
    expect(uploadPercent(loaded, size)).toBe(expected);
  });
});

describe("bytesText", () => {
  it.each([
    [0, "0 B"],
    [2048, "2.0 KB"],
    [1536 * 1024, "1.5 MB"],
    [200 * 1024 * 1024, "200 MB"],
  ])("%d → %s", (n, text) => expect(bytesText(n)).toBe(text));
});

it("fileDigest is the SHA-256 the server computes (node:crypto)", async () => {
  const bytes = new TextEncoder().encode("%PDF-1.7 plan set");
  expect(await fileDigest(new Blob([bytes]))).toBe(createHash("sha256").update(bytes).digest("hex"));
});
