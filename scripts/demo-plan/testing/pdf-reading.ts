/**
 * Test helpers: read back what a PDF really draws, through pdf.js (the same parser the viewer uses),
 * rather than trusting the generator's own numbers. Server/test only.
 */
import { loadPdfjs, type Pdfjs } from "@/lib/pdf/pdfjs";

type PdfDocument = Awaited<ReturnType<Pdfjs["getDocument"]>["promise"]>;
export type PdfPage = Awaited<ReturnType<PdfDocument["getPage"]>>;

export interface StrokeSegment {
  x1: number;
  y1: number;
  x2: number;
  y2: number;
  /** Line width as set in the content stream (before the CTM). */
  width: number;
}

export interface PageText {
  str: string;
  /** Baseline origin, user space. */
  x: number;
  y: number;
  size: number;
}

export async function openPdf(bytes: Uint8Array): Promise<PdfDocument> {
  const pdfjs = await loadPdfjs();
  return pdfjs.getDocument({ data: bytes.slice(), verbosity: 0, isEvalSupported: false }).promise;
}

type M = [number, number, number, number, number, number];
const multiply = (m: M, n: M): M => [
  m[0] * n[0] + m[2] * n[1],
  m[1] * n[0] + m[3] * n[1],
  m[0] * n[2] + m[2] * n[3],
  m[1] * n[2] + m[3] * n[3],
  m[0] * n[4] + m[2] * n[5] + m[4],
  m[1] * n[4] + m[3] * n[5] + m[5],
];

/**
 * Every stroked straight segment on a page in user space, and how many stroke paint operations there were.
 * Curves are skipped (their end points still move the pen).
 */
export async function strokesOf(page: PdfPage): Promise<{ segments: StrokeSegment[]; strokeCount: number }> {
  const pdfjs = await loadPdfjs();
  const { OPS } = pdfjs;
  const STROKES = new Set<number>([OPS.stroke, OPS.closeStroke, OPS.fillStroke, OPS.eoFillStroke, OPS.closeFillStroke, OPS.closeEOFillStroke]);
  const list = await page.getOperatorList();
  let ctm: M = [1, 0, 0, 1, 0, 0];
  let width = 1;
  const stack: { ctm: M; width: number }[] = [];
  const segments: StrokeSegment[] = [];
  let strokeCount = 0;
  list.fnArray.forEach((fn, i) => {
    const args = list.argsArray[i] as unknown[];
    if (fn === OPS.save) stack.push({ ctm, width });
    else if (fn === OPS.restore) ({ ctm, width } = stack.pop() ?? { ctm, width });
    else if (fn === OPS.transform) ctm = multiply(ctm, args as M);
    else if (fn === OPS.setLineWidth) width = args[0] as number;
    else if (fn === OPS.constructPath && STROKES.has(args[0] as number)) {
      strokeCount++;
      const data = (args[1] as ArrayLike<number>[])[0] ?? [];
      const at = (x: number, y: number) => [ctm[0] * x + ctm[2] * y + ctm[4], ctm[1] * x + ctm[3] * y + ctm[5]] as const;
      let pen: readonly [number, number] = [0, 0];
      let start = pen;
      for (let k = 0; k < data.length; ) {
        const op = data[k++];
        if (op === 0) pen = start = at(data[k++] ?? 0, data[k++] ?? 0);
        else if (op === 1) {
          const next = at(data[k++] ?? 0, data[k++] ?? 0);
          segments.push({ x1: pen[0], y1: pen[1], x2: next[0], y2: next[1], width });
          pen = next;
        } else if (op === 2) {
          k += 4;
          pen = at(data[k++] ?? 0, data[k++] ?? 0);
        } else if (op === 3) {
          if (pen[0] !== start[0] || pen[1] !== start[1]) segments.push({ x1: pen[0], y1: pen[1], x2: start[0], y2: start[1], width });
          pen = start;
        } else throw new Error(`unknown path op ${op}`);
      }
    }
  });
  return { segments, strokeCount };
}

export async function textOf(page: PdfPage): Promise<PageText[]> {
  const content = await page.getTextContent();
  return content.items.flatMap((item) => {
    if (!("str" in item)) return [];
    const [a = 0, b = 0, , , e = 0, f = 0] = item.transform as number[];
    return [{ str: item.str, x: e, y: f, size: Math.hypot(a, b) }];
  });
}
