import { expect, it } from "vitest";
import { computeTakeoff } from "@/takeoff";
import { testInputs, testPrices } from "@/takeoff/testing/job-fixtures";
import { bidSummaryPdf } from "./bid-pdf";
import { usd } from "./format";

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

it("a takeoff priced with placeholders prints as a draft, naming each placeholder", async () => {
  // A 9" setback needs a 10" stool and 9" extension stock; the test book's widest are 5 1/4 and 5 1/2.
  const inputs = testInputs({
    allowPlaceholders: true,
    openingTypes: [{ id: "m", mark: "M", width: 40, height: 60, setback: 9, trimSpec: { style: "stool-and-apron", casingWidth: 2.5, casingThickness: 0.6875 } }],
    counts: { perUnit: {}, commonAreas: { m: 2 }, job: { m: 2 } },
  });
  const result = await computeTakeoff(inputs, testPrices());
  const doc = { orgName: "Birchmoor", project: { name: "Job", generalContractor: null, bidDue: null }, takeoffName: "t", priceBookName: "b", pricesAsOf: new Date(), issuedAt: new Date(), validDays: 30 };
  const text = await pdfText(await bidSummaryPdf({ ...doc, result }));
  expect(text).toContain("DRAFT — NOT A BID: some prices are placeholders");
  expect(text).toContain('stool 10" wide (not in the price book) for M, priced at the rate per foot of “Stool 5 1/4 poplar”');
  expect(text).toContain("Bid total (with placeholder prices)");
  const clean = await pdfText(await bidSummaryPdf({ ...doc, result: await computeTakeoff(testInputs(), testPrices()) }));
  expect(clean).not.toContain("DRAFT");
});

it("prints money through the one formatter: to the cent, thousands separated, never -$0.00", async () => {
  const computed = await computeTakeoff(testInputs(), testPrices());
  // A remainder below half a cent either side of zero prints as $0.00 (toLocaleString wrote -$0.00).
  const result = { ...computed, bid: { ...computed.bid, markup: -0.001, tax: 1.005, total: 1234567.5 } };
  const doc = { orgName: "Birchmoor", project: { name: "Job", generalContractor: null, bidDue: null }, takeoffName: "t", priceBookName: "b", pricesAsOf: new Date(), issuedAt: new Date(), validDays: 30 };
  const text = await pdfText(await bidSummaryPdf({ ...doc, result }));
  expect(text).not.toContain("-$0.00");
  expect(text).toContain("$1.01");
  expect(text).toContain("$1,234,567.50");
  expect(text).toContain(usd(result.bid.material));
});
