import { TRIM_DEFAULTS, trimSpecSchema, type Style, type TrimSpec } from "@/takeoff";
import type { OpeningTypeView } from "@/lib/plans/api-types";
import { openingTypeUpdateSchema, type OpeningTypeUpdateInput } from "@/lib/validators/plans";
import { editText, effectiveTrim } from "./display";
import { fieldErrorsOf } from "./field-errors";
import { readLength, splitCasing, tape } from "./length-text";

/** One edited cell, as typed. */
export type CellEdit =
  | { column: "mark" | "notes" | "width" | "height" | "setback" | "casing" | "reveal" | "horn" | "extension"; text: string }
  | { column: "style"; style: Style }
  | { column: "apron"; text: string; returns: boolean };

export type PatchPlan =
  | { kind: "unchanged" }
  | { kind: "invalid"; fields: Record<string, string> }
  | { kind: "send"; body: OpeningTypeUpdateInput };

const invalid = (key: string, message: string): PatchPlan => ({ kind: "invalid", fields: { [key]: message } });

/** Optional trim lengths: an empty cell goes back to the engine default (see `trimField`). */
const TRIM_LENGTH = {
  reveal: { key: "reveal", label: "Reveal", fallback: TRIM_DEFAULTS.reveal, allowZero: true },
  horn: { key: "stoolHorn", label: "Stool horn", fallback: null, allowZero: true },
  extension: { key: "extensionThickness", label: "Extension thickness", fallback: TRIM_DEFAULTS.extensionThickness, allowZero: false },
} as const;

/**
 * An emptied trim cell means "use the default". The API cannot remove a field from a spec, so the
 * default is sent as a value; that is the same length to the engine. The horn has no fixed default
 * (it follows the casing thickness), so once set it has to stay a typed length.
 */
function trimField(row: OpeningTypeView, column: keyof typeof TRIM_LENGTH, text: string): PatchPlan | Partial<TrimSpec> {
  const f = TRIM_LENGTH[column];
  if (text === "") {
    if (f.fallback === null) {
      const auto = tape(effectiveTrim({ ...row.trimSpec, stoolHorn: undefined }).stoolHorn.value);
      return invalid(`trimSpec.${f.key}`, `Type a horn length; twice the casing thickness is ${auto}.`);
    }
    return { [f.key]: f.fallback };
  }
  const read = readLength(text, f.label, { allowZero: f.allowZero });
  return read.ok ? { [f.key]: read.inches } : invalid(`trimSpec.${f.key}`, read.message);
}

const isPlan = (x: PatchPlan | Partial<TrimSpec>): x is PatchPlan => "kind" in x;

/** The parts of the PATCH body one cell stands for, before the shared schema checks them. */
function draftBody(row: OpeningTypeView, edit: CellEdit): PatchPlan | { fields: Record<string, unknown>; trimSpec?: Partial<TrimSpec> } {
  switch (edit.column) {
    case "mark":
    case "notes":
    case "width":
    case "height":
    case "setback":
      // Lengths go as typed: the update schema parses them exactly as the server will.
      return { fields: { [edit.column]: edit.text } };
    case "style":
      return { fields: {}, trimSpec: { style: edit.style } };
    case "casing": {
      const parts = splitCasing(edit.text);
      if (!parts) return invalid("trimSpec.casingWidth", "Write the casing as width × thickness, e.g. 2 1/2 x 11/16.");
      const width = readLength(parts[0], "Casing width");
      if (!width.ok) return invalid("trimSpec.casingWidth", width.message);
      const thickness = readLength(parts[1], "Casing thickness");
      if (!thickness.ok) return invalid("trimSpec.casingThickness", thickness.message);
      return { fields: {}, trimSpec: { casingWidth: width.inches, casingThickness: thickness.inches } };
    }
    case "reveal":
    case "horn":
    case "extension": {
      const part = trimField(row, edit.column, edit.text);
      return isPlan(part) ? part : { fields: {}, trimSpec: part };
    }
    case "apron": {
      const trimSpec: Partial<TrimSpec> = {};
      if (edit.text !== editText(row, "apron")) {
        const read = edit.text === "" ? ({ ok: true, inches: TRIM_DEFAULTS.apronInset } as const) : readLength(edit.text, "Apron inset", { allowZero: true });
        if (!read.ok) return invalid("trimSpec.apronInset", read.message);
        trimSpec.apronInset = read.inches;
      }
      if (edit.returns !== effectiveTrim(row.trimSpec).apronReturns.value) trimSpec.apronReturns = edit.returns;
      return { fields: {}, trimSpec };
    }
  }
}

function unchanged(row: OpeningTypeView, edit: CellEdit): boolean {
  if (edit.column === "style") return edit.style === row.trimSpec.style;
  if (edit.column === "apron") return false; // decided field by field in draftBody
  return edit.text.trim() === editText(row, edit.column).trim();
}

/**
 * Turns one edited cell into the PATCH body for the opening type, checked in the browser with the same
 * schemas the server uses: the update schema for the body and the engine's trim spec schema for the spec
 * as it will be after the change (so "reveal wider than the casing" is caught before sending).
 */
export function planCellPatch(row: OpeningTypeView, raw: CellEdit): PatchPlan {
  const edit = "text" in raw ? { ...raw, text: raw.text.trim() } : raw;
  if (unchanged(row, edit)) return { kind: "unchanged" };
  const draft = draftBody(row, edit);
  if ("kind" in draft) return draft;
  if (draft.trimSpec && Object.keys(draft.trimSpec).length === 0) return { kind: "unchanged" };

  const candidate = { version: row.version, ...draft.fields, ...(draft.trimSpec ? { trimSpec: draft.trimSpec } : {}) };
  const parsed = openingTypeUpdateSchema.safeParse(candidate);
  if (!parsed.success) return { kind: "invalid", fields: fieldErrorsOf(parsed.error) };
  if (draft.trimSpec) {
    const spec = trimSpecSchema.safeParse({ ...row.trimSpec, ...draft.trimSpec });
    if (!spec.success) return { kind: "invalid", fields: fieldErrorsOf(spec.error, "trimSpec.") };
  }
  return { kind: "send", body: parsed.data };
}
