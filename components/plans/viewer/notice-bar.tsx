"use client";

import { useEffect } from "react";

export interface Notice {
  tone: "info" | "error";
  text: string;
  at: number;
}

/** Messages from saves (refusals, someone else's edit, undo done). Errors stay until dismissed; info fades. */
export function NoticeBar({ notice, onDismiss }: { notice: Notice | null; onDismiss: () => void }) {
  useEffect(() => {
    if (!notice || notice.tone === "error") return;
    const t = setTimeout(onDismiss, 5000);
    return () => clearTimeout(t);
  }, [notice, onDismiss]);
  if (!notice) return null;
  const look = notice.tone === "error" ? "border-alarm-600 bg-alarm-50 text-alarm-700" : "border-brass-400 bg-maple-50 text-graphite-900";
  return (
    <div role={notice.tone === "error" ? "alert" : "status"} className={`absolute top-2 left-1/2 z-20 flex max-w-[90%] -translate-x-1/2 items-start gap-2 rounded-md border px-3 py-1.5 text-sm shadow ${look}`}>
      <span>
        {notice.tone === "error" ? "⚠ " : ""}
        {notice.text}
      </span>
      <button type="button" onClick={onDismiss} aria-label="Dismiss message" className="px-1 font-bold">
        ×
      </button>
    </div>
  );
}
