/**
 * The sheet viewer's view: how large the page is drawn and where. Pure, so it can be tested without a browser.
 *
 * `zoom` is the pdf.js viewport scale (CSS px per PDF unit, before the page's UserUnit, which pdf.js applies
 * itself); `x`, `y` are where the rotated page's top-left corner sits in the viewer, CSS px. Those are exactly
 * the `scale`, `offsetX`, `offsetY` of `page.getViewport`, so one viewport maps clicks to PDF points and back.
 */

export interface View {
  zoom: number;
  x: number;
  y: number;
}

export interface Size {
  width: number;
  height: number;
}

/** 100% = the paper's real size on screen: CSS counts 96 px per inch, PDF 72 units per inch. */
export const ACTUAL_SIZE_ZOOM = 96 / 72;
export const MAX_ZOOM = ACTUAL_SIZE_ZOOM * 8;
/** Gap kept around the page when fitting, CSS px. */
export const FIT_MARGIN = 16;

export const zoomPercent = (zoom: number) => Math.round((zoom / ACTUAL_SIZE_ZOOM) * 100);

/** Lowest zoom: a quarter of fit-to-page, so a whole ARCH E sheet can be seen small, but never a dot. */
export function minZoom(page: Size, box: Size): number {
  return Math.min(fitPage(page, box).zoom / 4, 0.05);
}

export function clampZoom(zoom: number, page: Size, box: Size): number {
  return Math.min(MAX_ZOOM, Math.max(minZoom(page, box), zoom));
}

/**
 * Zooms by `factor` keeping the point under `anchor` (viewer px) still: that page point is at
 * (anchor − offset) / zoom before and must be there after.
 */
export function zoomAt(view: View, factor: number, anchor: { x: number; y: number }, page: Size, box: Size): View {
  const zoom = clampZoom(view.zoom * factor, page, box);
  const k = zoom / view.zoom;
  return { zoom, x: anchor.x - (anchor.x - view.x) * k, y: anchor.y - (anchor.y - view.y) * k };
}

/** `page` is the rotated page at zoom 1 (viewport width/height at scale 1). */
export function fitWidth(page: Size, box: Size): View {
  const zoom = Math.max(1e-3, (box.width - 2 * FIT_MARGIN) / page.width);
  return { zoom, x: FIT_MARGIN, y: FIT_MARGIN };
}

export function fitPage(page: Size, box: Size): View {
  const zoom = Math.max(1e-3, Math.min((box.width - 2 * FIT_MARGIN) / page.width, (box.height - 2 * FIT_MARGIN) / page.height));
  return { zoom, x: (box.width - page.width * zoom) / 2, y: (box.height - page.height * zoom) / 2 };
}

/** A zoom level set from a button: keeps the centre of the viewer on the same spot of the drawing. */
export function zoomCentered(view: View, zoom: number, page: Size, box: Size): View {
  return zoomAt(view, zoom / view.zoom, { x: box.width / 2, y: box.height / 2 }, page, box);
}

/** Keeps at least `keep` px of the page inside the viewer, so a wild drag never loses the sheet. */
export function clampPan(view: View, page: Size, box: Size, keep = 48): View {
  const w = page.width * view.zoom;
  const h = page.height * view.zoom;
  return {
    zoom: view.zoom,
    x: Math.min(box.width - keep, Math.max(keep - w, view.x)),
    y: Math.min(box.height - keep, Math.max(keep - h, view.y)),
  };
}

/** One wheel notch or trackpad delta → a zoom factor; lines and pages are turned into pixels first. */
export function wheelFactor(deltaY: number, deltaMode: number): number {
  const px = deltaMode === 1 ? deltaY * 16 : deltaMode === 2 ? deltaY * 400 : deltaY;
  return Math.exp(-Math.max(-1200, Math.min(1200, px)) * 0.0015);
}
