import { expect, it } from "vitest";
import { computeTakeoff } from "./compute";
import { testInputs, testPrices } from "./fixtures";
import { bidSummaryPdf } from "./bid-pdf";

/** Reads a page's text back with pdf.js, the reader the product already ships. */
async function pdfText(bytes: Uint8Array) {
  const pdfjs = await import("pdfjs-dist/legacy/build/pdf.mjs");
  const doc = await pdfjs.getDocument({ data: bytes, isEvalSupported: false, standardFontDataUrl: "node_modules/pdfjs-dist/standard_fonts/" }).promise;
  const page = await doc.getPage(1);
  const content = await page.getTextContent();
  return content.items.map((i) => ("str" in i ? i.str : "")).join(" ");
}

it("states the organisation, project, scope, totals, exclusions, assumptions and validity", async () => {
  const result = await computeTakeoff(testInputs(), testPrices());
  const bytes = await bidSummaryPdf({
    orgName: "Birchmoor Finish Carpentry",
    project: { name: "Larkspur Commons — Building C", generalContractor: "Fenwick & Hale Builders", bidDue: "2027-02-12" },
    takeoffName: "Base bid",
    priceBookName: "Test book",
    pricesAsOf: new Date("2026-12-01T00:00:00Z"),
    result,
    issuedAt: new Date("2026-12-01T00:00:00Z"),
    validDays: 30,
  });
  const text = await pdfText(bytes);
  for (const expected of [
    "Birchmoor Finish Carpentry",
    "Larkspur Commons — Building C",
    "Fenwick & Hale Builders",
    "Valid until: December 31, 2026",
    `at ${result.openingsTotal} windows`,
    "W1 × 23",
    "Exclusions",
    "Assumptions",
    result.bid.total.toLocaleString("en-US", { style: "currency", currency: "USD" }),
    "does not certify compliance",
  ]) {
    expect(text).toContain(expected);
  }
});

it("prints characters outside the standard fonts as ? instead of failing", async () => {
  const result = await computeTakeoff(testInputs(), testPrices());
  const bytes = await bidSummaryPdf({
    orgName: "Łódź Trim 木工",
    project: { name: "Job", generalContractor: null, bidDue: null },
    takeoffName: "t",
    priceBookName: "b",
    pricesAsOf: new Date(),
    result,
    issuedAt: new Date(),
    validDays: 30,
  });
  expect(await pdfText(bytes)).toContain("?ód? Trim ??");
});
