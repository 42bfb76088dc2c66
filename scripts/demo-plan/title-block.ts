/**
 * Sheet border, title block, drawing title, window schedule and notes. Every name here is invented:
 * the firm, the project, its street and town.
 */
import type { Pen } from "./pen";
import { DEMO_WINDOW_TYPES, type WindowMark } from "./layouts";
import { feetInches } from "./annotate";
import { SHEET_HEIGHT_PT, SHEET_WIDTH_PT } from "./sheet-frame";

export const PROJECT = {
  firm: "TALLOWMERE ARCHITECTS",
  firmAddress: ["212 Cinder Quay, Suite 4", "Alder Bend"],
  name: "LARKSPUR COMMONS",
  building: "BUILDING C",
  address: "88 Foxglove Row, Alder Bend",
  number: "PROJECT NO. 24-117",
  issue: "ISSUED FOR BID",
  date: "2026-02-09",
} as const;

/** Binding margin on the left, half an inch elsewhere (common practice for ARCH D sets). */
export const BORDER = { left: 72, right: SHEET_WIDTH_PT - 36, bottom: 36, top: SHEET_HEIGHT_PT - 36 } as const;
export const TITLE_BLOCK_WIDTH = 216;
export const TITLE_BLOCK_LEFT = BORDER.right - TITLE_BLOCK_WIDTH;

export interface TitleBlockInfo {
  label: string;
  title: string;
  subtitle: string | null;
  scaleNote: string;
  /** Which cells of the key plan to hatch. */
  keyPlanCell: number;
}

/** A small key plan: the building's units along one corridor, the ones this sheet shows hatched. */
const KEY_PLAN_CELLS = 8;

function keyPlan(pen: Pen, x: number, y: number, cell: number): void {
  const w = 22;
  const h = 26;
  pen.style(0.4);
  for (let i = 0; i < KEY_PLAN_CELLS; i++) {
    pen.rect(x + i * w, y, w, h);
    if (i % KEY_PLAN_CELLS !== cell % KEY_PLAN_CELLS) continue;
    pen.style(0.25);
    for (let d = 4; d < w + h; d += 4) {
      const x0 = Math.max(0, d - h);
      const x1 = Math.min(w, d);
      pen.line(x + i * w + x0, y + d - x0, x + i * w + x1, y + d - x1);
    }
    pen.style(0.4);
  }
  pen.text("KEY PLAN", x, y + h + 6, { size: 6, bold: true });
}

export function titleBlock(pen: Pen, info: TitleBlockInfo): void {
  const L = TITLE_BLOCK_LEFT + 10;
  const R = BORDER.right - 10;
  pen.style(2).rect(BORDER.left, BORDER.bottom, BORDER.right - BORDER.left, BORDER.top - BORDER.bottom);
  pen.style(1.5).line(TITLE_BLOCK_LEFT, BORDER.bottom, TITLE_BLOCK_LEFT, BORDER.top);
  let y = BORDER.top - 30;
  pen.text(PROJECT.firm, L, y, { size: 11, bold: true });
  for (const line of PROJECT.firmAddress) pen.text(line, L, (y -= 12), { size: 7 });
  const rule = (at: number) => pen.style(0.5).line(TITLE_BLOCK_LEFT, at, BORDER.right, at);
  rule((y -= 16));
  pen.text(PROJECT.name, L, (y -= 22), { size: 13, bold: true });
  pen.text(PROJECT.building, L, (y -= 15), { size: 9, bold: true });
  pen.text(PROJECT.address, L, (y -= 12), { size: 7 });
  rule((y -= 12));
  pen.text("REV", L, (y -= 14), { size: 6, bold: true });
  pen.text("DATE", L + 30, y, { size: 6, bold: true });
  pen.text("DESCRIPTION", L + 80, y, { size: 6, bold: true });
  for (let i = 0; i < 5; i++) pen.style(0.25).line(L, (y -= 14), R, y);
  rule((y -= 10));
  keyPlan(pen, L + 10, (y -= 50), info.keyPlanCell);
  rule((y -= 14));
  pen.text(PROJECT.number, L, (y -= 14), { size: 7 });
  pen.text(`DATE: ${PROJECT.date}`, L, (y -= 11), { size: 7 });
  pen.text(PROJECT.issue, L, (y -= 11), { size: 7 });
  pen.text("DRAWN: JRV    CHECKED: MKO", L, (y -= 11), { size: 7 });

  const titleTop = BORDER.bottom + 150;
  rule(titleTop);
  pen.text("SHEET TITLE", L, titleTop - 12, { size: 6 });
  pen.text(info.title, L, titleTop - 28, { size: 9, bold: true });
  if (info.subtitle) pen.text(info.subtitle, L, titleTop - 40, { size: 8, bold: true });
  pen.text(info.scaleNote, L, titleTop - 56, { size: 7 });
  rule(BORDER.bottom + 70);
  pen.text("SHEET", L, BORDER.bottom + 58, { size: 6 });
  pen.text(info.label, R, BORDER.bottom + 16, { size: 36, bold: true, align: "right" });
}

export function drawingTitle(pen: Pen, x: number, y: number, title: string, scaleNote: string): void {
  pen.style(0.6).circle(x + 14, y + 4, 14);
  pen.text("1", x + 14, y, { size: 12, bold: true, align: "center" });
  pen.style(1.2).line(x + 34, y, x + 34 + pen.textWidth(title, 12, true) + 20, y);
  pen.text(title, x + 36, y + 4, { size: 12, bold: true });
  pen.text(scaleNote, x + 36, y - 12, { size: 8 });
}

export function windowSchedule(pen: Pen, x: number, y: number, counts: ReadonlyMap<WindowMark, number>): void {
  const cols = [0, 50, 110, 170, 300];
  const heads = ["MARK", "WIDTH", "HEIGHT", "TYPE", "QTY"];
  pen.text("WINDOW SCHEDULE (ROUGH OPENINGS)", x, y + 14, { size: 9, bold: true });
  pen.style(0.6).line(x, y + 8, x + 330, y + 8);
  heads.forEach((h, i) => pen.text(h, x + (cols[i] ?? 0), y - 4, { size: 7, bold: true }));
  let row = y - 8;
  pen.style(0.3).line(x, row, x + 330, row);
  for (const [mark, t] of Object.entries(DEMO_WINDOW_TYPES) as [WindowMark, (typeof DEMO_WINDOW_TYPES)[WindowMark]][]) {
    row -= 14;
    const cells = [mark, feetInches(t.widthInches), feetInches(t.heightInches), t.description, String(counts.get(mark) ?? 0)];
    cells.forEach((c, i) => pen.text(c, x + (cols[i] ?? 0), row + 4, { size: 7 }));
    pen.line(x, row, x + 330, row);
  }
}

const NOTES = [
  "GENERAL NOTES",
  "1. EXTERIOR DIMENSIONS ARE TO OUTSIDE FACE OF SHEATHING.",
  "2. WINDOWS ARE LOCATED TO CENTERLINE OF ROUGH OPENING.",
  "3. VERIFY ROUGH OPENINGS WITH WINDOW SUPPLIER BEFORE FRAMING.",
  "4. INTERIOR PARTITIONS: 2x4 STUDS, 1/2\" GYPSUM BOARD EACH SIDE.",
  "5. DO NOT SCALE DRAWINGS; WRITTEN DIMENSIONS GOVERN.",
];

export function generalNotes(pen: Pen, x: number, y: number): void {
  NOTES.forEach((line, i) => pen.text(line, x, y - i * 12, { size: i === 0 ? 9 : 7, bold: i === 0 }));
}
