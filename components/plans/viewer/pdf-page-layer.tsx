"use client";

/**
 * The drawing itself. Loaded with next/dynamic (ssr: false) so react-pdf and pdf.js only ever run in the
 * browser, after pdf-setup has pointed pdf.js at the worker we ship.
 */
import { useState } from "react";
import { Document, Page } from "react-pdf";
import type { PDFPageProxy } from "pdfjs-dist";
import "@/components/plans/pdf-setup";
import type { DetailRegion } from "@/lib/plans/viewer/render-plan";
import type { Size, View } from "@/lib/plans/viewer/view-transform";
import { DetailTile } from "./detail-tile";

// A stable object: react-pdf reloads the document whenever `options` changes identity.
// No eval of font programs from an uploaded file; fetch only the byte ranges the page needs.
const OPTIONS = { isEvalSupported: false, disableAutoFetch: true };

// react-pdf sizes its page box and canvas itself; we place and size them from our view instead.
const FILL =
  "[&_.react-pdf__Page]:absolute! [&_.react-pdf__Page]:inset-0 [&_canvas]:absolute! [&_canvas]:inset-0 [&_canvas]:h-full! [&_canvas]:w-full!";

export interface PdfPageLayerProps {
  file: string;
  pageNumber: number;
  rotation: number;
  /** Live view: where the page is drawn now. */
  view: View;
  /** Rotated page size at zoom 1. */
  pageSize: Size;
  /** CSS scale the whole-page bitmap is rendered at (settled zoom, capped). */
  baseScale: number;
  detail: DetailRegion | null;
  dpr: number;
  page: PDFPageProxy | null;
  onPage: (page: PDFPageProxy) => void;
  onError: (error: Error) => void;
}

export default function PdfPageLayer(props: PdfPageLayerProps) {
  const { file, pageNumber, rotation, view, pageSize, baseScale, detail, dpr, page, onPage, onError } = props;
  // Double buffer: the bitmap on screen stays (CSS-scaled) until the one at the new scale has finished.
  const [shown, setShown] = useState<number | null>(null);
  const layers = shown === null || shown === baseScale ? [baseScale] : [shown, baseScale];
  const box = { left: view.x, top: view.y, width: pageSize.width * view.zoom, height: pageSize.height * view.zoom };

  return (
    <Document file={file} options={OPTIONS} loading={null} error={null} onLoadError={onError} onSourceError={onError}>
      <div className={`absolute bg-white shadow-md ring-1 ring-graphite-400/40 ${FILL}`} style={box}>
        {layers.map((scale) => (
          <Page
            key={scale}
            pageNumber={pageNumber}
            scale={scale}
            rotate={rotation}
            devicePixelRatio={dpr}
            renderTextLayer={false}
            renderAnnotationLayer={false}
            canvasBackground="white"
            loading={null}
            onLoadSuccess={page ? undefined : onPage}
            onRenderSuccess={() => setShown(scale)}
            onRenderError={onError}
          />
        ))}
      </div>
      {page && <DetailTile page={page} rotation={rotation} region={detail} dpr={dpr} view={view} />}
    </Document>
  );
}
