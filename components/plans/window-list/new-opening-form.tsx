"use client";

import { useState, type FormEvent } from "react";
import { Button } from "@/components/ui/button";
import { Card, Notice } from "@/components/ui/card";
import { FormError, SubmitButton } from "@/components/ui/form-error";
import { Field, Select, TextInput } from "@/components/ui/field";
import type { OpeningTypeView } from "@/lib/plans/api-types";
import { tape } from "@/lib/plans/window-list/length-text";
import { EMPTY_DRAFT, KIND_CHOICES, KIND_FIELDS, planCreate, type OpeningDraft } from "@/lib/plans/window-list/new-opening";
import { KindFields } from "./kind-fields";
import { request } from "@/lib/client/fetch";
import { projectPath } from "@/lib/client/project-scope";
import { useFormMutation } from "@/lib/client/use-form-mutation";
import { TrimSpecFields } from "./trim-spec-fields";
import { WallBuildUpFields } from "./wall-build-up-fields";

/** Adds a line to the window list. Lengths are typed as people write them and checked before sending. */
export function NewOpeningForm({ orgSlug, projectId, onAdded }: { orgSlug: string; projectId: string; onAdded: (row: OpeningTypeView) => void }) {
  const [draft, setDraft] = useState<OpeningDraft>(EMPTY_DRAFT);
  const [added, setAdded] = useState<OpeningTypeView | null>(null);
  const create = useFormMutation({
    mutationFn: (body: unknown) => request<{ openingType: OpeningTypeView }>(`${projectPath({ orgSlug, projectId })}/opening-types`, { method: "POST", body }),
    onSuccess: ({ openingType }) => {
      onAdded(openingType);
      setAdded(openingType);
      // The next line of a window list usually shares the wall and trim: keep those, clear the rest.
      setDraft((d) => ({ ...d, mark: "", width: "", height: "", widths: "", springHeight: "", rise: "", notes: "" }));
    },
  });
  const { errors } = create;
  const set = <K extends keyof OpeningDraft>(key: K, value: OpeningDraft[K]) => {
    setDraft((d) => ({ ...d, [key]: value }));
    // A message stays only until its field is changed; the next check says whether it still holds.
    create.clear((k) => k === key || k === `trimSpec.${key}` || (key === "wall" && k.startsWith("wallBuildUp.")));
  };

  function submit(e: FormEvent) {
    e.preventDefault();
    setAdded(null);
    const plan = planCreate(draft);
    if (plan.kind === "invalid") return create.refuse(plan.fields);
    create.submit(plan.body);
  }

  return (
    <Card title="Add an opening type">
      <form onSubmit={submit} className="space-y-4" noValidate>
        <FormError form={create} countFields />
        {added && <Notice>Added {added.mark}: {tape(added.width)} × {tape(added.height)}, setback {tape(added.setback)}.</Notice>}
        <div className="grid grid-cols-2 gap-3 sm:grid-cols-3">
          <Field label="Mark" name="new-mark" error={errors.mark}>
            <TextInput name="new-mark" placeholder="W1" maxLength={12} value={draft.mark} onChange={(e) => set("mark", e.target.value)} error={errors.mark} />
          </Field>
          <Field label="Kind" name="new-kind" error={errors.kind}>
            <Select name="new-kind" value={draft.kind} onChange={(e) => set("kind", e.target.value as OpeningDraft["kind"])}>
              {KIND_CHOICES.map((k) => (
                <option key={k.value} value={k.value}>
                  {k.label}
                </option>
              ))}
            </Select>
          </Field>
          {KIND_FIELDS[draft.kind].includes("width") && (
            <Field label="Width" name="new-width" error={errors.width} hint="Jamb to jamb">
              <TextInput name="new-width" placeholder={`35 1/2 or 2'-11 1/2"`} value={draft.width} onChange={(e) => set("width", e.target.value)} error={errors.width} />
            </Field>
          )}
          {KIND_FIELDS[draft.kind].includes("height") && (
            <Field label="Height" name="new-height" error={errors.height} hint={draft.kind === "door" ? "Floor to the underside of the head jamb" : undefined}>
              <TextInput name="new-height" placeholder={`59 1/2 or 4'-11 1/2"`} value={draft.height} onChange={(e) => set("height", e.target.value)} error={errors.height} />
            </Field>
          )}
          <KindFields draft={draft} set={set} errors={errors} />
        </div>
        {KIND_FIELDS[draft.kind].includes("setback") && (
        <fieldset className="space-y-2">
          <legend className="text-sm font-semibold text-graphite-900">Setback (finished wall face to jamb edge)</legend>
          <div className="flex flex-wrap gap-4 text-sm">
            {(
              [
                ["typed", "Type it"],
                ["wall", "Work it out from the wall build-up"],
              ] as const
            ).map(([value, label]) => (
              <label key={value} className="flex items-center gap-2">
                <input type="radio" name="setbackFrom" value={value} checked={draft.setbackFrom === value} onChange={() => set("setbackFrom", value)} />
                {label}
              </label>
            ))}
          </div>
          {draft.setbackFrom === "typed" && (
            <div className="max-w-xs">
              <Field label="Setback" name="new-setback" error={errors.setback}>
                <TextInput name="new-setback" placeholder="4 9/16" value={draft.setback} onChange={(e) => set("setback", e.target.value)} error={errors.setback} />
              </Field>
            </div>
          )}
          {draft.setbackFrom === "wall" && <WallBuildUpFields wall={draft.wall} onChange={(wall) => set("wall", wall)} errors={errors} />}
        </fieldset>
        )}
        <TrimSpecFields draft={draft} set={set} errors={errors} />
        <Field label="Notes" name="new-notes" error={errors.notes}>
          <TextInput name="new-notes" maxLength={500} value={draft.notes} onChange={(e) => set("notes", e.target.value)} error={errors.notes} />
        </Field>
        <div className="flex flex-wrap gap-3">
          <SubmitButton pending={create.pending} busy="Adding…">
            Add to window list
          </SubmitButton>
          <Button type="button" look="secondary" onClick={() => (setDraft(EMPTY_DRAFT), setAdded(null), create.reset())}>
            Clear
          </Button>
        </div>
      </form>
    </Card>
  );
}
