/** Why an uploaded file was refused. The reason is for code and logs; the message is shown to the estimator. */
export type PdfRejectReason =
  | "not-pdf"
  | "encrypted"
  | "truncated"
  | "damaged"
  | "empty"
  | "too-large"
  | "too-many-pages"
  | "too-slow"
  | "decoded-too-large";

export class PdfRejected extends Error {
  readonly reason: PdfRejectReason;

  constructor(reason: PdfRejectReason, message: string, options?: { cause?: unknown }) {
    super(message, options);
    this.name = "PdfRejected";
    this.reason = reason;
  }
}

export function isPdfRejected(error: unknown): error is PdfRejected {
  return error instanceof PdfRejected;
}

const MB = 1024 * 1024;

function sizeText(bytes: number): string {
  return bytes >= MB ? `${Math.round(bytes / MB)} MB` : `${Math.ceil(bytes / 1024)} KB`;
}

/** User-facing wording in one place, so the upload route and the tests agree. */
export const rejections = {
  notPdf: () =>
    new PdfRejected("not-pdf", "This file is not a PDF. Export or print the plan set to PDF and upload that file."),
  encrypted: (cause?: unknown) =>
    new PdfRejected(
      "encrypted",
      "This PDF is password-protected. Ask the architect for an unlocked copy, or open it and save a copy without a password, then upload that.",
      { cause },
    ),
  truncated: (cause?: unknown) =>
    new PdfRejected(
      "truncated",
      "This PDF is incomplete: the file stops before its end, as if the download or upload was cut short. Download it again and re-upload.",
      { cause },
    ),
  damaged: (cause?: unknown) =>
    new PdfRejected(
      "damaged",
      "This PDF is damaged and can't be read. Try re-exporting it from the original program, or ask the architect for a fresh copy.",
      { cause },
    ),
  empty: () => new PdfRejected("empty", "This PDF has no pages."),
  tooLarge: (bytes: number, maxBytes: number) =>
    new PdfRejected(
      "too-large",
      `This PDF is ${sizeText(bytes)}; the limit is ${sizeText(maxBytes)}. Split the set into smaller files (for example by discipline) and upload each.`,
    ),
  tooManyPages: (pages: number, maxPages: number) =>
    new PdfRejected(
      "too-many-pages",
      `This PDF has ${pages} pages; the limit is ${maxPages}. Split the set into smaller files and upload each.`,
    ),
  /** A decompression bomb, or a file that needs more memory to read than one upload may take. */
  decodedTooLarge: (maxStreamBytes: number, cause?: unknown) =>
    new PdfRejected(
      "decoded-too-large",
      `This PDF unpacks to more than ${sizeText(maxStreamBytes)} of data in one part, far more than a plan set needs, so it was refused and nothing was kept. It may be damaged or built to overload readers; re-export it from the original program.`,
      { cause },
    ),
  tooSlow: (seconds: number) =>
    new PdfRejected(
      "too-slow",
      `This PDF took longer than ${seconds} seconds to read, so it was stopped. It may be damaged; try re-exporting it.`,
    ),
};
