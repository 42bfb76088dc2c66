"use client";

import { pdfjs } from "react-pdf";

// pdf.js parses in a worker shipped with the app (bundled from pdfjs-dist), never fetched from elsewhere.
pdfjs.GlobalWorkerOptions.workerSrc = new URL("pdfjs-dist/build/pdf.worker.min.mjs", import.meta.url).toString();

export { pdfjs };

/** Where the browser reads a plan set's PDF: our route, which checks the membership before serving bytes. */
export const planSetFileUrl = (orgSlug: string, projectId: string, planSetId: string) =>
  `/api/orgs/${orgSlug}/projects/${projectId}/plan-sets/${planSetId}/file`;
