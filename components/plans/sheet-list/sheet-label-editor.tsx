"use client";

import { useState, type FormEvent } from "react";
import { useFormMutation } from "@/lib/client/use-form-mutation";
import { sheetUpdateSchema } from "@/lib/validators/plans";

const input = "w-full rounded border border-graphite-400 bg-white px-2 py-1 text-sm aria-[invalid=true]:border-alarm-600";

/** The sheet label, edited in place. Checked with the API's own schema before it is sent. */
export function SheetLabelEditor({
  sheetId,
  label,
  version,
  onSave,
  onClose,
}: {
  sheetId: string;
  label: string;
  version: number;
  onSave: (label: string) => Promise<Record<string, string> | null>;
  onClose: () => void;
}) {
  const [text, setText] = useState(label);
  const [error, setError] = useState<string | null>(null);
  // onSave answers the refusal's fields rather than throwing (a stale edit is shown by the list itself).
  const save = useFormMutation({
    mutationFn: onSave,
    onSuccess: (fields) => (fields ? setError(Object.values(fields).join(" ")) : onClose()),
  });
  const saving = save.pending;
  const id = `label-${sheetId}`;

  function submit(e: FormEvent) {
    e.preventDefault();
    if (text.trim() === label) return onClose();
    const checked = sheetUpdateSchema.safeParse({ version, label: text });
    if (!checked.success) return setError(checked.error.issues[0]?.message ?? "Check the label.");
    save.submit(checked.data.label ?? text);
  }

  return (
    <form onSubmit={submit} onKeyDown={(e) => e.key === "Escape" && onClose()} className="space-y-1" noValidate>
      <input
        id={id}
        aria-label="Sheet label"
        aria-invalid={error ? true : undefined}
        aria-describedby={error ? `${id}-error` : undefined}
        className={input}
        value={text}
        maxLength={40}
        autoFocus
        onChange={(e) => setText(e.target.value)}
        readOnly={saving}
      />
      {error && (
        <p id={`${id}-error`} role="alert" className="text-xs font-medium text-alarm-700">
          ⚠ {error}
        </p>
      )}
      <div className="flex gap-1">
        <button type="submit" className="rounded bg-spruce-700 px-2 py-0.5 text-xs font-semibold text-maple-50 hover:bg-spruce-800" disabled={saving}>
          {saving ? "Saving…" : "Save"}
        </button>
        <button type="button" className="rounded px-2 py-0.5 text-xs font-semibold text-spruce-700 hover:bg-maple-100" onClick={onClose}>
          Cancel
        </button>
      </div>
    </form>
  );
}
