/**
 * Server-side check of an uploaded plan set: refuses what the viewer cannot show and reads each page's
 * size, rotation, UserUnit and sheet number. Server-only (pdf.js parses on the calling thread in Node).
 */
import { rejections, PdfRejected } from "./errors";
import { loadPdfjs, serverDocumentParams, type Pdfjs } from "./pdfjs";
import { pickSheetLabel, type TextOnSheet } from "./sheet-label";

export { PdfRejected, isPdfRejected, type PdfRejectReason } from "./errors";

export interface PdfPageInfo {
  pageNumber: number;
  /** Unrotated page box (crop box clipped to the media box), PDF user-space units. */
  width: number;
  height: number;
  /** /Rotate, clockwise as displayed: 0, 90, 180 or 270. */
  rotation: 0 | 90 | 180 | 270;
  /** ISO 32000-1 §14.11.2: size of one user-space unit in 1/72 inch; 1 when absent. */
  userUnit: number;
  /** Sheet number read from the page's text ("A-201"), or null when none was found. */
  label: string | null;
}

export interface PdfInspection {
  pageCount: number;
  pages: PdfPageInfo[];
}

export interface PdfLimits {
  maxBytes?: number;
  maxPages?: number;
  /** Wall-clock budget for the whole inspection. */
  timeoutMs?: number;
}

export const DEFAULT_PDF_LIMITS = { maxBytes: 200 * 1024 * 1024, maxPages: 500, timeoutMs: 120_000 } as const;

const HEADER = [0x25, 0x50, 0x44, 0x46, 0x2d]; // "%PDF-"
/** Readers look for %%EOF in the last 1024 bytes (ISO 32000-1 §7.5.5 puts it on the file's last line). */
const EOF_WINDOW = 1024;

function startsWithHeader(bytes: Uint8Array): boolean {
  return HEADER.every((b, i) => bytes[i] === b);
}

function hasEofMarker(bytes: Uint8Array): boolean {
  const tail = Buffer.from(bytes.buffer, bytes.byteOffset, bytes.byteLength).subarray(-EOF_WINDOW);
  return tail.includes("%%EOF", 0, "latin1");
}

type PdfDocument = Awaited<ReturnType<Pdfjs["getDocument"]>["promise"]>;
type PdfPage = Awaited<ReturnType<PdfDocument["getPage"]>>;

/** Settles with `work`, or throws "too slow" once the deadline passes; checked between pages too. */
async function withDeadline<T>(work: Promise<T>, deadline: number, timeoutMs: number): Promise<T> {
  let timer: ReturnType<typeof setTimeout> | undefined;
  const expired = new Promise<never>((_, reject) => {
    timer = setTimeout(() => reject(rejections.tooSlow(Math.round(timeoutMs / 1000))), Math.max(0, deadline - Date.now()));
  });
  try {
    return await Promise.race([work, expired]);
  } finally {
    clearTimeout(timer);
  }
}

function normaliseRotation(rotate: number): PdfPageInfo["rotation"] {
  const r = (((Math.round(rotate / 90) * 90) % 360) + 360) % 360;
  return r as PdfPageInfo["rotation"];
}

/** Text items with their position as displayed (after /Rotate), for the title-block heuristic. */
async function textOnSheet(page: PdfPage): Promise<TextOnSheet[]> {
  const viewport = page.getViewport({ scale: 1 });
  const content = await page.getTextContent();
  const items: TextOnSheet[] = [];
  for (const item of content.items) {
    if (!("str" in item) || item.str.trim() === "") continue;
    const [a = 0, b = 0, c = 0, d = 0, e = 0, f = 0] = item.transform as number[];
    const [vx = 0, vy = 0] = viewport.convertToViewportPoint(e, f);
    items.push({
      text: item.str,
      size: Math.max(Math.hypot(a, b), Math.hypot(c, d)),
      x: vx / viewport.width,
      y: vy / viewport.height,
    });
  }
  return items;
}

function parseFailure(error: unknown, bytes: Uint8Array): PdfRejected {
  if (error instanceof PdfRejected) return error;
  const name = (error as { name?: unknown } | null)?.name;
  if (name === "PasswordException") return rejections.encrypted(error);
  return hasEofMarker(bytes) ? rejections.damaged(error) : rejections.truncated(error);
}

/**
 * Throws PdfRejected for files the product refuses. A PDF that is encrypted only to restrict printing or
 * editing (an owner password, empty user password) opens without a password, so it is accepted.
 */
export async function inspectPdf(bytes: Uint8Array, limits: PdfLimits = {}): Promise<PdfInspection> {
  const maxBytes = limits.maxBytes ?? DEFAULT_PDF_LIMITS.maxBytes;
  const maxPages = limits.maxPages ?? DEFAULT_PDF_LIMITS.maxPages;
  const timeoutMs = limits.timeoutMs ?? DEFAULT_PDF_LIMITS.timeoutMs;
  if (bytes.byteLength > maxBytes) throw rejections.tooLarge(bytes.byteLength, maxBytes);
  if (!startsWithHeader(bytes)) throw rejections.notPdf();

  const deadline = Date.now() + timeoutMs;
  const pdfjs = await loadPdfjs();
  const task = pdfjs.getDocument(serverDocumentParams(bytes));
  let doc: PdfDocument | null = null;
  try {
    doc = await withDeadline(task.promise, deadline, timeoutMs).catch((error: unknown) => {
      throw parseFailure(error, bytes);
    });
    const pageCount = doc.numPages;
    if (pageCount === 0) throw rejections.empty();
    if (pageCount > maxPages) throw rejections.tooManyPages(pageCount, maxPages);

    const pages: PdfPageInfo[] = [];
    for (let pageNumber = 1; pageNumber <= pageCount; pageNumber++) {
      const page = await withDeadline(doc.getPage(pageNumber), deadline, timeoutMs).catch((error: unknown) => {
        throw parseFailure(error, bytes);
      });
      // A page whose text can't be read still shows; it just gets no label.
      const text = await withDeadline(textOnSheet(page), deadline, timeoutMs).catch((error: unknown) => {
        if (error instanceof PdfRejected) throw error;
        return [];
      });
      const [x0 = 0, y0 = 0, x1 = 0, y1 = 0] = page.view;
      pages.push({
        pageNumber,
        width: x1 - x0,
        height: y1 - y0,
        rotation: normaliseRotation(page.rotate),
        userUnit: page.userUnit > 0 ? page.userUnit : 1,
        label: pickSheetLabel(text),
      });
      page.cleanup();
      // pdf.js runs on this thread: yield so other requests (and the deadline timer) get a turn.
      await new Promise((resolve) => setImmediate(resolve));
      if (Date.now() >= deadline) throw rejections.tooSlow(Math.round(timeoutMs / 1000));
    }
    return { pageCount, pages };
  } finally {
    // Destroying the task also destroys its document and frees pdf.js's copy of the bytes.
    await task.destroy().catch(() => undefined);
  }
}
