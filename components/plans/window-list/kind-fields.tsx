"use client";

import { Field, Select, TextInput } from "@/components/ui/field";
import { KIND_FIELDS, type OpeningDraft } from "@/lib/plans/window-list/new-opening";

type Setter = <K extends keyof OpeningDraft>(key: K, value: OpeningDraft[K]) => void;

/** The fields a kind has beyond width and height: unit widths and mull gap, door sides, arch heights, bay angle. */
export function KindFields({ draft, set, errors }: { draft: OpeningDraft; set: Setter; errors: Record<string, string> }) {
  const shows = new Set(KIND_FIELDS[draft.kind]);
  const text = (key: "mullGap" | "springHeight" | "rise" | "turn", label: string, hint: string, placeholder: string) =>
    shows.has(key) && (
      <Field label={label} name={`new-${key}`} error={errors[key]} hint={hint}>
        <TextInput name={`new-${key}`} placeholder={placeholder} value={draft[key]} onChange={(e) => set(key, e.target.value)} error={errors[key]} />
      </Field>
    );
  return (
    <>
      {shows.has("widths") && (
        <Field label="Unit widths" name="new-widths" error={errors.widths} hint="Each unit jamb to jamb, left to right, separated by commas">
          <TextInput name="new-widths" placeholder="35 1/2, 35 1/2" value={draft.widths} onChange={(e) => set("widths", e.target.value)} error={errors.widths} />
        </Field>
      )}
      {text("mullGap", "Mull gap", "Between neighbouring units' inside jamb faces", "1 1/2")}
      {shows.has("sides") && (
        <Field label="Cased sides" name="new-sides" error={errors.sides}>
          <Select name="new-sides" value={draft.sides} onChange={(e) => set("sides", e.target.value as OpeningDraft["sides"])}>
            <option value="2">2 — interior door</option>
            <option value="1">1 — exterior door</option>
          </Select>
        </Field>
      )}
      {text("springHeight", "Spring height", draft.kind === "round-top" || draft.kind === "segment-top" ? "From the stool top (or bottom jamb) to where the arch starts" : "", "36")}
      {text("rise", "Rise", "Arch height above the spring line", "8")}
      {text("turn", "Corner turn (degrees)", "How far each corner turns from straight: 45 for a common bay", "45")}
    </>
  );
}
