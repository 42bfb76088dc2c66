"use client";

import { bytesText, uploadPercent } from "@/lib/plans/upload-progress";

export interface UploadItem {
  id: string;
  name: string;
  size: number;
  /** Bytes sent so far, as the upload reports them. */
  loaded: number;
  status: "comparing" | "duplicate" | "starting" | "uploading" | "checking" | "done" | "refused" | "cancelled" | "skipped";
  message?: string;
  /** For a duplicate: the plan set already holding the same bytes. */
  duplicateOf?: { name: string; uploadedAt: string; pageCount: number };
  abort: () => void;
  keepBoth?: () => void;
  skip?: () => void;
}

const statusText: Record<UploadItem["status"], string> = {
  comparing: "Looking for the same file in this project",
  duplicate: "Already uploaded?",
  starting: "Getting ready to upload",
  uploading: "Uploading",
  checking: "Checking the PDF",
  done: "✓ Added",
  refused: "⚠ Not added",
  cancelled: "Cancelled",
  skipped: "Skipped",
};

const day = (iso: string) => new Date(iso).toLocaleDateString("en-US", { year: "numeric", month: "short", day: "numeric" });

export function UploadRow({ item, onDismiss }: { item: UploadItem; onDismiss: () => void }) {
  const busy = item.status === "comparing" || item.status === "starting" || item.status === "uploading" || item.status === "checking";
  const percent = item.status === "uploading" ? uploadPercent(item.loaded, item.size) : null;
  return (
    <li className="rounded-md border border-maple-200 bg-white px-3 py-2 text-sm" data-status={item.status}>
      <div className="flex flex-wrap items-center justify-between gap-2">
        <span className="font-medium">{item.name}</span>
        <span className={item.status === "refused" ? "font-semibold text-alarm-700" : "text-graphite-600"}>
          {statusText[item.status]}
          {percent !== null && ` ${percent}%`}
        </span>
      </div>
      {busy && (
        <div className="mt-2 flex items-center gap-3">
          {/* No value while there is no honest percentage: the bar shows motion, not a made-up 0%. */}
          <progress className="h-2 w-full accent-spruce-700" max={100} value={percent ?? undefined} aria-label={`Upload of ${item.name}`} />
          {item.status === "uploading" && (
            <span className="num whitespace-nowrap text-xs text-graphite-600">
              {bytesText(Math.min(item.loaded, item.size))} of {bytesText(item.size)}
            </span>
          )}
          {(item.status === "starting" || item.status === "uploading") && (
            <button type="button" onClick={item.abort} className="text-xs font-semibold text-spruce-700 underline">
              Cancel
            </button>
          )}
        </div>
      )}
      {item.status === "duplicate" && item.duplicateOf && (
        <div role="group" aria-label={`${item.name} is already in this project`} className="mt-2 space-y-2">
          <p className="text-graphite-900">
            This file is byte for byte the same as <strong>{item.duplicateOf.name}</strong>, uploaded {day(item.duplicateOf.uploadedAt)} (
            <span className="num">{item.duplicateOf.pageCount}</span> sheet{item.duplicateOf.pageCount === 1 ? "" : "s"}). Uploading it again adds those
            sheets a second time.
          </p>
          <div className="flex gap-2">
            <button type="button" onClick={item.skip} className="rounded-md bg-spruce-700 px-3 py-1 text-xs font-semibold text-maple-50 hover:bg-spruce-800">
              Skip this file
            </button>
            <button type="button" onClick={item.keepBoth} className="rounded-md border border-graphite-400 bg-white px-3 py-1 text-xs font-semibold text-graphite-900 hover:bg-maple-100">
              Upload anyway (keep both)
            </button>
          </div>
        </div>
      )}
      {item.message && (
        <p role={item.status === "refused" ? "alert" : undefined} className={`mt-1 ${item.status === "refused" ? "text-alarm-700" : "text-graphite-700"}`}>
          {item.message}
          {!busy && (
            <button type="button" onClick={onDismiss} className="ml-2 text-xs text-graphite-600 underline">
              Dismiss
            </button>
          )}
        </p>
      )}
    </li>
  );
}
