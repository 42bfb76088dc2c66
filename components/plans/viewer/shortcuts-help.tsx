"use client";

import { useModalDialog } from "@/components/ui/use-modal-dialog";
import { Kbd } from "./kbd";
import { SHORTCUTS } from "./tools";

/** The shortcut list as a modal dialog (the native <dialog> keeps focus inside and closes on Esc). */
export function ShortcutsHelp({ open, onClose, canWrite }: { open: boolean; onClose: () => void; canWrite: boolean }) {
  const ref = useModalDialog(open);
  return (
    <dialog ref={ref} onClose={onClose} aria-labelledby="viewer-keys-title" className="m-auto w-[28rem] max-w-[95vw] rounded-lg border border-maple-300 bg-white p-4 shadow-xl backdrop:bg-graphite-900/40">
      <div className="mb-3 flex items-center justify-between">
        <h2 id="viewer-keys-title" className="text-base font-semibold">
          Keyboard shortcuts
        </h2>
        <button type="button" onClick={onClose} className="rounded px-2 text-sm text-spruce-700 hover:bg-maple-100">
          Close
        </button>
      </div>
      <dl className="grid grid-cols-[9rem_1fr] gap-x-3 gap-y-1.5 text-sm">
        {SHORTCUTS.filter((s) => canWrite || !s.write).map((s) => (
          <div key={s.what} className="contents">
            <dt className="flex flex-wrap items-center gap-1">
              {s.keys.map((k, i) => (k === "…" ? <span key={i}>…</span> : <Kbd key={i}>{k}</Kbd>))}
            </dt>
            <dd className="text-graphite-700">{s.what}</dd>
          </div>
        ))}
      </dl>
    </dialog>
  );
}
