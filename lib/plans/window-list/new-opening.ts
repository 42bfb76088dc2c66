import { trimSpecSchema, wallBuildUpSchema, wallSetback, type GypsumBoard, type StudSize, type Style, type TrimSpec, type WallBuildUp } from "@/takeoff";
import { openingTypeCreateSchema, type OpeningTypeCreateInput } from "@/lib/validators/plans";
import { OPENING_KIND_NAMES } from "@/lib/validators/opening-kinds";
import { fieldErrorsOf } from "./field-errors";
import { readLength } from "./length-text";

/** The wall a window sits in, as typed in the form. */
export interface WallDraft {
  stud: StudSize;
  wallboard: GypsumBoard;
  layers: string;
  sheathing: string;
  frameDepth: string;
}

export type KindName = (typeof OPENING_KIND_NAMES)[number];

/** The kinds the form offers, in the words an estimator uses. */
export const KIND_CHOICES: { value: KindName; label: string }[] = [
  { value: "window", label: "Window" },
  { value: "mulled", label: "Mulled unit (twin, triple…)" },
  { value: "door", label: "Door" },
  { value: "round-top", label: "Round-top (half-round head)" },
  { value: "segment-top", label: "Segment head (eyebrow)" },
  { value: "bay", label: "Bay or bow" },
];

/** Which of the kind's own fields the form shows, beside mark and trim. */
export const KIND_FIELDS: Record<KindName, ("width" | "height" | "widths" | "mullGap" | "sides" | "springHeight" | "rise" | "turn" | "setback")[]> = {
  window: ["width", "height", "setback"],
  mulled: ["widths", "mullGap", "height", "setback"],
  door: ["width", "height", "sides"],
  "round-top": ["width", "springHeight", "setback"],
  "segment-top": ["width", "springHeight", "rise", "setback"],
  bay: ["widths", "mullGap", "turn", "height", "setback"],
};

/** Trim fields left empty take the organisation's defaults on the server. */
export interface OpeningDraft {
  kind: KindName;
  /** Unit widths, left to right, separated by commas (mulled units and bays). */
  widths: string;
  mullGap: string;
  sides: "1" | "2";
  springHeight: string;
  rise: string;
  turn: string;
  mark: string;
  width: string;
  height: string;
  setbackFrom: "typed" | "wall";
  setback: string;
  wall: WallDraft;
  style: "" | Style;
  casingWidth: string;
  casingThickness: string;
  reveal: string;
  stoolHorn: string;
  stoolProjection: string;
  apronInset: string;
  apronReturns: "" | "yes" | "no";
  extensionThickness: string;
  notes: string;
}

export const EMPTY_DRAFT: OpeningDraft = {
  kind: "window",
  widths: "",
  mullGap: "",
  sides: "2",
  springHeight: "",
  rise: "",
  turn: "",
  mark: "",
  width: "",
  height: "",
  setbackFrom: "typed",
  setback: "",
  wall: { stud: "2x6", wallboard: "1/2", layers: "1", sheathing: "", frameDepth: "" },
  style: "",
  casingWidth: "",
  casingThickness: "",
  reveal: "",
  stoolHorn: "",
  stoolProjection: "",
  apronInset: "",
  apronReturns: "",
  extensionThickness: "",
  notes: "",
};

type Fields = Record<string, string>;
export type WallRead = { ok: true; wall: WallBuildUp; setback: number } | { ok: false; fields: Fields };

/** The build-up as the engine takes it, and the setback it gives (stud + wallboard + sheathing − frame). */
export function readWall(w: WallDraft): WallRead {
  const fields: Fields = {};
  const layers = w.layers.trim() === "" ? 1 : Number(w.layers);
  if (!Number.isInteger(layers) || layers < 1 || layers > 4) fields["wallBuildUp.wallboardLayers"] = "Layers must be a whole number from 1 to 4.";
  const sheathing = w.sheathing.trim() === "" ? ({ ok: true, inches: 0 } as const) : readLength(w.sheathing, "Sheathing", { allowZero: true });
  if (!sheathing.ok) fields["wallBuildUp.sheathing"] = sheathing.message;
  const frame = readLength(w.frameDepth, "Frame depth");
  if (!frame.ok) fields["wallBuildUp.frameDepth"] = frame.message;
  if (!sheathing.ok || !frame.ok || Object.keys(fields).length > 0) return { ok: false, fields };

  const parsed = wallBuildUpSchema.safeParse({
    stud: w.stud,
    wallboard: w.wallboard,
    wallboardLayers: layers,
    ...(sheathing.inches > 0 ? { sheathing: sheathing.inches } : {}),
    frameDepth: frame.inches,
  });
  if (!parsed.success) return { ok: false, fields: fieldErrorsOf(parsed.error, "wallBuildUp.") };
  try {
    return { ok: true, wall: parsed.data, setback: wallSetback(parsed.data) };
  } catch (error) {
    // The engine names the field ("wall.frameDepth: …"); the form shows it beside that field.
    return { ok: false, fields: { "wallBuildUp.frameDepth": (error as Error).message.replace(/^wall\.\w+: /, "") } };
  }
}

const TRIM_LENGTHS = [
  ["casingWidth", "Casing width", false],
  ["casingThickness", "Casing thickness", false],
  ["reveal", "Reveal", true],
  ["stoolHorn", "Stool horn", true],
  ["stoolProjection", "Stool projection", true],
  ["apronInset", "Apron inset", true],
  ["extensionThickness", "Extension thickness", false],
] as const;

export type CreatePlan = { kind: "invalid"; fields: Fields } | { kind: "send"; body: OpeningTypeCreateInput };

/** The POST body for a new opening type, checked with the create schema the server uses. */
export function planCreate(d: OpeningDraft): CreatePlan {
  const fields: Fields = {};
  const trimSpec: Partial<TrimSpec> = {};
  if (d.style) trimSpec.style = d.style;
  for (const [key, label, allowZero] of TRIM_LENGTHS) {
    if (d[key].trim() === "") continue;
    const read = readLength(d[key], label, { allowZero });
    if (read.ok) trimSpec[key] = read.inches;
    else fields[`trimSpec.${key}`] = read.message;
  }
  if (d.apronReturns) trimSpec.apronReturns = d.apronReturns === "yes";

  // Cross-field rules (reveal under the casing width) need a whole spec; stand-ins fill what the
  // organisation's defaults will, and only messages about fields typed here are kept.
  if (trimSpec.casingWidth !== undefined) {
    const whole = trimSpecSchema.safeParse({ style: "stool-and-apron", casingThickness: 1, ...trimSpec });
    if (!whole.success) {
      for (const [key, message] of Object.entries(fieldErrorsOf(whole.error, "trimSpec."))) {
        if (key.slice("trimSpec.".length) in trimSpec) fields[key] ??= message;
      }
    }
  }

  const shows = new Set(KIND_FIELDS[d.kind]);
  let setback: { setback?: string } | { wallBuildUp: WallBuildUp } = shows.has("setback") ? { setback: d.setback } : {};
  if (shows.has("setback") && d.setbackFrom === "wall") {
    const wall = readWall(d.wall);
    if (wall.ok) setback = { wallBuildUp: wall.wall };
    // A stand-in so the schema checks the rest without also blaming the (unused) typed setback.
    else {
      Object.assign(fields, wall.fields);
      setback = { setback: "0" };
    }
  }

  const typed = (key: "width" | "height" | "mullGap" | "springHeight" | "rise" | "turn") => (shows.has(key) && d[key].trim() !== "" ? { [key]: d[key] } : {});
  const parsed = openingTypeCreateSchema.safeParse({
    mark: d.mark,
    ...(d.kind === "window" ? {} : { kind: d.kind }),
    ...(shows.has("width") ? { width: d.width } : {}),
    ...(shows.has("height") ? { height: d.height } : {}),
    ...typed("mullGap"),
    ...typed("springHeight"),
    ...typed("rise"),
    ...typed("turn"),
    ...(shows.has("widths") && d.widths.trim() !== "" ? { widths: d.widths.split(",").map((w) => w.trim()).filter((w) => w !== "") } : {}),
    ...(shows.has("sides") ? { sides: Number(d.sides) } : {}),
    ...setback,
    ...(Object.keys(trimSpec).length > 0 ? { trimSpec } : {}),
    notes: d.notes,
  });
  if (!parsed.success) {
    for (const [key, message] of Object.entries(fieldErrorsOf(parsed.error))) {
      // One field holds every unit width: a message about the third says so there.
      const unit = /^widths\.(\d+)$/.exec(key);
      if (unit) fields.widths ??= `Unit ${Number(unit[1]) + 1}: ${message}`;
      else fields[key] ??= message;
    }
  }
  if (!parsed.success || Object.keys(fields).length > 0) return { kind: "invalid", fields };
  return { kind: "send", body: parsed.data };
}
