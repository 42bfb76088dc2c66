// @ts-check
/**
 * pdf.js for Node, shared by the upload-inspection worker (lib/pdf/inspect-worker.mjs) and the server-side
 * test helpers (lib/pdf/pdfjs.ts). Plain JavaScript because worker threads load files as they are on disk.
 *
 * Node has no Web Workers, so pdf.js parses on the calling thread through its "fake worker". We hand it the
 * worker module ourselves instead of letting it `import("./pdf.worker.mjs")` relative to its own file,
 * which breaks once a bundler has moved pdf.js into a server chunk.
 */

/** @type {Promise<typeof import("pdfjs-dist/legacy/build/pdf.mjs")> | null} */
let loading = null;

export function loadPdfjs() {
  loading ??= Promise.all([import("pdfjs-dist/legacy/build/pdf.mjs"), import("pdfjs-dist/legacy/build/pdf.worker.mjs")]).then(
    ([pdfjs, worker]) => {
      /** @type {{ pdfjsWorker?: unknown }} */ (globalThis).pdfjsWorker ??= worker;
      return pdfjs;
    },
  );
  loading.catch(() => {
    loading = null;
  });
  return loading;
}

/**
 * Options for parsing untrusted uploads: no eval of font programs, no font-face or system fonts, no
 * network, quiet logging. pdf.js transfers (detaches) the buffer it is given.
 * @param {Uint8Array} data
 */
export function untrustedDocumentParams(data) {
  return {
    data,
    isEvalSupported: false,
    disableFontFace: true,
    useSystemFonts: false,
    disableAutoFetch: true,
    disableStream: true,
    stopAtErrors: false,
    verbosity: 0,
  };
}
