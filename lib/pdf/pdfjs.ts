/**
 * pdf.js for Node in TypeScript callers (server-side tests and fixtures read generated sheets with it). The
 * loader and the options for untrusted files live once, in pdfjs-node.mjs, which the upload-inspection
 * worker imports too; the browser viewer loads its own copy with a real worker.
 */
import type * as PdfjsModule from "pdfjs-dist/legacy/build/pdf.mjs";
import { loadPdfjs, untrustedDocumentParams } from "./pdfjs-node.mjs";

export type Pdfjs = typeof PdfjsModule;
export { loadPdfjs };

/** The untrusted-file options, on a copy of the bytes, because pdf.js detaches the buffer it is given. */
export const serverDocumentParams = (bytes: Uint8Array) => untrustedDocumentParams(bytes.slice());
