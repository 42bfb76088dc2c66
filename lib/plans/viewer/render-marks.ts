/**
 * A performance mark each time a sharp bitmap of the sheet reaches the screen. Costs nothing in use;
 * the plans benchmark reads them to time the first render and each zoom step in a real browser.
 */
export const SHEET_RENDER_MARK = "miterwise:sheet-rendered";

export function markSheetRendered(layer: "page" | "detail", scale: number) {
  if (typeof performance !== "undefined" && typeof performance.mark === "function") {
    performance.mark(SHEET_RENDER_MARK, { detail: { layer, scale } });
  }
}
