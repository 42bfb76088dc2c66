"use client";

import { Document } from "react-pdf";
import type { PDFDocumentProxy } from "pdfjs-dist";
import { planSetFileUrl } from "@/components/plans/pdf-setup";

// Without it pdf.js probes `new Function` for PostScript functions, which the CSP refuses (and reports).
const OPTIONS = { isEvalSupported: false };

/**
 * Loads a plan set's PDF for its thumbnails (loaded with next/dynamic, never on the server). It draws no
 * page itself: the pages render beside each sheet's row from the document it hands back.
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
  return (
    <Document
      file={planSetFileUrl(orgSlug, projectId, planSetId)}
      options={OPTIONS}
      onLoadSuccess={onLoad}
      onLoadError={onFail}
      onSourceError={onFail}
      loading={null}
      error={null}
      noData={null}
      className="hidden"
    />
  );
}
