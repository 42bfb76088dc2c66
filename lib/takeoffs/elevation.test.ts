import { beforeAll, describe, expect, it } from "vitest";
import { computeTakeoff } from "@/takeoff";
import { elevation, type DrawnPiece } from "./elevation";
import { testInputs, testPrices } from "@/takeoff/testing/job-fixtures";
import type { OpeningTypeResult } from "@/takeoff";

const xs = (p: DrawnPiece) => p.points.map((q) => q.x);
const ys = (p: DrawnPiece) => p.points.map((q) => q.y);
const span = (v: number[]) => Math.max(...v) - Math.min(...v);
const drawn = (e: ReturnType<typeof elevation>, part: DrawnPiece["part"]) => e.pieces.filter((p) => p.part === part);
const cutLength = (ot: OpeningTypeResult, part: string) => ot.cutList.find((p) => p.part === part)!.length;

let fixture: { stoolAndApron: OpeningTypeResult; frame: OpeningTypeResult; items: ReturnType<typeof testPrices>["items"] };
beforeAll(async () => {
  const prices = testPrices();
  const result = await computeTakeoff(testInputs(), prices);
  fixture = { stoolAndApron: result.openingTypes[0]!, frame: result.openingTypes[1]!, items: prices.items };
});
const types = async () => fixture;

describe("elevation of a stool-and-apron window", () => {
  it("draws the stool, apron, legs and head at their cut-list lengths", async () => {
    const { stoolAndApron: ot, items } = await types();
    const e = elevation(ot, items);
    expect(span(xs(drawn(e, "stool")[0]!))).toBeCloseTo(cutLength(ot, "stool"), 9);
    expect(span(xs(drawn(e, "apron")[0]!))).toBeCloseTo(cutLength(ot, "apron"), 9);
    expect(span(xs(drawn(e, "casing-head")[0]!))).toBeCloseTo(cutLength(ot, "casing-head"), 9);
    for (const leg of drawn(e, "casing-leg")) expect(span(ys(leg))).toBeCloseTo(cutLength(ot, "casing-leg"), 9);
  });

  it("stands the legs on the stool and hangs the apron under it, centred on the opening", async () => {
    const { stoolAndApron: ot, items } = await types();
    const e = elevation(ot, items);
    const stool = drawn(e, "stool")[0]!;
    const stoolTop = Math.min(...ys(stool));
    for (const leg of drawn(e, "casing-leg")) {
      expect(Math.max(...ys(leg))).toBeCloseTo(stoolTop, 9);
      // Each leg's foot lies within the stool, with a horn beyond it.
      expect(Math.min(...xs(leg))).toBeGreaterThan(Math.min(...xs(stool)));
      expect(Math.max(...xs(leg))).toBeLessThan(Math.max(...xs(stool)));
    }
    const apron = drawn(e, "apron")[0]!;
    expect(Math.min(...ys(apron))).toBeCloseTo(Math.max(...ys(stool)), 9);
    const mid = (p: DrawnPiece) => (Math.min(...xs(p)) + Math.max(...xs(p))) / 2;
    expect(mid(stool)).toBeCloseTo(ot.opening.width / 2, 9);
    expect(mid(apron)).toBeCloseTo(ot.opening.width / 2, 9);
  });

  it("meets the head and legs at their long points: the head spans the legs' outer edges", async () => {
    const { stoolAndApron: ot, items } = await types();
    const e = elevation(ot, items);
    const legs = drawn(e, "casing-leg");
    const head = drawn(e, "casing-head")[0]!;
    expect(Math.min(...xs(head))).toBeCloseTo(Math.min(...legs.flatMap(xs)), 9);
    expect(Math.max(...xs(head))).toBeCloseTo(Math.max(...legs.flatMap(xs)), 9);
    expect(Math.min(...ys(head))).toBeCloseTo(Math.min(...legs.flatMap(ys)), 9);
  });

  it("dimensions carry the cut-list values, and extensions are drawn as hidden lines", async () => {
    const { stoolAndApron: ot, items } = await types();
    const e = elevation(ot, items);
    const dim = (key: string) => e.dimensions.find((d) => d.key === key)!;
    expect(dim("stool").value).toBe(cutLength(ot, "stool"));
    expect(dim("stool").to - dim("stool").from).toBeCloseTo(cutLength(ot, "stool"), 9);
    expect(dim("apron").value).toBe(cutLength(ot, "apron"));
    expect(dim("leg").to - dim("leg").from).toBeCloseTo(cutLength(ot, "casing-leg"), 9);
    expect(dim("casing-width").value).toBe(cutLength(ot, "casing-head"));
    const ext = e.pieces.filter((p) => p.part.startsWith("extension"));
    expect(ext).toHaveLength(3);
    expect(ext.every((p) => p.hidden)).toBe(true);
  });

  it("names every piece once, in a column that keeps the names apart", async () => {
    const { stoolAndApron: ot, items } = await types();
    const e = elevation(ot, items);
    expect(e.callouts.map((c) => c.text).sort()).toEqual(
      ["Apron", "Apron return ×2", "Casing head", "Casing leg ×2", "Jamb extension, head", "Jamb extension, side ×2", "Stool"].sort(),
    );
    const heights = e.callouts.map((c) => c.y);
    for (let i = 1; i < heights.length; i++) expect(heights[i]! - heights[i - 1]!).toBeGreaterThanOrEqual(1.7 * e.unit - 1e-9);
  });

  it("leaves out extensions when the window has no setback", async () => {
    const { stoolAndApron, items } = await types();
    const ot = { ...stoolAndApron, cutList: stoolAndApron.cutList.filter((p) => p.material !== "extension") };
    expect(elevation(ot, items).pieces.some((p) => p.hidden)).toBe(false);
  });
});

describe("elevation of a picture-frame window", () => {
  it("draws four mitered casings at their cut-list lengths that close the frame", async () => {
    const { frame: ot, items } = await types();
    const e = elevation(ot, items);
    const casings = e.pieces.filter((p) => p.part.startsWith("casing"));
    expect(casings.map((p) => p.part).sort()).toEqual(["casing-bottom", "casing-head", "casing-leg", "casing-leg"]);
    for (const leg of drawn(e, "casing-leg")) expect(span(ys(leg))).toBeCloseTo(cutLength(ot, "casing-leg"), 9);
    const head = drawn(e, "casing-head")[0]!;
    const bottom = drawn(e, "casing-bottom")[0]!;
    expect(span(xs(bottom))).toBeCloseTo(cutLength(ot, "casing-bottom"), 9);
    // Outer corners coincide: the frame closes.
    const legs = drawn(e, "casing-leg");
    expect(Math.min(...ys(head))).toBeCloseTo(Math.min(...legs.flatMap(ys)), 9);
    expect(Math.max(...ys(bottom))).toBeCloseTo(Math.max(...legs.flatMap(ys)), 9);
    expect(e.dimensions.map((d) => d.key)).toEqual(["casing-width", "leg"]);
    expect(drawn(e, "stool")).toHaveLength(0);
  });
});
