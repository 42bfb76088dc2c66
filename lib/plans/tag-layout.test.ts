import { describe, expect, it } from "vitest";
import { duplicateLayouts, normaliseLayout, sameTagLayout, type LayoutTag } from "./tag-layout";

const t = (openingTypeId: string, x: number, y: number): LayoutTag => ({ openingTypeId, x, y });
// A unit plan: two W1 in the living room wall, a W2 in the bedroom, a W3 in the bath.
const plan = [t("W1", 400, 300), t("W1", 520, 300), t("W2", 900, 300), t("W3", 900, 700)];
const moved = (dx: number, dy: number, k = 1) => plan.map((p) => t(p.openingTypeId, p.x * k + dx, p.y * k + dy));

describe("normaliseLayout", () => {
  it("puts the bounding box at the origin with its larger side 1", () => {
    const n = normaliseLayout(plan);
    expect(Math.min(...n.map((p) => p.x))).toBe(0);
    expect(Math.max(...n.map((p) => p.x))).toBe(1);
    expect(Math.max(...n.map((p) => p.y))).toBeCloseTo(0.8);
  });
  it("a single tag normalises to the origin", () => {
    expect(normaliseLayout([t("W1", 5, 9)])).toEqual([{ type: "W1", x: 0, y: 0 }]);
  });
});

describe("sameTagLayout", () => {
  const cases: [string, LayoutTag[], LayoutTag[], boolean][] = [
    ["the same tags", plan, plan, true],
    ["the plan moved on the page", plan, moved(300, -120), true],
    ["an enlarged plan (×2) elsewhere on the page", plan, moved(-500, 40, 2), true],
    ["tags listed in another order", plan, [...plan].reverse(), true],
    ["a tag nudged by 1% of the plan", plan, [t("W1", 405, 302), ...plan.slice(1)], true],
    ["a tag 10% away", plan, [t("W1", 450, 300), ...plan.slice(1)], false],
    ["a missing tag", plan, plan.slice(0, 3), false],
    ["one type swapped for another at the same spot", plan, [...plan.slice(0, 3), t("W4", 900, 700)], false],
    ["two types' places exchanged", plan, [t("W1", 400, 300), t("W1", 520, 300), t("W3", 900, 300), t("W2", 900, 700)], false],
    ["the mirrored plan", plan, plan.map((p) => t(p.openingTypeId, 1300 - p.x, p.y)), false],
    ["no tags on either", [], [], false],
  ];
  it.each(cases)("%s → %s", (_, a, b, same) => {
    expect(sameTagLayout(a, b)).toBe(same);
    expect(sameTagLayout(b, a)).toBe(same);
  });

  it("matches closest pairs first, so a near neighbour cannot take another tag's only partner", () => {
    const a = [t("W1", 0, 0), t("W1", 25, 0), t("W2", 1000, 0)];
    const b = [t("W1", 10, 0), t("W1", 30, 0), t("W2", 1000, 0)];
    expect(sameTagLayout(a, b)).toBe(true);
  });
});

describe("duplicateLayouts", () => {
  it("groups the sheets that repeat one another and leaves the rest out", () => {
    const groups = duplicateLayouts([
      { sheetId: "A-101", tags: plan },
      { sheetId: "A-102", tags: [t("W9", 1, 1), t("W9", 80, 1)] },
      { sheetId: "A-401", tags: moved(0, 0, 3) },
      { sheetId: "A-501", tags: [] },
      { sheetId: "A-601", tags: moved(40, 40) },
    ]);
    expect(groups).toEqual([["A-101", "A-401", "A-601"]]);
  });
});
