"use client";

import dynamic from "next/dynamic";
import { useState } from "react";
import type { PDFDocumentProxy } from "pdfjs-dist";
import type { SheetView, UnitTypeView } from "@/lib/plans/api-types";
import { PlanSetPdfContext, type PlanSetPdf } from "./plan-set-pdf";
import { SheetRow } from "./sheet-row";
import type { SheetNotice, SheetPatch } from "./use-plans-data";

// react-pdf touches browser-only APIs when imported: load it in the browser only.
const PdfDocument = dynamic(() => import("./pdf-document"), { ssr: false, loading: () => null });

export interface PlanSetGroupProps {
  orgSlug: string;
  projectId: string;
  planSetId: string;
  name: string;
  sheets: SheetView[];
  unitTypes: UnitTypeView[];
  canWrite: boolean;
  notices: Record<string, SheetNotice>;
  onDismiss: (sheetId: string) => void;
  onSave: (sheet: SheetView, patch: SheetPatch) => Promise<Record<string, string> | null>;
  warningsFor: (sheetId: string) => string[];
  onRemoveSheet: (sheet: SheetView) => void;
  onRemoveSet: (planSetId: string, name: string, sheets: SheetView[]) => void;
}

/** One uploaded PDF and its sheets; the PDF is loaded once here for all of their thumbnails. */
export function PlanSetGroup(props: PlanSetGroupProps) {
  const { orgSlug, projectId, planSetId, name, sheets, unitTypes, canWrite, notices, onDismiss, onSave, warningsFor, onRemoveSheet, onRemoveSet } = props;
  const [pdf, setPdf] = useState<PlanSetPdf>({ pdf: null, state: "loading" });
  // A long set folds away so the next one is in reach; folded rows draw no thumbnails.
  const [open, setOpen] = useState(true);
  const calibrated = sheets.filter((s) => s.inchesPerUnit !== null).length;
  const tags = sheets.reduce((n, s) => n + s.tagCount, 0);

  return (
    <section aria-labelledby={`set-${planSetId}`} className="rounded-lg border border-maple-200 bg-white">
      <header className="flex flex-wrap items-baseline justify-between gap-2 border-b border-maple-200 bg-maple-100 px-4 py-2">
        <h3 id={`set-${planSetId}`} className="min-w-0 truncate font-semibold text-graphite-900" title={name}>
          <button type="button" onClick={() => setOpen(!open)} aria-expanded={open} aria-controls={`sheets-${planSetId}`} className="inline-flex items-center gap-2 hover:underline">
            <span aria-hidden className="inline-block w-3 text-xs text-graphite-600">
              {open ? "▾" : "▸"}
            </span>
            {name}
          </button>
        </h3>
        <p className="text-xs text-graphite-700">
          <span className="num">{sheets.length}</span> sheet{sheets.length === 1 ? "" : "s"} · <span className="num">{calibrated}</span> calibrated ·{" "}
          <span className="num">{tags}</span> tag{tags === 1 ? "" : "s"}
          {pdf.state === "unavailable" && <span className="ml-2 text-graphite-600">(previews unavailable: the file could not be read)</span>}
          {canWrite && (
            <button type="button" className="ml-3 font-medium text-alarm-700 underline" onClick={() => onRemoveSet(planSetId, name, sheets)} aria-label={`Delete plan set ${name}`}>
              Delete set
            </button>
          )}
        </p>
      </header>
      <PdfDocument
        orgSlug={orgSlug}
        projectId={projectId}
        planSetId={planSetId}
        onLoad={(doc: PDFDocumentProxy) => setPdf({ pdf: doc, state: "ready" })}
        onFail={() => setPdf({ pdf: null, state: "unavailable" })}
      />
      <PlanSetPdfContext value={pdf}>
        <ul id={`sheets-${planSetId}`} hidden={!open} className="px-4">
          {sheets.map((sheet) => (
            <SheetRow
              key={sheet.id}
              sheet={sheet}
              href={`/${orgSlug}/projects/${projectId}/sheets/${sheet.id}`}
              unitTypes={unitTypes}
              canWrite={canWrite}
              notice={notices[sheet.id]}
              onDismiss={onDismiss}
              onSave={onSave}
              warnings={warningsFor(sheet.id)}
              onRemove={onRemoveSheet}
            />
          ))}
        </ul>
      </PlanSetPdfContext>
    </section>
  );
}
