"use client";

import { createContext, useContext } from "react";
import type { PDFDocumentProxy } from "pdfjs-dist";

/**
 * One loaded PDF per plan set, shared by all of its thumbnails: the file is fetched and parsed once,
 * however many pages are on screen. `pdf` is null until loaded (or when it could not be).
 */
export interface PlanSetPdf {
  pdf: PDFDocumentProxy | null;
  state: "loading" | "ready" | "unavailable";
}

export const PlanSetPdfContext = createContext<PlanSetPdf>({ pdf: null, state: "loading" });

export const usePlanSetPdf = () => useContext(PlanSetPdfContext);
