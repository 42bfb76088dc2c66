"use client";

export interface UploadItem {
  id: string;
  name: string;
  size: number;
  progress: number;
  status: "uploading" | "checking" | "done" | "refused" | "cancelled";
  message?: string;
  abort: () => void;
}

const statusText: Record<UploadItem["status"], string> = {
  uploading: "Uploading",
  checking: "Checking the PDF",
  done: "✓ Added",
  refused: "⚠ Not added",
  cancelled: "Cancelled",
};

export function UploadRow({ item, onDismiss }: { item: UploadItem; onDismiss: () => void }) {
  const busy = item.status === "uploading" || item.status === "checking";
  return (
    <li className="rounded-md border border-maple-200 bg-white px-3 py-2 text-sm" data-status={item.status}>
      <div className="flex flex-wrap items-center justify-between gap-2">
        <span className="font-medium">{item.name}</span>
        <span className={item.status === "refused" ? "font-semibold text-alarm-700" : "text-graphite-600"}>
          {statusText[item.status]}
          {item.status === "uploading" ? ` ${Math.round(item.progress)}%` : ""}
        </span>
      </div>
      {busy && (
        <div className="mt-2 flex items-center gap-3">
          <progress className="h-2 w-full accent-spruce-700" max={100} value={item.status === "checking" ? undefined : item.progress} aria-label={`Upload of ${item.name}`} />
          {item.status === "uploading" && (
            <button type="button" onClick={item.abort} className="text-xs font-semibold text-spruce-700 underline">
              Cancel
            </button>
          )}
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
