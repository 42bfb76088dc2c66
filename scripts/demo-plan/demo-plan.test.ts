import { beforeAll, describe, expect, it } from "vitest";
import { parseLength } from "@/takeoff";
import { inspectPdf } from "@/lib/pdf/inspect";
import { distance, inchesPerUnitFromScale } from "@/lib/plans/calibration";
import { generatePlanSet, type GeneratedSheet, type GeneratedWindow } from "./index";
import { TICK_WEIGHT } from "./annotate";
import { WEIGHTS } from "./draw-plan";
import { openPdf, strokesOf, textOf, type StrokeSegment } from "./testing/pdf-reading";

const EPS = 0.01;
const near = (a: number, b: number, eps = EPS) => Math.abs(a - b) <= eps;

/**
 * True when the drawn walls break exactly around the window's rough opening: wall faces on both sides of
 * the point, equidistant, ending at one jamb and resuming at the other; the three-line symbol spans the
 * opening; and one of the faces is the building's outline (so the wall is exterior).
 */
function windowInExteriorWall(segments: StrokeSegment[], w: GeneratedWindow, unitsPerInch: number): boolean {
  const half = (w.widthInches * unitsPerInch) / 2;
  const walls = segments.filter((s) => near(s.width, WEIGHTS.wall));
  const glazing = segments.filter((s) => near(s.width, WEIGHTS.window));
  for (const horizontal of [true, false]) {
    const parallel = (s: StrokeSegment) => (horizontal ? near(s.y1, s.y2) : near(s.x1, s.x2));
    const fixed = (s: StrokeSegment) => (horizontal ? s.y1 : s.x1);
    const span = (s: StrokeSegment) => (horizontal ? [Math.min(s.x1, s.x2), Math.max(s.x1, s.x2)] : [Math.min(s.y1, s.y2), Math.max(s.y1, s.y2)]);
    const c = horizontal ? w.x : w.y;
    const f = horizontal ? w.y : w.x;
    const wallFaces = walls.filter(parallel);
    const endsAtJamb = wallFaces.filter((s) => near(span(s)[1] ?? NaN, c - half)).map(fixed);
    const startsAtJamb = wallFaces.filter((s) => near(span(s)[0] ?? NaN, c + half)).map(fixed);
    const outline = [Math.min(...wallFaces.map(fixed)), Math.max(...wallFaces.map(fixed))];
    for (const low of endsAtJamb.filter((v) => v < f - EPS)) {
      const d = f - low;
      const high = f + d;
      if (!endsAtJamb.some((v) => near(v, high)) || !startsAtJamb.some((v) => near(v, low)) || !startsAtJamb.some((v) => near(v, high))) continue;
      const lines = [low, f, high].every((at) =>
        glazing.some((s) => parallel(s) && near(fixed(s), at) && near(span(s)[0] ?? NaN, c - half) && near(span(s)[1] ?? NaN, c + half)),
      );
      const exterior = outline.some((o) => near(o, low) || near(o, high));
      if (lines && exterior) return true;
    }
  }
  return false;
}

async function checkSheetDrawing(bytes: Uint8Array, sheets: GeneratedSheet[]): Promise<void> {
  const doc = await openPdf(bytes);
  try {
    for (const sheet of sheets) {
      const page = await doc.getPage(sheet.pageNumber);
      const { segments } = await strokesOf(page);
      const unitsPerInch = 1 / inchesPerUnitFromScale(sheet.scaleRatio, sheet.userUnit);
      for (const w of sheet.windows) expect(windowInExteriorWall(segments, w, unitsPerInch), `${sheet.label} ${w.mark} at ${w.x},${w.y}`).toBe(true);

      // The known dimension: tick marks drawn at both stated ends, and the text over it reads the stated length.
      const k = sheet.knownDimension;
      const ticks = segments.filter((s) => near(s.width, TICK_WEIGHT)).map((s) => ({ x: (s.x1 + s.x2) / 2, y: (s.y1 + s.y2) / 2 }));
      for (const end of [{ x: k.ax, y: k.ay }, { x: k.bx, y: k.by }]) expect(ticks.some((t) => distance(t, end) < EPS)).toBe(true);
      const mid = { x: (k.ax + k.bx) / 2, y: (k.ay + k.by) / 2 };
      const text = await textOf(page);
      const label = text.find((t) => distance(t, mid) < 20 && /'-/.test(t.str));
      expect(label, `${sheet.label} dimension text`).toBeDefined();
      expect(parseLength(label?.str ?? "")).toBeCloseTo(k.inches, 9);

      // Each window has its mark written near it.
      for (const w of sheet.windows) expect(text.some((t) => t.str === w.mark && distance(t, w) < 60 / sheet.userUnit)).toBe(true);
    }
  } finally {
    await doc.destroy();
  }
}

describe("generatePlanSet — default set", () => {
  let set: Awaited<ReturnType<typeof generatePlanSet>>;
  beforeAll(async () => {
    set = await generatePlanSet();
  });

  it("has a common-area sheet and three unit-type sheets on ARCH D at 1/4\" = 1'-0\"", async () => {
    expect(set.sheets.map((s) => [s.label, s.unitTypeName])).toEqual([
      ["A-101", null],
      ["A-201", "Type A"],
      ["A-202", "Type B"],
      ["A-203", "Type C"],
    ]);
    const inspection = await inspectPdf(set.bytes);
    expect(inspection.pageCount).toBe(4);
    for (const p of inspection.pages) expect([p.width, p.height, p.rotation, p.userUnit]).toEqual([2592, 1728, 0, 1]);
    expect(inspection.pages.map((p) => p.label)).toEqual(set.sheets.map((s) => s.label));
    expect(set.sheets.every((s) => s.scaleRatio === 48)).toBe(true);
  });

  it("states each known dimension at the drawn length: distance × (48 / 72) in/unit = stated inches", () => {
    // ISO 32000-1 §8.3.2.3: a unit is 1/72 in; at 1/4" = 1'-0" one paper inch is 48 real inches.
    for (const s of set.sheets) {
      const k = s.knownDimension;
      expect(distance({ x: k.ax, y: k.ay }, { x: k.bx, y: k.by }) * (48 / 72)).toBeCloseTo(k.inches, 9);
    }
    expect(set.sheets.map((s) => s.knownDimension.inches)).toEqual([
      parseLength(`58'-3 1/4"`),
      parseLength(`38'-7 1/2"`),
      parseLength(`27'-10 1/2"`),
      parseLength(`22'-4 3/4"`),
    ]);
  });

  it("draws every window in an exterior wall at its rough-opening width, with its mark, and the dimension text it states", async () => {
    expect(set.sheets.map((s) => s.windows.length)).toEqual([7, 7, 5, 4]);
    await checkSheetDrawing(set.bytes, set.sheets);
  });

  it("is deterministic, so the demo seed can rely on positions", async () => {
    const again = await generatePlanSet();
    expect(Buffer.from(again.bytes).equals(Buffer.from(set.bytes))).toBe(true);
  });
});

describe("generatePlanSet — options", () => {
  it("keeps a rotated sheet's drawing where it displays on the unrotated one", async () => {
    const { bytes, sheets } = await generatePlanSet({ unitTypes: ["A"], commonArea: false, pages: 4, rotate: [0, 90, 180, 270] });
    const inspection = await inspectPdf(bytes);
    expect(inspection.pages.map((p) => [p.rotation, p.width, p.height, p.label])).toEqual([
      [0, 2592, 1728, "A-201"],
      [90, 1728, 2592, "A-301"],
      [180, 2592, 1728, "A-302"],
      [270, 1728, 2592, "A-303"],
    ]);
    const doc = await openPdf(bytes);
    const shown: number[][][] = [];
    for (const s of sheets) {
      const viewport = (await doc.getPage(s.pageNumber)).getViewport({ scale: 1 });
      shown.push(s.windows.map((w) => viewport.convertToViewportPoint(w.x, w.y)));
    }
    await doc.destroy();
    for (const view of shown.slice(1)) view.forEach((pt, i) => pt.forEach((v, j) => expect(v).toBeCloseTo(shown[0]?.[i]?.[j] ?? NaN, 6)));
    await checkSheetDrawing(bytes, sheets);
  });

  it("draws a UserUnit 2 sheet at half the units, same physical size and scale", async () => {
    const { bytes, sheets } = await generatePlanSet({ unitTypes: ["B"], commonArea: false, userUnit: 2 });
    const [page] = (await inspectPdf(bytes)).pages;
    expect(page).toMatchObject({ width: 1296, height: 864, userUnit: 2, label: "A-201" });
    const k = sheets[0]!.knownDimension;
    // ISO 32000-1 §14.11.2: a unit is UserUnit/72 in, so 1/4" = 1'-0" gives 48 × 2 / 72 in per unit.
    expect(distance({ x: k.ax, y: k.ay }, { x: k.bx, y: k.by }) * inchesPerUnitFromScale(48, 2)).toBeCloseTo(334.5, 9);
    await checkSheetDrawing(bytes, sheets);
  });

  it("adds exactly the requested number of extra paths", async () => {
    const plain = await generatePlanSet({ unitTypes: ["C"], commonArea: false });
    const dense = await generatePlanSet({ unitTypes: ["C"], commonArea: false, dense: 3000 });
    const count = async (bytes: Uint8Array) => {
      const doc = await openPdf(bytes);
      const n = (await strokesOf(await doc.getPage(1))).strokeCount;
      await doc.destroy();
      return n;
    };
    expect((await count(dense.bytes)) - (await count(plain.bytes))).toBe(3000);
  });

  it("repeats sheets as further levels for a 50-page set with unique labels", async () => {
    const { bytes, sheets } = await generatePlanSet({ pages: 50 });
    // Labels on repeated sheets are read back by inspectPdf in the rotation test (A-301 …); here the count.
    const doc = await openPdf(bytes);
    expect(doc.numPages).toBe(50);
    await doc.destroy();
    const labels = sheets.map((s) => s.label);
    expect(new Set(labels).size).toBe(50);
    expect(labels.at(-1)).toBe("A-346");
    expect(labels.slice(0, 6)).toEqual(["A-101", "A-201", "A-202", "A-203", "A-301", "A-302"]);
    expect(sheets[4]?.title).toBe("LEVEL 2 — COMMON AREAS PLAN");
  });

  it("refuses options it cannot draw", async () => {
    await expect(generatePlanSet({ unitTypes: [] })).rejects.toThrow(RangeError);
    await expect(generatePlanSet({ unitTypes: ["A", "A"] })).rejects.toThrow(RangeError);
    await expect(generatePlanSet({ pages: 0 })).rejects.toThrow(RangeError);
    await expect(generatePlanSet({ dense: -1 })).rejects.toThrow(RangeError);
    await expect(generatePlanSet({ userUnit: 0 })).rejects.toThrow(RangeError);
  });
});
