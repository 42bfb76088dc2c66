/**
 * Server-side check of an uploaded plan set: refuses what the viewer cannot show and reads each page's
 * size, rotation, UserUnit and sheet number. Server-only. pdf.js runs in a worker thread
 * (inspect-worker.mjs through inspect-pool.ts), so one upload never stalls the requests of everyone else.
 */
import { rejections } from "./errors";
import { runInspection, WorkerFailed, type WorkerAnswer } from "./inspect-pool";
import { pickSheetLabel } from "./sheet-label";

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
  /** Wall-clock budget for the whole inspection; past it the worker is terminated. */
  timeoutMs?: number;
  /** Decompression-bomb caps: bytes one stream may inflate to, and all content streams together. */
  maxDecodedStreamBytes?: number;
  maxDecodedBytes?: number;
}

const MB = 1024 * 1024;
/**
 * 256 MB per stream passes a 24 × 36 in sheet scanned at 300 dpi in 24-bit colour (233 MB decoded); 1 GB of
 * drawing content is far beyond any plan set we have seen (derived: ~2 MB of content per vector sheet × 500 pages).
 */
export const DEFAULT_PDF_LIMITS = {
  maxBytes: 200 * MB,
  maxPages: 500,
  timeoutMs: 120_000,
  maxDecodedStreamBytes: 256 * MB,
  maxDecodedBytes: 1024 * MB,
} as const;

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

function normaliseRotation(rotate: number): PdfPageInfo["rotation"] {
  const r = (((Math.round(rotate / 90) * 90) % 360) + 360) % 360;
  return r as PdfPageInfo["rotation"];
}

function refusal(answer: Exclude<WorkerAnswer, { ok: true }>, bytes: Uint8Array, limits: Required<PdfLimits>) {
  switch (answer.reason) {
    case "decoded-too-large":
      return rejections.decodedTooLarge(limits.maxDecodedStreamBytes);
    case "empty":
      return rejections.empty();
    case "too-many-pages":
      return rejections.tooManyPages(answer.pages, limits.maxPages);
    case "too-slow":
      return rejections.tooSlow(Math.round(limits.timeoutMs / 1000));
    case "encrypted":
      return rejections.encrypted();
    case "unreadable":
      return hasEofMarker(bytes) ? rejections.damaged() : rejections.truncated();
  }
}

/**
 * Throws PdfRejected for files the product refuses. A PDF that is encrypted only to restrict printing or
 * editing (an owner password, empty user password) opens without a password, so it is accepted.
 */
export async function inspectPdf(bytes: Uint8Array, options: PdfLimits = {}): Promise<PdfInspection> {
  const limits: Required<PdfLimits> = { ...DEFAULT_PDF_LIMITS, ...options };
  if (bytes.byteLength > limits.maxBytes) throw rejections.tooLarge(bytes.byteLength, limits.maxBytes);
  if (!startsWithHeader(bytes)) throw rejections.notPdf();

  let answer: WorkerAnswer;
  try {
    answer = await runInspection(bytes, limits);
  } catch (error) {
    if (error instanceof WorkerFailed && error.kind === "deadline") throw rejections.tooSlow(Math.round(limits.timeoutMs / 1000));
    if (error instanceof WorkerFailed && error.kind === "memory") throw rejections.decodedTooLarge(limits.maxDecodedStreamBytes, error);
    throw error;
  }
  if (!answer.ok) throw refusal(answer, bytes, limits);
  return {
    pageCount: answer.pageCount,
    pages: answer.pages.map(({ text, ...page }) => ({
      ...page,
      rotation: normaliseRotation(page.rotation),
      userUnit: page.userUnit > 0 ? page.userUnit : 1,
      label: pickSheetLabel(text),
    })),
  };
}
