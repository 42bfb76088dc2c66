import { describe, expect, it } from "vitest";
import { PDFDocument, PDFName, PDFNumber } from "pdf-lib";
import { loadPdfjs, serverDocumentParams } from "@/lib/pdf/pdfjs";
import { toPdf, toScreen, viewportFor, type PageLike } from "./coordinates";
import { zoomAt } from "./view-transform";

/** A real page read by the real pdf.js: its box (which need not start at 0,0) and UserUnit. */
async function fakePage(view: number[], userUnit = 1): Promise<PageLike> {
  const doc = await PDFDocument.create();
  const [x0 = 0, y0 = 0, x1 = 0, y1 = 0] = view;
  const page = doc.addPage([x1 - x0, y1 - y0]);
  page.setMediaBox(x0, y0, x1 - x0, y1 - y0);
  if (userUnit !== 1) page.node.set(PDFName.of("UserUnit"), PDFNumber.of(userUnit));
  const pdfjs = await loadPdfjs();
  const pdf = await pdfjs.getDocument(serverDocumentParams(await doc.save())).promise;
  return pdf.getPage(1);
}

const ARCH_D = [0, 0, 2592, 1728]; // 36×24 in
const views = [
  { zoom: 0.3, x: 16, y: 16 },
  { zoom: 1.333, x: -900, y: -420 },
  { zoom: 6, x: -12000, y: -3000 },
];

describe("viewer coordinates", () => {
  it.each([0, 90, 180, 270])("round-trips a click at rotation %i, any zoom", async (rotation) => {
    const page = await fakePage(ARCH_D);
    for (const view of views) {
      const vp = viewportFor(page, view, rotation);
      const p = toPdf(vp, { x: 412.5, y: 233.25 });
      const back = toScreen(vp, p);
      expect(back.x).toBeCloseTo(412.5, 6);
      expect(back.y).toBeCloseTo(233.25, 6);
    }
  });

  it("keeps a stored point on the same spot of the drawing at every zoom and density", async () => {
    const page = await fakePage(ARCH_D);
    const tag = { x: 648, y: 432 }; // a quarter across, a quarter up
    for (const view of views) {
      const vp = viewportFor(page, view, 0);
      const s = toScreen(vp, tag);
      // Fraction of the drawn page, from its top-left corner: y is flipped (PDF y goes up).
      expect((s.x - view.x) / vp.width).toBeCloseTo(0.25, 9);
      expect((s.y - view.y) / vp.height).toBeCloseTo(0.75, 9);
    }
  });

  it("turns with the sheet: at 90° the page's bottom-left is drawn top-left", async () => {
    const vp = viewportFor(await fakePage(ARCH_D), { zoom: 1, x: 0, y: 0 }, 90);
    expect(vp.width).toBeCloseTo(1728);
    const s = toScreen(vp, { x: 0, y: 0 });
    expect(s.x).toBeCloseTo(0);
    expect(s.y).toBeCloseTo(0);
    const far = toScreen(vp, { x: 2592, y: 1728 });
    expect(far.x).toBeCloseTo(1728);
    expect(far.y).toBeCloseTo(2592);
  });

  it("honours a page box that does not start at the origin, and UserUnit", async () => {
    const page = await fakePage([100, 200, 1100, 900], 2);
    const vp = viewportFor(page, { zoom: 1, x: 0, y: 0 }, 0);
    expect(vp.width).toBeCloseTo(2000); // UserUnit 2 doubles the drawn size
    const tl = toPdf(vp, { x: 0, y: 0 });
    expect(tl).toEqual({ x: 100, y: 900 });
  });

  it("zooming at the pointer keeps the drawing under the pointer", async () => {
    const page = await fakePage(ARCH_D);
    const size = { width: 2592, height: 1728 };
    const box = { width: 1200, height: 800 };
    const before = { zoom: 0.5, x: 30, y: 40 };
    const pointer = { x: 700, y: 350 };
    const under = toPdf(viewportFor(page, before, 0), pointer);
    const after = zoomAt(before, 2.5, pointer, size, box);
    const s = toScreen(viewportFor(page, after, 0), under);
    expect(s.x).toBeCloseTo(pointer.x, 6);
    expect(s.y).toBeCloseTo(pointer.y, 6);
  });
});
