"use client";

import { useRef } from "react";
import { Page } from "react-pdf";
import type { PDFDocumentProxy } from "pdfjs-dist";

/**
 * Renders one page to a canvas once, then hands back a picture of it, so the canvas can go: a long plan
 * set keeps small images, not one live canvas per page.
 */
export default function PdfPage({
  pdf,
  pageNumber,
  width,
  onPicture,
  onFail,
}: {
  pdf: PDFDocumentProxy;
  pageNumber: number;
  width: number;
  onPicture: (url: string) => void;
  onFail: () => void;
}) {
  const canvas = useRef<HTMLCanvasElement>(null);
  return (
    <Page
      pdf={pdf}
      pageNumber={pageNumber}
      width={width}
      canvasRef={canvas}
      renderTextLayer={false}
      renderAnnotationLayer={false}
      loading={null}
      error={null}
      onRenderSuccess={() => {
        const c = canvas.current;
        if (!c) return onFail();
        c.toBlob((blob) => (blob ? onPicture(URL.createObjectURL(blob)) : onFail()), "image/png");
      }}
      onRenderError={onFail}
      onLoadError={onFail}
    />
  );
}
