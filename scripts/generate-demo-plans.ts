/**
 * Writes the demo plan set (Larkspur Commons, Building C — invented) to a PDF so a person can open it.
 *   npx tsx scripts/generate-demo-plans.ts out.pdf [--pages N] [--dense N] [--rotate 0|90|180|270] [--user-unit U]
 * Prints each sheet's label, windows and known dimension.
 */
import { writeFileSync } from "node:fs";
import { parseArgs } from "node:util";
import { generatePlanSet, type Rotation } from "./demo-plan/index";

const { values, positionals } = parseArgs({
  allowPositionals: true,
  options: {
    pages: { type: "string" },
    dense: { type: "string" },
    rotate: { type: "string" },
    "user-unit": { type: "string" },
  },
});
const out = positionals[0];
if (!out) {
  console.error("usage: npx tsx scripts/generate-demo-plans.ts <out.pdf> [--pages N] [--dense N] [--rotate 0|90|180|270] [--user-unit U]");
  process.exit(2);
}
const number = (v: string | undefined) => (v === undefined ? undefined : Number(v));
const rotate = number(values.rotate);
if (rotate !== undefined && ![0, 90, 180, 270].includes(rotate)) {
  console.error("--rotate must be 0, 90, 180 or 270");
  process.exit(2);
}
const { bytes, sheets } = await generatePlanSet({
  pages: number(values.pages),
  dense: number(values.dense),
  rotate: rotate as Rotation | undefined,
  userUnit: number(values["user-unit"]),
});
writeFileSync(out, bytes);
for (const s of sheets) {
  const marks = s.windows.map((w) => w.mark).join(" ");
  console.log(`${String(s.pageNumber).padStart(3)}  ${s.label.padEnd(6)} ${s.title.padEnd(34)} windows: ${marks}  known: ${s.knownDimension.inches} in`);
}
console.log(`wrote ${out} (${sheets.length} pages, ${(bytes.byteLength / 1024).toFixed(0)} KB)`);
