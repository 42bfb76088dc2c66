/**
 * A small content-stream writer for one sheet. pdf-lib's drawLine and friends wrap every call in q/Q and
 * allocate operator objects; a 20,000-path benchmark sheet is far cheaper written as text once.
 * Coordinates are paper points (see sheet-frame.ts); one `cm` at the start maps them to user space.
 * Every stroke is its own path (m … S), so "N paths" means N stroke operations to a reader.
 */
import type { PDFDocument, PDFFont, PDFPage } from "pdf-lib";
import type { Matrix } from "./sheet-frame";

export type Align = "left" | "center" | "right";

export interface TextOptions {
  size: number;
  align?: Align;
  /** Degrees counter-clockwise. */
  angle?: number;
  bold?: boolean;
}

/** Three decimals: 0.0005 pt is 0.00075 in at 1/4" = 1'-0", far below what anyone can pick. */
export function num(v: number): string {
  const s = v.toFixed(3);
  return s.includes(".") ? s.replace(/\.?0+$/, "") || "0" : s;
}

export class Pen {
  private readonly ops: string[] = [];
  private width = -1;
  private gray = -1;
  private readonly fontKey: string;
  private readonly boldKey: string;

  constructor(
    private readonly page: PDFPage,
    private readonly font: PDFFont,
    private readonly bold: PDFFont,
    matrix: Matrix,
  ) {
    this.fontKey = page.node.newFontDictionary(font.name, font.ref).toString();
    this.boldKey = page.node.newFontDictionary(bold.name, bold.ref).toString();
    this.ops.push(`${matrix.map(num).join(" ")} cm 1 J 1 j 0 g`);
  }

  /** Line weight in points and stroke gray (0 black … 1 white). */
  style(width: number, gray = 0): this {
    if (width !== this.width) this.ops.push(`${num(width)} w`);
    if (gray !== this.gray) this.ops.push(`${num(gray)} G`);
    this.width = width;
    this.gray = gray;
    return this;
  }

  line(x1: number, y1: number, x2: number, y2: number): this {
    this.ops.push(`${num(x1)} ${num(y1)} m ${num(x2)} ${num(y2)} l S`);
    return this;
  }

  polyline(points: readonly (readonly [number, number])[], close = false): this {
    const [first, ...rest] = points;
    if (!first) return this;
    const body = rest.map(([x, y]) => `${num(x)} ${num(y)} l`).join(" ");
    this.ops.push(`${num(first[0])} ${num(first[1])} m ${body} ${close ? "s" : "S"}`);
    return this;
  }

  rect(x: number, y: number, w: number, h: number, fill?: number): this {
    const r = `${num(x)} ${num(y)} ${num(w)} ${num(h)} re`;
    this.ops.push(fill === undefined ? `${r} S` : `${num(fill)} g ${r} B 0 g`);
    return this;
  }

  filledRect(x: number, y: number, w: number, h: number, fill: number): this {
    this.ops.push(`${num(fill)} g ${num(x)} ${num(y)} ${num(w)} ${num(h)} re f 0 g`);
    return this;
  }

  /** Arc about (cx, cy) from angle a0 to a1 (degrees, counter-clockwise), as Bézier quarters or less. */
  arc(cx: number, cy: number, r: number, a0: number, a1: number): this {
    const steps = Math.max(1, Math.ceil(Math.abs(a1 - a0) / 90));
    const step = ((a1 - a0) / steps) * (Math.PI / 180);
    // Control-point distance for a circular arc of angle `step`: 4/3 tan(step/4).
    const k = (4 / 3) * Math.tan(step / 4);
    let t = a0 * (Math.PI / 180);
    const parts = [`${num(cx + r * Math.cos(t))} ${num(cy + r * Math.sin(t))} m`];
    for (let i = 0; i < steps; i++) {
      const t2 = t + step;
      const c1 = [cx + r * (Math.cos(t) - k * Math.sin(t)), cy + r * (Math.sin(t) + k * Math.cos(t))];
      const c2 = [cx + r * (Math.cos(t2) + k * Math.sin(t2)), cy + r * (Math.sin(t2) - k * Math.cos(t2))];
      parts.push(`${c1.map(num).join(" ")} ${c2.map(num).join(" ")} ${num(cx + r * Math.cos(t2))} ${num(cy + r * Math.sin(t2))} c`);
      t = t2;
    }
    this.ops.push(`${parts.join(" ")} S`);
    return this;
  }

  circle(cx: number, cy: number, r: number): this {
    return this.arc(cx, cy, r, 0, 360);
  }

  textWidth(text: string, size: number, bold = false): number {
    return (bold ? this.bold : this.font).widthOfTextAtSize(text, size);
  }

  /** Text with its baseline through (x, y); `align` picks which end of the line sits at x. */
  text(text: string, x: number, y: number, opts: TextOptions): this {
    const { size, align = "left", angle = 0, bold = false } = opts;
    const w = this.textWidth(text, size, bold);
    const shift = align === "left" ? 0 : align === "center" ? w / 2 : w;
    const cos = Math.cos((angle * Math.PI) / 180);
    const sin = Math.sin((angle * Math.PI) / 180);
    const hex = (bold ? this.bold : this.font).encodeText(text).toString();
    const tm = [cos, sin, -sin, cos, x - shift * cos, y - shift * sin].map(num).join(" ");
    this.ops.push(`BT ${bold ? this.boldKey : this.fontKey} ${num(size)} Tf ${tm} Tm ${hex} Tj ET`);
    return this;
  }

  /** Writes the collected operators as the page's content stream (compressed). */
  finish(doc: PDFDocument): void {
    const stream = doc.context.flateStream(this.ops.join("\n"));
    this.page.node.addContentStream(doc.context.register(stream));
  }
}
