"use client";

import type { ReactNode } from "react";
import { Button } from "@/components/ui/button";
import { useModalDialog } from "@/components/ui/use-modal-dialog";

/**
 * A modal question before a delete that takes counted work with it. It says what goes (tags, openings)
 * in words, so nobody learns it from a bid that came out short. Escape or "Keep" closes it unchanged.
 */
export function ConfirmRemoval({
  open,
  title,
  children,
  confirmLabel,
  busy,
  error,
  onConfirm,
  onCancel,
}: {
  open: boolean;
  title: string;
  children: ReactNode;
  confirmLabel: string;
  busy?: boolean;
  error?: string | null;
  onConfirm: () => void;
  onCancel: () => void;
}) {
  const ref = useModalDialog(open);

  return (
    <dialog
      ref={ref}
      aria-labelledby="confirm-removal-title"
      onCancel={(e) => {
        e.preventDefault();
        onCancel();
      }}
      className="w-[min(32rem,calc(100vw-2rem))] rounded-lg border border-alarm-600 bg-white p-5 text-sm text-graphite-900 shadow-lg backdrop:bg-graphite-900/40"
    >
      {open && (
        <div className="space-y-3">
          <h2 id="confirm-removal-title" className="text-base font-semibold">
            {title}
          </h2>
          <div className="space-y-2 text-graphite-700">{children}</div>
          {error && (
            <p role="alert" className="font-medium text-alarm-700">
              ⚠ {error}
            </p>
          )}
          <div className="flex justify-end gap-2 pt-1">
            <Button look="secondary" onClick={onCancel} disabled={busy} autoFocus>
              Keep it
            </Button>
            <Button look="danger" onClick={onConfirm} disabled={busy}>
              {busy ? "Deleting…" : confirmLabel}
            </Button>
          </div>
        </div>
      )}
    </dialog>
  );
}

const plural = (n: number, one: string, many = `${one}s`) => `${n} ${n === 1 ? one : many}`;

/** "16 tags (52 openings counted in the job)", or that nothing counted goes with it. */
export function RemovalSummary({ tags, openings }: { tags: number; openings: number }) {
  if (tags === 0) return <p>No tags are on it, so no counted openings go with it.</p>;
  return (
    <p>
      This also deletes <strong className="num">{plural(tags, "tag")}</strong> placed on the drawings
      {openings > 0 ? (
        <>
          , which the job counts as <strong className="num">{plural(openings, "opening")}</strong>
        </>
      ) : (
        " (on reference views: they count no openings)"
      )}
      . Takeoffs already saved keep their numbers; the next takeoff will not have these.
    </p>
  );
}
