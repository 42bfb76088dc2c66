"use client";

import { useState, type FormEvent } from "react";
import { Card, Notice } from "@/components/ui/card";
import { Field, Select, TextInput } from "@/components/ui/field";
import { FormError, SubmitButton } from "@/components/ui/form-error";
import { saveSettings, type ClientSettings } from "@/lib/client/settings";
import { useFormMutation } from "@/lib/client/use-form-mutation";
import { fieldErrorsOf } from "@/lib/plans/window-list/field-errors";
import { PLAN_SECONDS, settingsSchema } from "@/lib/validators/settings";
import { formatLengthExact, parseLength } from "@/takeoff";

const LENGTHS = ["casingWidth", "casingThickness", "reveal", "stoolHorn", "stoolProjection", "apronInset", "extensionThickness"] as const;
const LABELS: Record<(typeof LENGTHS)[number], string> = {
  casingWidth: "Casing width",
  casingThickness: "Casing thickness",
  reveal: "Reveal (blank: 1/8\")",
  stoolHorn: "Stool horn (blank: 2 × casing thickness)",
  stoolProjection: "Stool projection (blank: 1\")",
  apronInset: "Apron inset (blank: 0)",
  extensionThickness: "Extension thickness (blank: 3/4\")",
};

const FIELD_NAMES: Record<string, string> = {
  ...Object.fromEntries(LENGTHS.map((k) => [`trimDefaults.${k}`, LABELS[k].replace(/ \(.*\)$/, "")])),
  "trimDefaults.style": "Style",
  kerf: "Saw kerf",
  wastePercent: "Waste allowance",
  ripKerf: "Rip kerf",
  planSeconds: "Board-order time limit",
  scarfOverlap: "Scarf overlap",
  _: "Settings",
};

/** The company's defaults: what a new window type starts from, and the kerf and waste every takeoff uses. */
export function SettingsForm({ orgSlug, initial, canWrite }: { orgSlug: string; initial: ClientSettings; canWrite: boolean }) {
  // What is stored now: the form's untouched fields are compared with it, so they send the stored number back.
  const [stored, setStored] = useState(initial);
  const save = useFormMutation({ mutationFn: (body: unknown) => saveSettings(orgSlug, body), onSuccess: (saved: ClientSettings) => setStored(saved) });
  const { errors } = save;

  const t = initial.trimDefaults;
  // Exact, so a 3/32" kerf shows as 3/32" and not as the 1/8" it would round to.
  const len = (v: number | undefined) => (v === undefined ? "" : formatLengthExact(v).replace(/"$/, ""));

  function submit(e: FormEvent<HTMLFormElement>) {
    e.preventDefault();
    const form = Object.fromEntries(new FormData(e.currentTarget)) as Record<string, string>;
    const bad: Record<string, string> = {};
    const spec: Record<string, unknown> = { style: form.style, apronReturns: form.apronReturns === "yes" };
    for (const key of LENGTHS) {
      const text = form[key]?.trim();
      if (!text) continue;
      // A field left as shown keeps the stored number itself: nothing is re-read, so nothing can drift.
      if (text === len(t[key])) {
        spec[key] = t[key];
        continue;
      }
      try {
        spec[key] = parseLength(text);
      } catch {
        bad[`trimDefaults.${key}`] = "Write a length such as 2 1/2 or 11/16.";
      }
    }
    const kerfText = form.kerf?.trim() ?? "";
    const ripText = form.ripKerf?.trim() ?? "";
    const scarfText = form.scarfOverlap?.trim() ?? "";
    const body = {
      trimDefaults: spec,
      kerf: kerfText === len(stored.kerf) ? stored.kerf : kerfText,
      wastePercent: form.wastePercent,
      // Blank: rips take the saw kerf (sent as null, which clears a rip kerf set before).
      ripKerf: ripText === "" ? null : ripText === len(stored.ripKerf ?? undefined) ? stored.ripKerf : ripText,
      planSeconds: form.planSeconds,
      // Blank: back to the default overlap.
      scarfOverlap: scarfText === "" ? null : scarfText === len(stored.scarfOverlap) ? stored.scarfOverlap : scarfText,
    };
    // The API's own schema over the whole form, so every wrong field is named at once, not the first.
    const checked = settingsSchema.safeParse(body);
    const all = { ...(checked.success ? {} : fieldErrorsOf(checked.error)), ...bad };
    if (Object.keys(all).length > 0) return save.refuse(all);
    save.submit(body);
  }

  const count = Object.keys(errors).length;
  return (
    <div className="max-w-3xl space-y-6">
      <h1 className="text-2xl font-bold">Company settings</h1>
      <form onSubmit={submit} noValidate className="space-y-6">
        <fieldset disabled={!canWrite} className="space-y-6">
          <Card title="Trim defaults">
            <p className="mb-3 text-sm text-graphite-700">
              A new window type starts from these. {initial.trimDefaultsOwn ? "" : "Until you save your own, Miterwise's starting values are shown."}
            </p>
            <div className="grid gap-3 sm:grid-cols-2">
              <Field label="Style" name="style">
                <Select name="style" defaultValue={t.style}>
                  <option value="stool-and-apron">Stool and apron</option>
                  <option value="picture-frame">Picture frame</option>
                </Select>
              </Field>
              <Field label="Apron ends" name="apronReturns">
                <Select name="apronReturns" defaultValue={t.apronReturns === false ? "no" : "yes"}>
                  <option value="yes">Return mitered</option>
                  <option value="no">Square</option>
                </Select>
              </Field>
              {LENGTHS.map((key) => (
                <Field key={key} label={LABELS[key]} name={key} error={errors[`trimDefaults.${key}`]}>
                  <TextInput name={key} defaultValue={len(t[key])} error={errors[`trimDefaults.${key}`]} />
                </Field>
              ))}
            </div>
          </Card>
          <Card title="Takeoffs">
            <div className="grid gap-3 sm:grid-cols-2">
              <Field label="Saw kerf" name="kerf" error={errors.kerf} hint="Taken by every cut, e.g. 1/8.">
                <TextInput name="kerf" defaultValue={len(initial.kerf)} error={errors.kerf} />
              </Field>
              <Field label="Waste allowance (%)" name="wastePercent" error={errors.wastePercent} hint="Extra boards for defects and miscuts.">
                <TextInput name="wastePercent" inputMode="decimal" defaultValue={String(initial.wastePercent)} error={errors.wastePercent} />
              </Field>
              <Field
                label="Rip kerf"
                name="ripKerf"
                error={errors.ripKerf}
                hint="Taken by each rip between strips of one board, e.g. 1/8 for a full-kerf table-saw blade. Blank: the saw kerf."
              >
                <TextInput name="ripKerf" defaultValue={len(initial.ripKerf ?? undefined)} placeholder={`Saw kerf (${len(initial.kerf)})`} error={errors.ripKerf} />
              </Field>
              <Field
                label="Board-order time limit (seconds)"
                name="planSeconds"
                error={errors.planSeconds}
                hint={`How long a takeoff may search for the cheapest board orders, ${PLAN_SECONDS.min} to ${PLAN_SECONDS.max} s (default ${PLAN_SECONDS.default}). On large jobs a longer limit can find cheaper orders; each run takes up to this long.`}
              >
                <TextInput name="planSeconds" inputMode="decimal" defaultValue={String(initial.planSeconds)} error={errors.planSeconds} />
              </Field>
              <Field
                label="Scarf overlap"
                name="scarfOverlap"
                error={errors.scarfOverlap}
                hint="A piece longer than every stock length is spliced from two boards with a scarf joint; each joint takes this much extra length. Blank: 1."
              >
                <TextInput name="scarfOverlap" defaultValue={len(initial.scarfOverlap)} error={errors.scarfOverlap} />
              </Field>
            </div>
          </Card>
        </fieldset>
        {count > 0 && (
          <Notice tone="error">
            {count === 1 ? "One field needs" : `${count} fields need`} attention: {Object.keys(errors).map((k) => FIELD_NAMES[k] ?? k).join(", ")} (see beside {count === 1 ? "it" : "each"}).
          </Notice>
        )}
        {count === 0 && <FormError form={save} />}
        {save.mutation.isSuccess && <Notice>Saved. New window types and takeoffs use these from now on.</Notice>}
        {canWrite ? <SubmitButton pending={save.pending} busy="Save settings">Save settings</SubmitButton> : <p className="text-sm text-graphite-600">Only admins change these.</p>}
      </form>
    </div>
  );
}
