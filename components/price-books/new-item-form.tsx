"use client";

import { useState, type FormEvent } from "react";
import { Button } from "@/components/ui/button";
import { Card, Notice } from "@/components/ui/card";
import { FormError, SubmitButton } from "@/components/ui/form-error";
import { Field, Select, TextInput } from "@/components/ui/field";
import { request } from "@/lib/client/fetch";
import { useFormMutation } from "@/lib/client/use-form-mutation";
import { emptyItemDraft, planNewItem, type NewItemDraft } from "@/lib/price-books/forms";
import { KIND_LABELS, MATERIAL_KINDS, type MaterialKind } from "@/lib/price-books/kinds";
import type { PriceBookItemView } from "@/lib/price-books/types";

const cellInput = "w-full rounded-md border border-graphite-400 bg-white px-2 py-1.5 text-sm text-graphite-900 placeholder:text-graphite-500 aria-[invalid=true]:border-alarm-600";

/** Adds a material: its profile, and the stock lengths it is sold in with a price for each. */
export function NewItemForm({ base, onAdded }: { base: string; onAdded: (item: PriceBookItemView) => void }) {
  const [draft, setDraft] = useState<NewItemDraft>(() => emptyItemDraft());
  const [added, setAdded] = useState<string | null>(null);
  const create = useFormMutation({
    mutationFn: (body: unknown) => request<{ item: PriceBookItemView }>(`${base}/items`, { method: "POST", body }),
    onSuccess: ({ item }) => {
      onAdded(item);
      setAdded(item.name);
      // The next line is usually the same profile in another species or size: keep kind and lengths.
      setDraft((d) => ({ ...emptyItemDraft(d.kind), stock: d.stock.map((s) => ({ length: s.length, price: "" })) }));
    },
  });
  const { errors } = create;
  const set = <K extends keyof NewItemDraft>(key: K, value: NewItemDraft[K]) => {
    setDraft((d) => ({ ...d, [key]: value }));
    create.clear((k) => k === key);
  };
  const setStock = (i: number, part: "length" | "price", value: string) => {
    setDraft((d) => ({ ...d, stock: d.stock.map((s, j) => (j === i ? { ...s, [part]: value } : s)) }));
    create.clear((k) => k === `stock.${i}.${part}` || k === "stock");
  };

  function submit(e: FormEvent) {
    e.preventDefault();
    setAdded(null);
    const plan = planNewItem(draft);
    if (plan.kind !== "send") return create.refuse(plan.kind === "invalid" ? plan.fields : {});
    create.submit(plan.body);
  }

  const text = (key: "name" | "faceWidth" | "thickness" | "species" | "supplierCode", label: string, placeholder: string, hint?: string) => (
    <Field label={label} name={`new-${key}`} error={errors[key]} hint={hint}>
      <TextInput name={`new-${key}`} placeholder={placeholder} value={draft[key]} onChange={(e) => set(key, e.target.value)} error={errors[key]} />
    </Field>
  );
  return (
    <Card title="Add an item">
      <form onSubmit={submit} className="space-y-4" noValidate>
        <FormError form={create} countFields />
        {added && <Notice>Added {added}.</Notice>}
        <div className="grid grid-cols-2 gap-3 sm:grid-cols-3">
          {text("name", "Name", "Casing 2 1/2 colonial")}
          <Field label="Kind" name="new-kind" error={errors.kind}>
            <Select name="new-kind" value={draft.kind} onChange={(e) => set("kind", e.target.value as MaterialKind)} error={errors.kind}>
              {MATERIAL_KINDS.map((k) => (
                <option key={k} value={k}>
                  {KIND_LABELS[k]}
                </option>
              ))}
            </Select>
          </Field>
          {text("species", "Species or finish", "Poplar")}
          {text("faceWidth", "Face width", "2 1/2", "Board width for extension stock")}
          {text("thickness", "Thickness", "11/16")}
          {text("supplierCode", "Supplier code (optional)", "")}
        </div>
        <fieldset className="space-y-2">
          <legend className="text-sm font-semibold text-graphite-900">Stock lengths and prices</legend>
          {errors.stock && <p className="text-xs font-medium text-alarm-700" role="alert">⚠ {errors.stock}</p>}
          <table className="text-sm">
            <thead className="text-left text-graphite-700">
              <tr>
                <th className="pr-2 font-medium">Length</th>
                <th className="pr-2 font-medium">Price ($)</th>
                <th>
                  <span className="sr-only">Remove</span>
                </th>
              </tr>
            </thead>
            <tbody>
              {draft.stock.map((s, i) => {
                const le = errors[`stock.${i}.length`];
                const pe = errors[`stock.${i}.price`];
                return (
                  <tr key={i} className="align-top">
                    <td className="pb-1 pr-2">
                      <input aria-label={`Stock length ${i + 1}`} aria-invalid={le ? true : undefined} className={`${cellInput} w-24`} placeholder="10'" value={s.length} onChange={(e) => setStock(i, "length", e.target.value)} />
                      {le && <p className="mt-0.5 max-w-48 text-xs font-medium text-alarm-700">⚠ {le}</p>}
                    </td>
                    <td className="pb-1 pr-2">
                      <input aria-label={`Price of stock length ${i + 1}`} aria-invalid={pe ? true : undefined} inputMode="decimal" className={`${cellInput} num w-24`} placeholder="0.00" value={s.price} onChange={(e) => setStock(i, "price", e.target.value)} />
                      {pe && <p className="mt-0.5 max-w-48 text-xs font-medium text-alarm-700">⚠ {pe}</p>}
                    </td>
                    <td className="pb-1">
                      <Button type="button" look="quiet" className="px-2 py-1 text-xs" aria-label={`Remove stock length ${i + 1}`} onClick={() => set("stock", draft.stock.filter((_, j) => j !== i))} disabled={draft.stock.length === 1}>
                        <span aria-hidden>✕</span>
                      </Button>
                    </td>
                  </tr>
                );
              })}
            </tbody>
          </table>
          <Button type="button" look="secondary" className="px-2.5 py-1 text-xs" disabled={draft.stock.length >= 12} onClick={() => set("stock", [...draft.stock, { length: "", price: "" }])}>
            Add a length
          </Button>
        </fieldset>
        <SubmitButton pending={create.pending} busy="Adding…">
          Add to price book
        </SubmitButton>
      </form>
    </Card>
  );
}
