import { beforeAll, describe, expect, it } from "vitest";
import { computeTakeoff } from "@/takeoff";
import { costBreakdown, layoutBar } from "./cost-breakdown";
import { textWidth } from "./elevation-callouts";
import { testInputs, testPrices } from "@/takeoff/testing/job-fixtures";
import type { TakeoffResult } from "@/takeoff";

let result: TakeoffResult;
beforeAll(async () => {
  result = await computeTakeoff(testInputs(), testPrices());
});

describe("costBreakdown", () => {
  it("splits the bid into material by kind, labour, markup and tax that add up to the total", () => {
    const parts = costBreakdown(result);
    expect(parts.map((p) => p.key)).toEqual(["casing", "stool", "apron", "extension", "labour", "markup", "tax"]);
    const sum = parts.reduce((t, p) => t + p.amount, 0);
    expect(sum).toBeCloseTo(result.bid.total, 1);
    expect(parts.reduce((t, p) => t + p.share, 0)).toBeCloseTo(1, 9);
    const material = parts.filter((p) => !["labour", "markup", "tax"].includes(p.key)).reduce((t, p) => t + p.amount, 0);
    expect(material).toBeCloseTo(result.bid.material, 1);
  });

  it("leaves out what costs nothing (no tax when the rate is nil)", async () => {
    const prices = { ...testPrices(), taxRate: 0 };
    const parts = costBreakdown(await computeTakeoff(testInputs(), prices));
    expect(parts.some((p) => p.key === "tax")).toBe(false);
  });
});

describe("layoutBar", () => {
  it("fills the bar end to end, names wide segments inside and keeps outside labels and leaders apart", () => {
    const placed = layoutBar(costBreakdown(result), 720, 13);
    const last = placed[placed.length - 1]!;
    expect(last.x + last.width).toBeCloseTo(720, 6);
    for (const p of placed.filter((q) => q.inside)) {
      expect(Math.max(textWidth(p.label, 13), textWidth(p.amountText, 13))).toBeLessThan(p.width);
    }
    const outside = placed.filter((p) => !p.inside);
    const span = (p: (typeof placed)[number]) => [p.labelX, p.labelX + textWidth(`${p.label} ${p.amountText}`, 13)] as const;
    for (const a of outside) {
      expect(a.labelX).toBeGreaterThanOrEqual(0);
      for (const b of outside) {
        if (a === b) continue;
        const [a0, a1] = span(a);
        const [b0, b1] = span(b);
        if (a.side === b.side && a.row === b.row) expect(a1 <= b0 || b1 <= a0).toBe(true);
        // A leader runs from its segment down to its own row: it must not cut through a nearer row's label.
        const mid = a.x + a.width / 2;
        if (b.side === a.side && b.row < a.row) expect(mid < b0 || mid > b1).toBe(true);
      }
    }
    expect(placed.find((p) => p.key === "labour")!.amountText).toMatch(/^\$[\d,]+\.\d\d$/);
  });

  it("puts a segment too narrow for its name outside", () => {
    const placed = layoutBar(
      [
        { key: "casing", label: "Casing", amount: 990, share: 0.99 },
        { key: "tax", label: "Tax", amount: 10, share: 0.01 },
      ],
      720,
      13,
    );
    expect(placed.map((p) => p.inside)).toEqual([true, false]);
    expect([placed[1]!.side, placed[1]!.row]).toEqual(["below", 0]);
  });
});
