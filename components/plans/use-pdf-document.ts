"use client";

import { useEffect, useRef, useState } from "react";
import type { PDFDocumentProxy } from "pdfjs-dist";
import { pdfjs } from "@/components/plans/pdf-setup";

/**
 * Loads a plan set's PDF with pdf.js and hands it back (null until loaded). The one place the app opens a
 * PDF in the browser: the Plans page's thumbnails and the sheet viewer both load through it.
 *
 * Not react-pdf's <Document>: that destroys its document the moment it unmounts, and destroying one still
 * loading (someone leaves the page as the PDF starts to arrive) makes pdf.js's worker throw "Worker was
 * terminated" from inside its own message handler, an uncaught error in the page. Here a document still
 * loading is destroyed once its load settles.
 *
 * isEvalSupported: false — pdf.js would otherwise probe `new Function` for PostScript functions, which
 * the CSP refuses, and no font program from an uploaded file is ever evaluated. disableAutoFetch (the
 * viewer) reads only the byte ranges the page needs.
 */
export function usePdfDocument(url: string, opts: { disableAutoFetch?: boolean; onError: (error: Error) => void }): PDFDocumentProxy | null {
  const [loaded, setLoaded] = useState<{ url: string; pdf: PDFDocumentProxy } | null>(null);
  const onError = useRef(opts.onError);
  useEffect(() => {
    onError.current = opts.onError;
  });
  const disableAutoFetch = opts.disableAutoFetch ?? false;

  useEffect(() => {
    const task = pdfjs.getDocument({ url, isEvalSupported: false, disableAutoFetch });
    let live = true;
    task.promise.then(
      (pdf) => live && setLoaded({ url, pdf }),
      (error: unknown) => live && onError.current(error instanceof Error ? error : new Error(String(error))),
    );
    return () => {
      live = false;
      void task.promise.then(
        () => task.destroy(),
        () => task.destroy(),
      );
    };
  }, [url, disableAutoFetch]);

  // A document of the previous URL is never handed out once the URL has changed.
  return loaded?.url === url ? loaded.pdf : null;
}
