/**
 * Screen ↔ PDF user space, always through a pdf.js viewport. A stored point is in the page's own user space
 * (y up, unrotated, page box origin), so it names the same spot of the drawing at any zoom, rotation or pixel
 * density; only the viewport built for the current view turns it into viewer pixels and back.
 */
import type { Point } from "@/lib/plans/calibration";
import type { View } from "./view-transform";

/** The slice of pdf.js's PageViewport the viewer uses (structural, so tests can use the real class). */
export interface ViewportLike {
  width: number;
  height: number;
  convertToViewportPoint(x: number, y: number): number[];
  convertToPdfPoint(x: number, y: number): number[];
}

export interface PageLike {
  getViewport(params: { scale: number; rotation?: number; offsetX?: number; offsetY?: number }): ViewportLike;
}

/** The viewport for a view: scale = zoom, the page's top-left corner at (x, y) in viewer pixels. */
export function viewportFor(page: PageLike, view: View, rotation: number): ViewportLike {
  return page.getViewport({ scale: view.zoom, rotation, offsetX: view.x, offsetY: view.y });
}

/** Viewer pixels (relative to the viewer's top-left) → PDF user space. */
export function toPdf(vp: ViewportLike, screen: Point): Point {
  const [x = 0, y = 0] = vp.convertToPdfPoint(screen.x, screen.y);
  return { x, y };
}

/** PDF user space → viewer pixels. */
export function toScreen(vp: ViewportLike, p: Point): Point {
  const [x = 0, y = 0] = vp.convertToViewportPoint(p.x, p.y);
  return { x, y };
}

/** The rotated page's size at zoom 1, what fit and clamp work from. */
export function pageSizeAt1(page: PageLike, rotation: number): { width: number; height: number } {
  const vp = page.getViewport({ scale: 1, rotation });
  return { width: vp.width, height: vp.height };
}
