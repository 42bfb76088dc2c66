"use client";

import { useEffect, useRef } from "react";
import type { PDFDocumentProxy } from "pdfjs-dist";
import { pdfjs, planSetFileUrl } from "@/components/plans/pdf-setup";

/**
 * Loads a plan set's PDF for its thumbnails (loaded with next/dynamic, never on the server). It draws no
 * page itself: the pages render beside each sheet's row from the document it hands back.
 *
 * Loaded with pdf.js directly rather than react-pdf's <Document>: that one destroys a document the moment
 * it unmounts, and destroying one that is still loading (someone leaves the Plans page as its thumbnails
 * start) makes pdf.js's worker throw "Worker was terminated" from inside its own message handler, an
 * uncaught error in the page. Here a document that is still loading is destroyed once its load settles.
 */
export default function PdfDocument({
  orgSlug,
  projectId,
  planSetId,
  onLoad,
  onFail,
}: {
  orgSlug: string;
  projectId: string;
  planSetId: string;
  onLoad: (pdf: PDFDocumentProxy) => void;
  onFail: () => void;
}) {
  const handlers = useRef({ onLoad, onFail });
  useEffect(() => {
    handlers.current = { onLoad, onFail };
  });
  const url = planSetFileUrl(orgSlug, projectId, planSetId);

  useEffect(() => {
    // Without isEvalSupported: false pdf.js probes `new Function` for PostScript functions, which the CSP refuses.
    const task = pdfjs.getDocument({ url, isEvalSupported: false });
    let live = true;
    task.promise.then(
      (pdf) => live && handlers.current.onLoad(pdf),
      () => live && handlers.current.onFail(),
    );
    return () => {
      live = false;
      void task.promise.then(
        () => task.destroy(),
        () => task.destroy(),
      );
    };
  }, [url]);

  return null;
}
