/**
 * How big a bitmap the viewer asks pdf.js for. Pure.
 *
 * Why two layers rather than one canvas at zoom × devicePixelRatio: an ARCH E sheet (48×36 in = 3456×2592 PDF
 * units) at 100% on a 2× screen is 9216×6912 ≈ 64 M pixels, 255 MB of RGBA — over the canvas area that mobile
 * Safari allows (16 M pixels) and slow to paint anywhere. So the whole page is rendered at most at
 * MAX_CANVAS_PIXELS (the "base", always there, so panning never shows blank paper), and when that is coarser
 * than the screen needs, only the region in view is rendered again at full zoom × devicePixelRatio (the
 * "detail", never larger than the viewer itself). Every zoom is then crisp where the estimator is looking.
 */
import type { Size, View } from "./view-transform";

/**
 * 1536² (2.4 M pixels): past this the base stops growing and only the region in view is re-rendered, which
 * keeps a zoom step on a dense sheet near a quarter second (bench:plans); well inside iOS Safari's 16 M limit.
 */
export const MAX_CANVAS_PIXELS = 1536 * 1536;

/** The CSS scale the full-page base layer renders at: the settled zoom, or less if that would pass the cap. */
export function baseRenderScale(page: Size, zoom: number, dpr: number, cap = MAX_CANVAS_PIXELS): number {
  const pixels = page.width * page.height * (zoom * dpr) ** 2;
  if (pixels <= cap) return zoom;
  return Math.sqrt(cap / (page.width * page.height)) / dpr;
}

/** A rectangle of the page drawn at `zoom`, CSS px from the rotated page's top-left corner. */
export interface DetailRegion {
  zoom: number;
  left: number;
  top: number;
  width: number;
  height: number;
}

/**
 * The part of the page in view, to be rendered sharp; null when the base layer is already sharp enough
 * (within 1%) or the page is out of sight. Whole pixels, rounded outward, so tiles meet without seams.
 */
export function detailRegion(view: View, page: Size, box: Size, baseScale: number): DetailRegion | null {
  if (baseScale >= view.zoom * 0.99) return null;
  const left = Math.floor(Math.max(0, -view.x));
  const top = Math.floor(Math.max(0, -view.y));
  const right = Math.ceil(Math.min(page.width * view.zoom, box.width - view.x));
  const bottom = Math.ceil(Math.min(page.height * view.zoom, box.height - view.y));
  if (right <= left || bottom <= top) return null;
  return { zoom: view.zoom, left, top, width: right - left, height: bottom - top };
}
