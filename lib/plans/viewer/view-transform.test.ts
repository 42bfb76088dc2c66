import { describe, expect, it } from "vitest";
import { ACTUAL_SIZE_ZOOM, MAX_ZOOM, clampPan, fitPage, fitWidth, wheelFactor, zoomAt, zoomPercent } from "./view-transform";
import { MAX_CANVAS_PIXELS, baseRenderScale, detailRegion } from "./render-plan";

const ARCH_E = { width: 3456, height: 2592 };
const box = { width: 1000, height: 700 };

describe("view transform", () => {
  it("fits the width with a margin each side", () => {
    const v = fitWidth(ARCH_E, box);
    expect(ARCH_E.width * v.zoom + 2 * v.x).toBeCloseTo(box.width);
  });

  it("fits the whole page, centred", () => {
    const v = fitPage(ARCH_E, box);
    expect(ARCH_E.height * v.zoom).toBeLessThanOrEqual(box.height);
    expect(v.x * 2 + ARCH_E.width * v.zoom).toBeCloseTo(box.width);
  });

  it("calls the paper's real size 100%", () => {
    expect(zoomPercent(ACTUAL_SIZE_ZOOM)).toBe(100);
  });

  it("keeps the anchor still and stops at the zoom limits", () => {
    const v = zoomAt({ zoom: 1, x: 10, y: 20 }, 2, { x: 110, y: 220 }, ARCH_E, box);
    expect((110 - v.x) / v.zoom).toBeCloseTo(100);
    expect((220 - v.y) / v.zoom).toBeCloseTo(200);
    expect(zoomAt({ zoom: 1, x: 0, y: 0 }, 1e6, { x: 0, y: 0 }, ARCH_E, box).zoom).toBe(MAX_ZOOM);
    expect(zoomAt({ zoom: 1, x: 0, y: 0 }, 1e-6, { x: 0, y: 0 }, ARCH_E, box).zoom).toBeGreaterThan(0);
  });

  it("never lets the page be dragged out of sight", () => {
    const v = clampPan({ zoom: 1, x: -1e6, y: 1e6 }, ARCH_E, box);
    expect(v.x + ARCH_E.width).toBeGreaterThan(0);
    expect(v.y).toBeLessThan(box.height);
  });

  it("zooms in on wheel up and out on wheel down, by the same factor", () => {
    expect(wheelFactor(-100, 0)).toBeGreaterThan(1);
    expect(wheelFactor(100, 0) * wheelFactor(-100, 0)).toBeCloseTo(1);
    expect(wheelFactor(3, 1)).toBeCloseTo(wheelFactor(48, 0));
  });
});

describe("render plan", () => {
  it("renders the whole page at the zoom while it fits under the cap", () => {
    expect(baseRenderScale(ARCH_E, 0.2, 2)).toBe(0.2);
  });

  it("caps the base bitmap of an ARCH E sheet at 100% on a 2x screen", () => {
    const s = baseRenderScale(ARCH_E, ACTUAL_SIZE_ZOOM, 2);
    expect(s).toBeLessThan(ACTUAL_SIZE_ZOOM);
    expect(ARCH_E.width * ARCH_E.height * (s * 2) ** 2).toBeCloseTo(MAX_CANVAS_PIXELS, -2);
  });

  it("asks for a sharp tile of only the region in view when the base is capped", () => {
    const view = { zoom: 4, x: -5000, y: -3000 };
    const r = detailRegion(view, ARCH_E, box, 1)!;
    expect(r).toEqual({ zoom: 4, left: 5000, top: 3000, width: 1000, height: 700 });
    expect(detailRegion(view, ARCH_E, box, 4)).toBeNull();
    expect(detailRegion({ zoom: 4, x: 2000, y: 0 }, ARCH_E, box, 1)).toBeNull();
  });

  it("clips the tile to the page edge", () => {
    const r = detailRegion({ zoom: 2, x: 100.5, y: -10 }, ARCH_E, box, 1)!;
    expect(r.left).toBe(0);
    expect(r.width).toBe(900);
  });
});
