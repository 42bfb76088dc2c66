/**
 * Generated plan sets of an invented project — Larkspur Commons, Building C, in the invented town of
 * Alder Bend, drawn by the invented Tallowmere Architects — for the demo seed, tests and benchmarks.
 * Output is deterministic for given options.
 */
import { PDFDocument, StandardFonts } from "pdf-lib";
import { COMMON_AREAS, UNIT_LAYOUTS, type UnitLayout, type UnitTypeKey } from "./layouts";
import { drawSheet } from "./sheet";
import type { Rotation } from "./sheet-frame";
import type { GeneratedSheet, PlanSetOptions } from "./types";

export type { GeneratedSheet, GeneratedWindow, KnownDimension, PlanSetOptions } from "./types";
export { DEMO_WINDOW_TYPES, type UnitTypeKey, type WindowMark } from "./layouts";
export { PLAN_SCALE_RATIO } from "./sheet";
export { SHEET_HEIGHT_PT, SHEET_WIDTH_PT, type Rotation } from "./sheet-frame";
export { PROJECT as DEMO_PROJECT } from "./title-block";

const MAX_PAGES = 600;
const KEY_PLAN_CELL: Record<UnitLayout["key"], number> = { A: 0, B: 1, C: 2, common: 4 };
const FIXED_DATE = new Date("2026-02-09T12:00:00Z");

interface Planned {
  layout: UnitLayout;
  label: string;
  title: string;
  subtitle: string | null;
}

/** Sheet numbers: common areas A-101, unit types A-201…; further levels continue from A-301. */
function planSheets(base: readonly UnitLayout[], pages: number): Planned[] {
  const out: Planned[] = [];
  for (let i = 0; i < pages; i++) {
    const layout = base[i % base.length] as UnitLayout;
    const level = Math.floor(i / base.length) + 1;
    const unitIndex = base.filter((l) => l.key !== "common").indexOf(layout);
    const label = level > 1 ? `A-${301 + i - base.length}` : layout.key === "common" ? "A-101" : `A-${201 + unitIndex}`;
    const title = layout.key === "common" ? `LEVEL ${level} — COMMON AREAS PLAN` : layout.title;
    out.push({ layout, label, title, subtitle: layout.key === "common" ? null : `LEVEL ${level}` });
  }
  return out;
}

export async function generatePlanSet(opts: PlanSetOptions = {}): Promise<{ bytes: Uint8Array; sheets: GeneratedSheet[] }> {
  const unitTypes = opts.unitTypes ?? ["A", "B", "C"];
  if (unitTypes.length === 0 || new Set(unitTypes).size !== unitTypes.length) {
    throw new RangeError("unitTypes must list one to three different unit types");
  }
  const base = [...(opts.commonArea === false ? [] : [COMMON_AREAS]), ...unitTypes.map((k: UnitTypeKey) => UNIT_LAYOUTS[k])];
  const pages = opts.pages ?? base.length;
  if (!Number.isInteger(pages) || pages < 1 || pages > MAX_PAGES) throw new RangeError(`pages must be 1–${MAX_PAGES}`);
  const dense = opts.dense ?? 0;
  if (!Number.isInteger(dense) || dense < 0) throw new RangeError("dense must be a whole number ≥ 0");
  const rotations: readonly Rotation[] = Array.isArray(opts.rotate) ? opts.rotate : [(opts.rotate as Rotation | undefined) ?? 0];
  if (rotations.length === 0) throw new RangeError("rotate list is empty");

  const doc = await PDFDocument.create();
  doc.setTitle("Larkspur Commons, Building C — Floor Plans");
  doc.setAuthor("Tallowmere Architects");
  doc.setCreator("Miterwise demo plan generator");
  doc.setProducer("Miterwise demo plan generator");
  doc.setCreationDate(FIXED_DATE);
  doc.setModificationDate(FIXED_DATE);
  const fonts = {
    regular: await doc.embedFont(StandardFonts.Helvetica),
    bold: await doc.embedFont(StandardFonts.HelveticaBold),
  };
  const sheets = planSheets(base, pages).map((s, i) =>
    drawSheet(doc, fonts, {
      pageNumber: i + 1,
      label: s.label,
      layout: s.layout,
      title: s.title,
      subtitle: s.subtitle,
      keyPlanCell: KEY_PLAN_CELL[s.layout.key],
      rotation: rotations[i % rotations.length] as Rotation,
      userUnit: opts.userUnit ?? 1,
      dense,
    }),
  );
  return { bytes: await doc.save(), sheets };
}
