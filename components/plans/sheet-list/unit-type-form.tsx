"use client";

import { useState, type FormEvent } from "react";
import { Button } from "@/components/ui/button";
import { fieldErrorsOf } from "@/lib/plans/window-list/field-errors";
import { PlansApiError } from "@/lib/plans/window-list/request";
import { unitTypeSchema } from "@/lib/validators/plans";

const input = "w-full rounded border border-graphite-400 bg-white px-2 py-1 text-sm aria-[invalid=true]:border-alarm-600";

/** Name and number of units, for a new unit type or an existing one; checked with the API's schema first. */
export function UnitTypeForm({
  idPrefix,
  initial,
  submitLabel,
  onSubmit,
  onCancel,
}: {
  idPrefix: string;
  initial: { name: string; count: string };
  submitLabel: string;
  onSubmit: (value: { name: string; count: number }) => Promise<unknown>;
  onCancel?: () => void;
}) {
  const [name, setName] = useState(initial.name);
  const [count, setCount] = useState(initial.count);
  const [errors, setErrors] = useState<Record<string, string>>({});
  const [busy, setBusy] = useState(false);

  async function submit(e: FormEvent) {
    e.preventDefault();
    const checked = unitTypeSchema.safeParse({ name, count });
    if (!checked.success) return setErrors(fieldErrorsOf(checked.error));
    setBusy(true);
    try {
      await onSubmit(checked.data);
      setErrors({});
      if (!onCancel) (setName(""), setCount(""));
    } catch (error) {
      const fields = error instanceof PlansApiError ? error.fields : {};
      setErrors(Object.keys(fields).length > 0 ? fields : { _: (error as Error).message });
    } finally {
      setBusy(false);
    }
  }

  const message = [errors.name, errors.count, errors._].filter(Boolean).join(" ");
  return (
    <form onSubmit={submit} onKeyDown={(e) => e.key === "Escape" && onCancel?.()} className="space-y-1" noValidate>
      <div className="grid grid-cols-[1fr_5rem] gap-2">
        <label className="text-xs font-medium text-graphite-700">
          Name
          <input className={input} value={name} maxLength={60} placeholder="Type A" onChange={(e) => setName(e.target.value)} aria-invalid={errors.name ? true : undefined} aria-describedby={message ? `${idPrefix}-error` : undefined} />
        </label>
        <label className="text-xs font-medium text-graphite-700">
          Units
          <input className={`${input} num`} value={count} inputMode="numeric" placeholder="24" onChange={(e) => setCount(e.target.value)} aria-invalid={errors.count ? true : undefined} aria-describedby={message ? `${idPrefix}-error` : undefined} />
        </label>
      </div>
      {message && (
        <p id={`${idPrefix}-error`} role="alert" className="text-xs font-medium text-alarm-700">
          ⚠ {message}
        </p>
      )}
      <div className="flex gap-2">
        <Button type="submit" className="px-2.5 py-1 text-xs" disabled={busy}>
          {busy ? "Saving…" : submitLabel}
        </Button>
        {onCancel && (
          <Button type="button" look="quiet" className="px-2.5 py-1 text-xs" onClick={onCancel}>
            Cancel
          </Button>
        )}
      </div>
    </form>
  );
}
