/**
 * `npm run bench:upload`: how much one hostile upload costs everyone else. A server in this process
 * answers the real `/api/health` handler while the same process checks an upload with inspectPdf — exactly
 * what `next start` does when the upload callback runs — and autocannon measures health latency:
 * first with nothing else going on, then during the worst file we know (1 MB that inflates to 1 GiB),
 * then during a large honest plan set. Prints figures; asserts nothing.
 */
import { createServer } from "node:http";
import type { AddressInfo } from "node:net";
import { createDeflate } from "node:zlib";
import autocannon from "autocannon";
import { PDFDocument, PDFName } from "pdf-lib";
import { GET as health } from "@/app/api/health/route";
import { generatePlanSet } from "@/scripts/demo-plan";
import { inspectPdf, isPdfRejected } from "@/lib/pdf/inspect";

const MB = 1024 * 1024;

/** One page whose content stream inflates to `bytes` of harmless operators; deflated in chunks to keep memory flat. */
async function bomb(bytes: number): Promise<Uint8Array> {
  const deflate = createDeflate({ level: 9 });
  const out: Buffer[] = [];
  deflate.on("data", (c: Buffer) => out.push(c));
  const done = new Promise((resolve) => deflate.on("end", resolve));
  const chunk = Buffer.alloc(MB, " q Q\n");
  for (let written = 0; written < bytes; written += MB) {
    if (!deflate.write(chunk)) await new Promise((resolve) => deflate.once("drain", resolve));
  }
  deflate.end();
  await done;
  const doc = await PDFDocument.create();
  const page = doc.addPage([612, 792]);
  page.node.set(PDFName.of("Contents"), doc.context.register(doc.context.stream(Buffer.concat(out), { Filter: "FlateDecode" })));
  return doc.save({ useObjectStreams: false });
}

const server = createServer(async (req, res) => {
  const answer = req.url === "/api/health" ? await health() : new Response("no", { status: 404 });
  res.writeHead(answer.status, { "content-type": "application/json" }).end(await answer.text());
});
await new Promise<void>((resolve) => server.listen(0, "127.0.0.1", resolve));
const url = `http://127.0.0.1:${(server.address() as AddressInfo).port}/api/health`;

/** Health latency under load while `work` runs again and again for the whole measurement. */
async function healthUnder(label: string, work: (() => Promise<string>) | null) {
  let peakRss = process.memoryUsage().rss;
  const sampler = setInterval(() => (peakRss = Math.max(peakRss, process.memoryUsage().rss)), 50);
  let running = true;
  const outcomes: string[] = [];
  const started = Date.now();
  const loop = (async () => {
    while (running && work) outcomes.push(await work());
  })();
  const r = await autocannon({ url, connections: 10, duration: 8 });
  running = false;
  await loop;
  clearInterval(sampler);
  const each = outcomes.length > 0 ? ((Date.now() - started) / 1000 / outcomes.length).toFixed(1) : "-";
  return {
    during: label,
    "health p50 ms": r.latency.p50,
    "health p99 ms": r.latency.p99,
    "health max ms": r.latency.max,
    "timeouts/errors": r.timeouts + r.errors + r.non2xx,
    "peak RSS MB": Math.round(peakRss / MB),
    upload: work ? `${outcomes.length} × ${[...new Set(outcomes)].join(", ")}, ~${each} s each` : "none",
  };
}

const inspect = (bytes: Uint8Array) => async () => {
  try {
    const { pageCount } = await inspectPdf(bytes);
    return `accepted, ${pageCount} pages`;
  } catch (error) {
    if (isPdfRejected(error)) return `refused (${error.reason})`;
    throw error;
  }
};

console.log("preparing files …");
const worst = await bomb(1024 * MB);
const honest = (await generatePlanSet({ unitTypes: ["A", "B", "C"] })).bytes;
console.log(`worst file: ${(worst.byteLength / MB).toFixed(2)} MB inflating to 1024 MB; honest set: ${(honest.byteLength / MB).toFixed(2)} MB`);

const rows = [
  await healthUnder("nothing (baseline)", null),
  await healthUnder("the 1 GiB decompression bomb", inspect(worst)),
  await healthUnder("an honest generated plan set", inspect(honest)),
];
console.table(rows);
server.close();
process.exit(0);
