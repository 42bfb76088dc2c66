"use client";

/**
 * The drawing itself. Loaded with next/dynamic (ssr: false) so react-pdf and pdf.js only ever run in the
 * browser, after pdf-setup has pointed pdf.js at the worker we ship.
 */
import { useState } from "react";
import { Page } from "react-pdf";
import type { PDFPageProxy } from "pdfjs-dist";
import { planSetFileUrl } from "@/components/plans/pdf-setup";
import { usePdfDocument } from "@/components/plans/use-pdf-document";
import type { DetailRegion } from "@/lib/plans/viewer/render-plan";
import type { Size, View } from "@/lib/plans/viewer/view-transform";
import { markSheetRendered } from "@/lib/plans/viewer/render-marks";
import { DetailTile } from "./detail-tile";

// react-pdf sizes its page box and canvas with inline styles; we place and size them from our view instead,
// so the bitmap is CSS-stretched to the live zoom. (A plain style rule: it must beat those inline styles.)
const FILL_CSS =
  "[data-sheet-page] .react-pdf__Page{position:absolute!important;inset:0;min-width:0!important;min-height:0!important}" +
  "[data-sheet-page] canvas{position:absolute;inset:0;width:100%!important;height:100%!important}" +
  // pdf.js paints a fresh canvas white first and then draws it in slices: one still being drawn stays unseen.
  "[data-sheet-page] .sheet-layer-pending{visibility:hidden}";

export interface PdfPageLayerProps {
  file: { orgSlug: string; projectId: string; planSetId: string };
  pageNumber: number;
  rotation: number;
  /** Live view: where the page is drawn now (null until the viewer has been measured). */
  view: View | null;
  /** Rotated page size at zoom 1. */
  pageSize: Size;
  /** CSS scale the whole-page bitmap is rendered at (settled zoom, capped). */
  baseScale: number | null;
  detail: DetailRegion | null;
  dpr: number;
  page: PDFPageProxy | null;
  onPage: (page: PDFPageProxy) => void;
  onError: (error: Error) => void;
}

export default function PdfPageLayer(props: PdfPageLayerProps) {
  const { file, pageNumber, rotation, view, pageSize, baseScale, detail, dpr, page, onPage, onError } = props;
  // Double buffer: the bitmap on screen stays (CSS-scaled) until the one at the new scale has finished; the new
  // one is drawn hidden beside it and only then takes its place.
  const [shown, setShown] = useState<number | null>(null);
  const layers = baseScale === null ? [] : shown === null || shown === baseScale ? [baseScale] : [shown, baseScale];
  const box = view ? { left: view.x, top: view.y, width: pageSize.width * view.zoom, height: pageSize.height * view.zoom } : { display: "none" };

  // The PDF is requested at once; pages join when the viewer's size is known. Loaded by usePdfDocument,
  // not react-pdf's <Document>, so leaving the sheet while it still loads throws nothing.
  const pdf = usePdfDocument(planSetFileUrl(file.orgSlug, file.projectId, file.planSetId), { disableAutoFetch: true, onError });
  if (!pdf) return null;
  return (
    <>
      <style>{FILL_CSS}</style>
      <div data-sheet-page className="absolute bg-white shadow-md ring-1 ring-graphite-400/40" style={box}>
        {layers.map((scale) => (
          <Page
            key={scale}
            pdf={pdf}
            className={shown !== null && scale !== shown ? "sheet-layer-pending" : undefined}
            pageNumber={pageNumber}
            scale={scale}
            rotate={rotation}
            devicePixelRatio={dpr}
            renderTextLayer={false}
            renderAnnotationLayer={false}
            canvasBackground="white"
            loading={null}
            onLoadSuccess={page ? undefined : onPage}
            onRenderSuccess={() => {
              setShown(scale);
              markSheetRendered("page", scale);
            }}
            onRenderError={onError}
          />
        ))}
      </div>
      {page && view && <DetailTile page={page} rotation={rotation} region={detail} dpr={dpr} view={view} />}
    </>
  );
}
