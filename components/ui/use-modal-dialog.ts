"use client";

import { useEffect, useRef } from "react";

/**
 * Keeps a native <dialog> in step with `open`, shown modally (the browser keeps focus inside and closes on
 * Esc). Returns the ref to put on the dialog.
 */
export function useModalDialog(open: boolean) {
  const ref = useRef<HTMLDialogElement>(null);
  useEffect(() => {
    const d = ref.current;
    if (!d) return;
    if (open && !d.open) d.showModal();
    if (!open && d.open) d.close();
  }, [open]);
  return ref;
}
