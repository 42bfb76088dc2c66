"use client";

import { useEffect, useRef } from "react";
import type { PDFDocumentProxy } from "pdfjs-dist";
import { planSetFileUrl } from "@/components/plans/pdf-setup";
import { usePdfDocument } from "@/components/plans/use-pdf-document";

/**
 * Loads a plan set's PDF for its thumbnails (loaded with next/dynamic, never on the server). It draws no
 * page itself: the pages render beside each sheet's row from the document it hands back. Loading and
 * destroying are usePdfDocument's (see there why not react-pdf's <Document>).
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
  const pdf = usePdfDocument(planSetFileUrl(orgSlug, projectId, planSetId), { onError: () => handlers.current.onFail() });
  useEffect(() => {
    if (pdf) handlers.current.onLoad(pdf);
  }, [pdf]);
  return null;
}
