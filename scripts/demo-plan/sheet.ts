/** Composes one floor-plan sheet: page set-up, plan, annotation, title block; reports what it drew. */
import { PDFName, PDFNumber, degrees, type PDFDocument, type PDFFont } from "pdf-lib";
import { dimensionChainH, dimensionChainV, northArrow, scaleBar } from "./annotate";
import { drawPlan, windowSize, type Placement } from "./draw-plan";
import { drawFlooring, flooringSegments } from "./flooring";
import { drawFurniture } from "./furniture";
import type { UnitLayout, WindowMark } from "./layouts";
import { Pen } from "./pen";
import { sheetFrame, type Rotation } from "./sheet-frame";
import { drawingTitle, generalNotes, titleBlock, windowSchedule } from "./title-block";
import type { GeneratedSheet } from "./types";

/** 1/4" = 1'-0": one real foot is a quarter inch of paper, so real/paper = 48. */
export const PLAN_SCALE_RATIO = 48;
export const PLAN_SCALE_NOTE = `SCALE: 1/4" = 1'-0"`;
/** Paper points per real inch at that scale: 72 / 48. */
const K = 72 / PLAN_SCALE_RATIO;
/** Center of the plan's field, left of the schedules (paper points). */
const FIELD_CENTER = { x: 861, y: 904 };

export interface SheetSpec {
  pageNumber: number;
  label: string;
  layout: UnitLayout;
  title: string;
  subtitle: string | null;
  keyPlanCell: number;
  rotation: Rotation;
  userUnit: number;
  dense: number;
}

export function drawSheet(doc: PDFDocument, fonts: { regular: PDFFont; bold: PDFFont }, spec: SheetSpec): GeneratedSheet {
  const { layout } = spec;
  const frame = sheetFrame(spec.rotation, spec.userUnit);
  const page = doc.addPage([frame.pageWidth, frame.pageHeight]);
  if (spec.rotation !== 0) page.setRotation(degrees(spec.rotation));
  if (spec.userUnit !== 1) page.node.set(PDFName.of("UserUnit"), PDFNumber.of(spec.userUnit));
  const pen = new Pen(page, fonts.regular, fonts.bold, frame.matrix);

  const p: Placement = {
    ox: FIELD_CENTER.x - (layout.width * K) / 2,
    oy: FIELD_CENTER.y - (layout.depth * K) / 2,
    k: K,
  };
  const right = p.ox + layout.width * K;
  const top = p.oy + layout.depth * K;

  drawFlooring(pen, flooringSegments(layout.rooms, p, spec.dense, spec.pageNumber));
  for (const room of layout.rooms) drawFurniture(pen, room, p);
  const placed = drawPlan(pen, layout, p);

  const along = (side: "bottom" | "left" | "right") =>
    layout.windows.filter((w) => w.side === side).map((w) => w.at * K).sort((a, b) => a - b);
  const bottomChain = [p.ox, ...along("bottom").map((v) => p.ox + v), right];
  dimensionChainH(pen, bottomChain, p.oy - 84, p.oy, K);
  const overallY = p.oy - 120;
  dimensionChainH(pen, [p.ox, right], overallY, p.oy, K);
  dimensionChainV(pen, [p.oy, ...along("left").map((v) => p.oy + v), top], p.ox - 84, p.ox, K);
  dimensionChainV(pen, [p.oy, top], p.ox - 120, p.ox, K);
  if (along("right").length > 0) dimensionChainV(pen, [p.oy, ...along("right").map((v) => p.oy + v), top], right + 84, right, K);

  drawingTitle(pen, p.ox - 120, p.oy - 190, spec.title, PLAN_SCALE_NOTE);
  scaleBar(pen, p.ox - 84, p.oy - 236, K, "GRAPHIC SCALE");
  northArrow(pen, right + 160, top + 40);
  const counts = new Map<WindowMark, number>();
  for (const w of layout.windows) counts.set(w.mark, (counts.get(w.mark) ?? 0) + 1);
  windowSchedule(pen, 1700, 1560, counts);
  generalNotes(pen, 1700, 1400);
  titleBlock(pen, { label: spec.label, title: spec.title, subtitle: spec.subtitle, scaleNote: PLAN_SCALE_NOTE, keyPlanCell: spec.keyPlanCell });
  pen.finish(doc);

  const a = frame.toUser(p.ox, overallY);
  const b = frame.toUser(right, overallY);
  return {
    pageNumber: spec.pageNumber,
    label: spec.label,
    title: spec.title,
    unitTypeName: layout.unitTypeName,
    scaleRatio: PLAN_SCALE_RATIO,
    rotation: spec.rotation,
    userUnit: spec.userUnit,
    width: frame.pageWidth,
    height: frame.pageHeight,
    windows: placed.map((w) => ({ mark: w.mark, ...frame.toUser(w.x, w.y), ...windowSize(w.mark) })),
    knownDimension: { ax: a.x, ay: a.y, bx: b.x, by: b.y, inches: layout.width },
  };
}
