// pdfjs-dist ships no types for its worker entry; only its presence matters to lib/pdf/pdfjs.ts.
declare module "pdfjs-dist/legacy/build/pdf.worker.mjs" {
  export const WorkerMessageHandler: unknown;
}
