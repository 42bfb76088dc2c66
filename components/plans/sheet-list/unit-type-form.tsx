"use client";

import { useState, type FormEvent } from "react";
import { Button } from "@/components/ui/button";
import { SubmitButton } from "@/components/ui/form-error";
import { useFormMutation } from "@/lib/client/use-form-mutation";
import { fieldErrorsOf } from "@/lib/plans/window-list/field-errors";
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
  const form = useFormMutation({
    mutationFn: onSubmit,
    onSuccess: () => {
      if (!onCancel) {
        setName("");
        setCount("");
      }
    },
  });
  const { errors } = form;

  function submit(e: FormEvent) {
    e.preventDefault();
    const checked = unitTypeSchema.safeParse({ name, count });
    if (!checked.success) return form.refuse(fieldErrorsOf(checked.error));
    form.submit(checked.data);
  }

  // A refusal that names no field is said here too: this small form has no line of its own above the inputs.
  const general = errors._ ?? (Object.keys(errors).length === 0 ? form.formError : null);
  const message = [errors.name, errors.count, general].filter(Boolean).join(" ");
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
        <SubmitButton pending={form.pending} busy="Saving…" className="px-2.5 py-1 text-xs">
          {submitLabel}
        </SubmitButton>
        {onCancel && (
          <Button type="button" look="quiet" className="px-2.5 py-1 text-xs" onClick={onCancel}>
            Cancel
          </Button>
        )}
      </div>
    </form>
  );
}
