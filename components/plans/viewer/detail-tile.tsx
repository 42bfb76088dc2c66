"use client";

import { useEffect, useRef, useState } from "react";
import type { PDFPageProxy } from "pdfjs-dist";
import type { DetailRegion } from "@/lib/plans/viewer/render-plan";
import { markSheetRendered } from "@/lib/plans/viewer/render-marks";
import type { View } from "@/lib/plans/viewer/view-transform";

/**
 * The sharp tile over the capped base bitmap (see lib/plans/viewer/render-plan.ts): only the region in view,
 * at zoom × devicePixelRatio. Rendered into a fresh canvas and swapped in when done, so the screen never
 * blanks; until the next one is ready the last tile is CSS-scaled along with the page.
 */
export function DetailTile({ page, rotation, region, dpr, view }: { page: PDFPageProxy; rotation: number; region: DetailRegion | null; dpr: number; view: View }) {
  const holder = useRef<HTMLDivElement>(null);
  const [drawn, setDrawn] = useState<DetailRegion | null>(null);

  useEffect(() => {
    if (!region) {
      holder.current?.replaceChildren();
      setDrawn(null);
      return;
    }
    const canvas = document.createElement("canvas");
    canvas.width = Math.round(region.width * dpr);
    canvas.height = Math.round(region.height * dpr);
    canvas.style.cssText = "display:block;width:100%;height:100%";
    const viewport = page.getViewport({ scale: region.zoom * dpr, rotation, offsetX: -region.left * dpr, offsetY: -region.top * dpr });
    const task = page.render({ canvas, viewport, background: "white" });
    let live = true;
    task.promise.then(
      () => {
        if (!live) return;
        // Zeroing the old bitmap frees its memory now rather than at the next garbage collection.
        holder.current?.querySelectorAll("canvas").forEach((old) => (old.width = 0));
        holder.current?.replaceChildren(canvas);
        setDrawn(region);
        markSheetRendered("detail", region.zoom);
      },
      () => {
        // Cancelled by a newer view (or a broken page, which the base layer reports): nothing to show.
        canvas.width = 0;
      },
    );
    return () => {
      live = false;
      task.cancel();
    };
  }, [page, rotation, region, dpr]);

  const k = drawn ? view.zoom / drawn.zoom : 1;
  const style = drawn
    ? { left: view.x + drawn.left * k, top: view.y + drawn.top * k, width: drawn.width * k, height: drawn.height * k }
    : { display: "none" };
  return <div ref={holder} aria-hidden className="pointer-events-none absolute" style={style} />;
}
