"use client";

import { TRIM_DEFAULTS } from "@/takeoff";
import { Field, Select, TextInput } from "@/components/ui/field";
import { FALLBACK_TRIM_SPEC } from "@/lib/plans/default-trim";
import { STYLE_LABELS } from "@/lib/plans/window-list/columns";
import { tape } from "@/lib/plans/window-list/length-text";
import type { OpeningDraft } from "@/lib/plans/window-list/new-opening";

type TrimKey = "casingWidth" | "casingThickness" | "reveal" | "stoolHorn" | "stoolProjection" | "apronInset" | "extensionThickness";

/** Placeholders show what the engine falls back to; the organisation's own defaults may differ. */
const LENGTHS: { key: TrimKey; label: string; placeholder: string }[] = [
  { key: "casingWidth", label: "Casing width", placeholder: tape(FALLBACK_TRIM_SPEC.casingWidth) },
  { key: "casingThickness", label: "Casing thickness", placeholder: tape(FALLBACK_TRIM_SPEC.casingThickness) },
  { key: "reveal", label: "Reveal", placeholder: tape(TRIM_DEFAULTS.reveal) },
  { key: "stoolHorn", label: "Stool horn", placeholder: `${TRIM_DEFAULTS.hornPerCasingThickness} × casing thickness` },
  { key: "stoolProjection", label: "Stool projection", placeholder: tape(TRIM_DEFAULTS.stoolProjection) },
  { key: "apronInset", label: "Apron inset", placeholder: tape(TRIM_DEFAULTS.apronInset) },
  { key: "extensionThickness", label: "Extension thickness", placeholder: tape(TRIM_DEFAULTS.extensionThickness) },
];

export function TrimSpecFields({
  draft,
  set,
  errors,
}: {
  draft: OpeningDraft;
  set: <K extends keyof OpeningDraft>(key: K, value: OpeningDraft[K]) => void;
  errors: Record<string, string>;
}) {
  return (
    <fieldset className="space-y-2">
      <legend className="text-sm font-semibold text-graphite-900">Trim</legend>
      <p className="text-xs text-graphite-600">Fields left blank take your company&apos;s defaults; the grey examples are the usual values.</p>
      <div className="grid grid-cols-2 gap-3 sm:grid-cols-3 lg:grid-cols-5">
        <Field label="Style" name="new-style" error={errors["trimSpec.style"]}>
          <Select name="new-style" value={draft.style} onChange={(e) => set("style", e.target.value as OpeningDraft["style"])}>
            <option value="">Company default</option>
            {Object.entries(STYLE_LABELS).map(([value, label]) => (
              <option key={value} value={value}>
                {label}
              </option>
            ))}
          </Select>
        </Field>
        {LENGTHS.map(({ key, label, placeholder }) => (
          <Field key={key} label={label} name={`new-${key}`} error={errors[`trimSpec.${key}`]}>
            <TextInput name={`new-${key}`} placeholder={placeholder} value={draft[key]} onChange={(e) => set(key, e.target.value)} error={errors[`trimSpec.${key}`]} />
          </Field>
        ))}
        <Field label="Apron ends" name="new-apronReturns" error={errors["trimSpec.apronReturns"]}>
          <Select name="new-apronReturns" value={draft.apronReturns} onChange={(e) => set("apronReturns", e.target.value as OpeningDraft["apronReturns"])}>
            <option value="">Company default</option>
            <option value="yes">Return miters</option>
            <option value="no">Square cut</option>
          </Select>
        </Field>
      </div>
    </fieldset>
  );
}
