// @ts-check
/**
 * The pdf.js side of checking an upload, run in a worker thread (lib/pdf/inspect.ts owns the pool), so a
 * hostile or merely huge PDF never holds the server's request thread. Plain JavaScript because worker
 * threads load files as they are on disk — under `next start`, vitest and tsx alike; nothing here is
 * transpiled. It answers facts and reason codes; the wording of a refusal lives in lib/pdf/errors.ts.
 */
import { createInflate, constants as zlib } from "node:zlib";
import { loadPdfjs, untrustedDocumentParams } from "./pdfjs-node.mjs";

/**
 * @typedef {{ maxPages: number, maxDecodedStreamBytes: number, maxDecodedBytes: number, deadline: number }} Limits
 * @typedef {{ text: string, size: number, x: number, y: number }} TextOnSheet
 * @typedef {{ pageNumber: number, width: number, height: number, rotation: number, userUnit: number, text: TextOnSheet[] }} PageFacts
 * @typedef {{ ok: true, pageCount: number, pages: PageFacts[] }
 *   | { ok: false, reason: "decoded-too-large", decodedBytes: number }
 *   | { ok: false, reason: "empty" | "too-slow" | "encrypted" | "unreadable" }
 *   | { ok: false, reason: "too-many-pages", pages: number }} Answer
 */

const STREAM = Buffer.from("stream", "latin1");
const ENDSTREAM = Buffer.from("endstream", "latin1");
/** How far before `stream` the stream's dictionary is looked for. */
const DICT_WINDOW = 4096;
/** Per page, text items kept for the sheet-label heuristic: enough for any title block, bounded against floods. */
const MAX_TEXT_ITEMS = 20_000;

/**
 * A decompression bomb is a small file whose streams inflate to gigabytes, and pdf.js has no cap on
 * decoded bytes. So before pdf.js parses anything, every stream whose first filter is FlateDecode is
 * inflated here — counted in 16 KiB chunks and thrown away, so counting holds no more memory than that —
 * and refused past a cap per stream. Content, font and object streams (what pdf.js decodes while
 * inspecting) also count against a cap for the whole file; images do not, since inspection never decodes
 * them and scanned sheets are legitimately large. A stream whose chain starts with another filter is not
 * measured; the hard deadline and the worker's memory limit still stop such a file.
 * ISO 32000-1 §7.3.8 (stream objects), §7.4.4 (FlateDecode).
 * @param {Buffer} bytes
 * @param {Limits} limits
 * @returns {Promise<{ decodedBytes: number, over: boolean }>}
 */
export async function measureDecodedStreams(bytes, limits) {
  let decodedBytes = 0;
  let at = 0;
  for (;;) {
    const keyword = bytes.indexOf(STREAM, at);
    if (keyword < 0) return { decodedBytes, over: false };
    at = keyword + STREAM.length;
    if (keyword >= 3 && bytes.toString("latin1", keyword - 3, keyword) === "end") continue;
    let start = at;
    if (bytes[start] === 0x0d) start++;
    if (bytes[start] === 0x0a) start++;
    if (start === at) continue; // the keyword ends its line; anything else is just text
    const dict = bytes.toString("latin1", Math.max(0, keyword - DICT_WINDOW), keyword);
    const open = [...dict.matchAll(/\d\s+obj\b/g)].pop()?.index;
    const head = open === undefined ? dict : dict.slice(open);
    const filter = /\/Filter\s*\[?\s*\/(\w+)/.exec(head)?.[1];
    if (filter !== "FlateDecode" && filter !== "Fl") continue;
    const image = /\/Subtype\s*\/Image\b/.test(head);
    const length = /\/Length\s+(\d+)(?!\d)(?!\s+\d+\s+R)/.exec(head);
    let end = length ? start + Number(length[1]) : -1;
    if (end < start || end > bytes.length) end = bytes.indexOf(ENDSTREAM, start);
    if (end < 0) end = bytes.length;
    const size = await inflatedSize(bytes.subarray(start, end), limits.maxDecodedStreamBytes);
    if (size > limits.maxDecodedStreamBytes) return { decodedBytes: size, over: true };
    if (!image) decodedBytes += size;
    if (decodedBytes > limits.maxDecodedBytes) return { decodedBytes, over: true };
    at = Math.max(at, end);
  }
}

/**
 * Bytes a deflate stream inflates to, stopping once past `cap`. Invalid data counts what came out before
 * the error (pdf.js reads a damaged stream the same way); SYNC_FLUSH keeps a stream cut short readable.
 * @param {Buffer} data
 * @param {number} cap
 * @returns {Promise<number>}
 */
function inflatedSize(data, cap) {
  return new Promise((resolve) => {
    const inflate = createInflate({ finishFlush: zlib.Z_SYNC_FLUSH });
    let size = 0;
    const done = () => resolve(size);
    inflate.on("data", (/** @type {Buffer} */ chunk) => {
      size += chunk.byteLength;
      if (size > cap) {
        inflate.destroy();
        done();
      }
    });
    inflate.on("end", done);
    inflate.on("error", done);
    inflate.on("close", done);
    inflate.end(data);
  });
}

/** Only text that could hold a sheet number (a capital and a digit) travels back to the caller. */
const mayBeSheetNumber = (/** @type {string} */ s) => /[A-Z]/.test(s) && /\d/.test(s);

/**
 * @param {{ bytes: Uint8Array, limits: Limits }} task
 * @returns {Promise<Answer>}
 */
export default async function inspect({ bytes, limits }) {
  const raw = Buffer.from(bytes.buffer, bytes.byteOffset, bytes.byteLength);
  const measured = await measureDecodedStreams(raw, limits);
  if (measured.over) return { ok: false, reason: "decoded-too-large", decodedBytes: measured.decodedBytes };

  const pdfjs = await loadPdfjs();
  const task = pdfjs.getDocument(untrustedDocumentParams(bytes));
  try {
    let doc;
    try {
      doc = await task.promise;
    } catch (error) {
      return { ok: false, reason: /** @type {{ name?: string }} */ (error)?.name === "PasswordException" ? "encrypted" : "unreadable" };
    }
    const pageCount = doc.numPages;
    if (pageCount === 0) return { ok: false, reason: "empty" };
    if (pageCount > limits.maxPages) return { ok: false, reason: "too-many-pages", pages: pageCount };

    /** @type {PageFacts[]} */
    const pages = [];
    for (let pageNumber = 1; pageNumber <= pageCount; pageNumber++) {
      if (Date.now() >= limits.deadline) return { ok: false, reason: "too-slow" };
      let page;
      try {
        page = await doc.getPage(pageNumber);
      } catch {
        return { ok: false, reason: "unreadable" };
      }
      const [x0 = 0, y0 = 0, x1 = 0, y1 = 0] = page.view;
      pages.push({
        pageNumber,
        width: x1 - x0,
        height: y1 - y0,
        rotation: page.rotate,
        userUnit: page.userUnit,
        // A page whose text can't be read still shows; it just gets no label.
        text: await textOnSheet(page).catch(() => []),
      });
      page.cleanup();
    }
    return { ok: true, pageCount, pages };
  } finally {
    await task.destroy().catch(() => undefined);
  }
}

/**
 * Text items with their position as displayed (after /Rotate), for the title-block heuristic.
 * @param {import("pdfjs-dist/legacy/build/pdf.mjs").PDFPageProxy} page
 * @returns {Promise<TextOnSheet[]>}
 */
async function textOnSheet(page) {
  const viewport = page.getViewport({ scale: 1 });
  const content = await page.getTextContent();
  /** @type {TextOnSheet[]} */
  const items = [];
  for (const item of content.items) {
    if (!("str" in item) || !mayBeSheetNumber(item.str)) continue;
    const [a = 0, b = 0, c = 0, d = 0, e = 0, f = 0] = /** @type {number[]} */ (item.transform);
    const [vx = 0, vy = 0] = viewport.convertToViewportPoint(e, f);
    items.push({ text: item.str, size: Math.max(Math.hypot(a, b), Math.hypot(c, d)), x: vx / viewport.width, y: vy / viewport.height });
    if (items.length >= MAX_TEXT_ITEMS) break;
  }
  return items;
}
