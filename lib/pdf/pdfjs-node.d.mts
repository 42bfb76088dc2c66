// Types for lib/pdf/pdfjs-node.mjs (plain JavaScript so worker threads can load it unbundled).
import type * as PdfjsModule from "pdfjs-dist/legacy/build/pdf.mjs";

export function loadPdfjs(): Promise<typeof PdfjsModule>;
export function untrustedDocumentParams(data: Uint8Array): {
  data: Uint8Array;
  isEvalSupported: false;
  disableFontFace: true;
  useSystemFonts: false;
  disableAutoFetch: true;
  disableStream: true;
  stopAtErrors: false;
  verbosity: number;
};
