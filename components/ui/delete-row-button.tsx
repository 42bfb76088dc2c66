"use client";

import { Button } from "./button";

/** The ✕ at the end of an editable table row: asks first, shows "…" while the delete is under way. */
export function DeleteRowButton({ what, question, busy, onDelete }: { what: string; question: string; busy: boolean; onDelete: () => void }) {
  return (
    <Button
      look="danger"
      className="px-1.5 py-0.5 text-xs"
      title={`Delete ${what}`}
      disabled={busy}
      onClick={() => {
        if (confirm(question)) onDelete();
      }}
      aria-label={`Delete ${what}`}
    >
      {busy ? "…" : <span aria-hidden>✕</span>}
    </Button>
  );
}
