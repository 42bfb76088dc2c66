"use client";

import { useState, type FormEvent } from "react";
import { Card, Notice } from "@/components/ui/card";
import { SubmitButton } from "@/components/ui/form-error";
import { Field, TextInput } from "@/components/ui/field";
import { ClientError, refusal, request } from "@/lib/client/fetch";
import { useFormMutation } from "@/lib/client/use-form-mutation";
import { planRates, rateFieldOf, ratesDraft, type RatesDraft } from "@/lib/price-books/forms";
import { KIND_RATES } from "@/lib/price-books/kind-rates";
import { formatMoney, percentText } from "@/lib/price-books/numbers";
import type { PriceBookSummary } from "@/lib/price-books/types";

type TextKey = Exclude<keyof RatesDraft, "taxLabour">;
const FIELDS: { key: TextKey; label: string; hint: string; unit?: string }[] = [
  { key: "stoolAndApron", label: "Stool-and-apron opening", hint: "minutes each", unit: "min" },
  { key: "pictureFrame", label: "Picture-frame opening", hint: "minutes each", unit: "min" },
  { key: "extensionFoot", label: "Extension", hint: "minutes per linear foot", unit: "min/ft" },
  ...KIND_RATES.map((r) => ({ key: r.draft, label: r.label, hint: r.hint, unit: "min" })),
  { key: "hourlyRate", label: "Hourly rate", hint: "dollars per hour", unit: "$/h" },
  { key: "markup", label: "Markup", hint: "percent on cost", unit: "%" },
  { key: "taxRate", label: "Sales tax", hint: "percent", unit: "%" },
];

/** What readers see: the same figures, no controls. */
function RatesReadOnly({ book }: { book: PriceBookSummary }) {
  const rows: [string, string][] = [
    ["Stool-and-apron opening", `${book.labour.minutesPerOpening["stool-and-apron"]} min`],
    ["Picture-frame opening", `${book.labour.minutesPerOpening["picture-frame"]} min`],
    ["Extension", `${book.labour.minutesPerExtensionFoot} min/ft`],
    ...KIND_RATES.map((r): [string, string] => [r.label, book.labour[r.key] === undefined ? "not set" : `${book.labour[r.key]} min`]),
    ["Hourly rate", formatMoney(book.labour.hourlyRate)],
    ["Markup", `${percentText(book.markup)} %`],
    ["Sales tax", `${percentText(book.taxRate)} %${book.taxLabour ? ", labour taxed too" : ", materials only"}`],
  ];
  return (
    <dl className="grid grid-cols-1 gap-x-6 gap-y-1 text-sm sm:grid-cols-2">
      {rows.map(([label, value]) => (
        <div key={label} className="flex justify-between gap-3 border-b border-maple-100 py-1">
          <dt className="text-graphite-700">{label}</dt>
          <dd className="num font-medium">{value}</dd>
        </div>
      ))}
    </dl>
  );
}

/** Labour rates, markup and tax. Percentages are typed as percentages; the API keeps fractions. */
export function RatesForm({ base, book, canWrite, onSaved }: { base: string; book: PriceBookSummary; canWrite: boolean; onSaved: (b: PriceBookSummary) => void }) {
  const [draft, setDraft] = useState<RatesDraft>(() => ratesDraft(book));
  const [note, setNote] = useState<{ tone: "info" | "error"; text: string } | null>(null);
  const save = useFormMutation({
    mutationFn: (body: unknown) => request<{ priceBook: PriceBookSummary }>(base, { method: "PATCH", body }),
    fieldsFrom: (fields) => Object.fromEntries(Object.entries(fields).map(([k, m]) => [rateFieldOf(k), m])),
    onSuccess: ({ priceBook }) => {
      onSaved(priceBook);
      setDraft(ratesDraft(priceBook));
      setNote({ tone: "info", text: "Saved." });
    },
    onError: (error) => {
      if (!(error instanceof ClientError)) return setNote({ tone: "error", text: "Could not reach the server; nothing was saved." });
      const current = refusal(error, "stale")?.current as PriceBookSummary | null | undefined;
      if (current) {
        onSaved(current);
        setDraft(ratesDraft(current));
      }
      setNote({ tone: "error", text: error.message });
    },
  });
  const { errors } = save;
  const set = <K extends keyof RatesDraft>(key: K, value: RatesDraft[K]) => {
    setDraft((d) => ({ ...d, [key]: value }));
    save.clear((k) => k === key);
  };

  function submit(e: FormEvent) {
    e.preventDefault();
    setNote(null);
    const plan = planRates(book, draft);
    if (plan.kind === "invalid") return save.refuse(plan.fields);
    if (plan.kind === "unchanged") {
      save.refuse({});
      return setNote({ tone: "info", text: "Nothing to save: the rates are as shown." });
    }
    save.submit(plan.body);
  }

  if (!canWrite) {
    return (
      <Card title="Labour, markup and tax">
        <RatesReadOnly book={book} />
      </Card>
    );
  }
  return (
    <Card title="Labour, markup and tax">
      <form onSubmit={submit} className="space-y-4" noValidate>
        {note && <Notice tone={note.tone}>{note.text}</Notice>}
        <div className="max-w-md">
          <Field label="Price book name" name="book-name" error={errors.name}>
            <TextInput name="book-name" maxLength={120} value={draft.name} onChange={(e) => set("name", e.target.value)} error={errors.name} />
          </Field>
        </div>
        <div className="grid grid-cols-2 gap-3 sm:grid-cols-3">
          {FIELDS.map((f) => (
            <Field key={f.key} label={f.unit ? `${f.label} (${f.unit})` : f.label} name={`rate-${f.key}`} error={errors[f.key]} hint={f.hint}>
              <TextInput name={`rate-${f.key}`} inputMode="decimal" value={draft[f.key]} onChange={(e) => set(f.key, e.target.value)} error={errors[f.key]} />
            </Field>
          ))}
        </div>
        <label className="flex items-center gap-2 text-sm">
          <input type="checkbox" checked={draft.taxLabour} onChange={(e) => set("taxLabour", e.target.checked)} />
          Tax labour as well as materials
        </label>
        <SubmitButton pending={save.pending} busy="Saving…">
          Save rates
        </SubmitButton>
      </form>
    </Card>
  );
}
