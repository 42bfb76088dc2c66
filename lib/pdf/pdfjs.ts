/**
 * Loads pdf.js for Node (server-only: the browser viewer loads its own copy with a real worker).
 * Node has no Web Workers, so pdf.js parses on the calling thread through its "fake worker". We hand it the
 * worker module ourselves instead of letting it `import("./pdf.worker.mjs")` relative to its own file,
 * which breaks once a bundler has moved pdf.js into a server chunk.
 */
import type * as PdfjsModule from "pdfjs-dist/legacy/build/pdf.mjs";

export type Pdfjs = typeof PdfjsModule;

let loading: Promise<Pdfjs> | null = null;

export function loadPdfjs(): Promise<Pdfjs> {
  loading ??= (async () => {
    const [pdfjs, worker] = await Promise.all([
      import("pdfjs-dist/legacy/build/pdf.mjs"),
      import("pdfjs-dist/legacy/build/pdf.worker.mjs"),
    ]);
    const g = globalThis as { pdfjsWorker?: unknown };
    g.pdfjsWorker ??= worker;
    return pdfjs;
  })();
  loading.catch(() => {
    loading = null;
  });
  return loading;
}

/**
 * Options for parsing untrusted uploads on the server: no eval of font programs, no font-face or system
 * fonts, no network, quiet logging. The bytes are copied because pdf.js transfers (detaches) the buffer.
 */
export function serverDocumentParams(bytes: Uint8Array) {
  return {
    data: bytes.slice(),
    isEvalSupported: false,
    disableFontFace: true,
    useSystemFonts: false,
    disableAutoFetch: true,
    disableStream: true,
    stopAtErrors: false,
    verbosity: 0,
  };
}
