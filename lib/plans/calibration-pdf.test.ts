/**
 * End to end through pdf.js: a line of known real length on a generated sheet is measured back within
 * 1/16" after going to screen pixels and back at several zooms, rotations and pixel densities — the path
 * a click in the viewer takes. Points are not rounded to whole pixels: at 25 % zoom one CSS pixel is
 * 4 pt = 6 real inches at 1/4" = 1'-0", so click precision is the viewer's concern, not this math's.
 */
import { PDFDocument, PDFName, PDFNumber, rgb } from "pdf-lib";
import { beforeAll, describe, expect, it } from "vitest";
import { parseLength } from "@/takeoff";
import { inchesPerUnitFromPoints, inchesPerUnitFromScale, measureInches, scaleMismatchPercent, type Point } from "./calibration";
import { openPdf, strokesOf, type PdfPage } from "@/scripts/demo-plan/testing/pdf-reading";

const KNOWN = parseLength(`12'-7 1/2"`); // 151.5 in
const RATIO = 48; // 1/4" = 1'-0"
const LINE_WIDTH = 0.55; // unique on the page, to find the line again
const SIXTEENTH = 1 / 16;

/** ARCH D (36 × 24 in = 2592 × 1728 pt) with a diagonal and a horizontal line of KNOWN real length. */
async function sheetWithKnownLines(): Promise<Uint8Array> {
  const doc = await PDFDocument.create();
  for (const userUnit of [1, 2]) {
    const page = doc.addPage([2592 / userUnit, 1728 / userUnit]);
    if (userUnit !== 1) page.node.set(PDFName.of("UserUnit"), PDFNumber.of(userUnit));
    // Paper length KNOWN / RATIO inches = 227.25 pt, in this page's units.
    const units = ((KNOWN / RATIO) * 72) / userUnit;
    const start = { x: 700 / userUnit, y: 500 / userUnit };
    const lines = [
      { start, end: { x: start.x + units * 0.6, y: start.y + units * 0.8 } },
      { start: { x: start.x, y: start.y - 100 / userUnit }, end: { x: start.x + units, y: start.y - 100 / userUnit } },
    ];
    for (const l of lines) page.drawLine({ ...l, thickness: LINE_WIDTH, color: rgb(0, 0, 0) });
  }
  return doc.save();
}

describe("measuring a generated sheet back through pdf.js viewports", () => {
  const pages: { page: PdfPage; lines: [Point, Point][] }[] = [];
  beforeAll(async () => {
    const doc = await openPdf(await sheetWithKnownLines());
    for (let n = 1; n <= doc.numPages; n++) {
      const page = await doc.getPage(n);
      const { segments } = await strokesOf(page);
      const lines = segments
        .filter((s) => Math.abs(s.width - LINE_WIDTH) < 1e-6)
        .map((s): [Point, Point] => [{ x: s.x1, y: s.y1 }, { x: s.x2, y: s.y2 }]);
      pages.push({ page, lines });
    }
    return () => doc.destroy();
  });

  it("finds both lines on both pages, one page with UserUnit 2", () => {
    expect(pages.map((p) => [p.page.userUnit, p.lines.length])).toEqual([
      [1, 2],
      [2, 2],
    ]);
  });

  const zooms = [0.25, 1, 2.5, 6];
  const rotations = [0, 90, 180, 270];
  const densities = [1, 2];

  it.each(zooms.flatMap((zoom) => rotations.map((rotation) => ({ zoom, rotation }))))(
    "zoom $zoom, rotation $rotation: within 1/16 in at device pixel ratio 1 and 2",
    ({ zoom, rotation }) => {
      for (const { page, lines } of pages) {
        const ipu = inchesPerUnitFromScale(RATIO, page.userUnit);
        for (const dpr of densities) {
          // The canvas is drawn at zoom × dpr; pointer events arrive in CSS pixels of the zoom-only viewport.
          const device = page.getViewport({ scale: zoom * dpr, rotation });
          const css = page.getViewport({ scale: zoom, rotation });
          const viaScreen = (p: Point): Point => {
            const [dx = NaN, dy = NaN] = device.convertToViewportPoint(p.x, p.y);
            const [x = NaN, y = NaN] = css.convertToPdfPoint(dx / dpr, dy / dpr);
            return { x, y };
          };
          for (const [a, b] of lines) {
            const [sa, sb] = [viaScreen(a), viaScreen(b)];
            expect(Math.abs(measureInches(sa, sb, ipu) - KNOWN)).toBeLessThanOrEqual(SIXTEENTH);
            // Calibrating from the same clicks agrees with the printed scale.
            expect(scaleMismatchPercent(inchesPerUnitFromPoints(sa, sb, KNOWN), ipu)).toBeLessThan(0.01);
          }
        }
      }
    },
  );
});
