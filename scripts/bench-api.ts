// The API benchmark (npm run bench:api, through scripts/bench-serve.sh): the demo job scaled to 300 units,
// the takeoff route (run and save) and the results route under 20 concurrent clients, beside /api/health.
import autocannon from "autocannon";
import { encode } from "next-auth/jwt";
import { db, pool } from "@/db/client";
import { priceBookItems, priceBooks } from "@/db/schema";
import { createProject } from "@/lib/server/projects/projects";
import { addOpeningType as createOpeningType } from "@/lib/server/plans/opening-types";
import { addPlanSet as createPlanSet } from "@/lib/server/plans/plan-sets";
import { sheetsOf as listSheets, editSheet as updateSheet } from "@/lib/server/plans/sheets";
import { addTag as createTag } from "@/lib/server/plans/tags";
import { addUnitType as createUnitType } from "@/lib/server/plans/unit-types";
import { signUp as signUpUser } from "@/lib/server/accounts/sign-up";
import { inspectPdf } from "@/lib/pdf/inspect";
import { DEMO_WINDOW_TYPES, generatePlanSet, type WindowMark } from "@/scripts/demo-plan";
import { usd } from "@/lib/takeoffs/format";
import { testPrices } from "@/takeoff/testing/job-fixtures";

const base = process.env.NEXTAUTH_URL!;
const UNITS: Record<string, number> = { "Type A": 150, "Type B": 100, "Type C": 50 }; // 300 units

const stamp = Date.now().toString(36);
const { user, organisation } = await signUpUser({ name: "Bench", email: `api-${stamp}@example.test`, password: "bench-password-1", organisationName: `API Bench ${stamp}` });
const project = await createProject({ orgId: organisation.id, userId: user.id, input: { name: "Larkspur Commons × 300 units" } });
const scope = { orgId: organisation.id, projectId: project.id, userId: user.id };

// The demo's drawings and window list; the file itself is not needed to take off, so it is not stored.
const { bytes, sheets: drawn } = await generatePlanSet();
await createPlanSet(scope, { key: `bench-${stamp}`, name: "bench.pdf", size: bytes.byteLength }, (await inspectPdf(bytes)).pages);
const unitTypeIds = new Map<string, string>();
for (const [name, count] of Object.entries(UNITS)) unitTypeIds.set(name, (await createUnitType(scope, { name, count })).id);
const typeIds = new Map<string, string>();
for (const [mark, size] of Object.entries(DEMO_WINDOW_TYPES) as [WindowMark, (typeof DEMO_WINDOW_TYPES)[WindowMark]][]) {
  const spec = mark === "W3" ? { casingWidth: 3.5, casingThickness: 0.75 } : mark === "W4" ? { style: "picture-frame" as const } : {};
  typeIds.set(mark, (await createOpeningType(scope, { mark, width: size.widthInches, height: size.heightInches, wallBuildUp: { stud: "2x6", wallboard: "1/2", frameDepth: 4.5625 }, trimSpec: spec })).id);
}
for (const [i, sheet] of (await listSheets(scope)).entries()) {
  const plan = drawn[i]!;
  await updateSheet(scope, sheet.id, { version: sheet.version, unitTypeId: plan.unitTypeName ? unitTypeIds.get(plan.unitTypeName)! : null });
  for (const w of plan.windows) await createTag(scope, { sheetId: sheet.id, openingTypeId: typeIds.get(w.mark)!, x: w.x, y: w.y });
}
const prices = testPrices();
const [book] = await db.insert(priceBooks).values({ orgId: organisation.id, name: "Bench prices (invented)", labour: prices.labour, markup: prices.markup, taxRate: prices.taxRate }).returning({ id: priceBooks.id });
await db.insert(priceBookItems).values(prices.items.map(({ id: _id, ...i }) => ({ ...i, orgId: organisation.id, priceBookId: book!.id })));

const cookie = `next-auth.session-token=${await encode({ token: { sub: user.id, name: user.name, email: user.email, sv: 0 }, secret: process.env.NEXTAUTH_SECRET! })}`;
const takeoffsUrl = `${base}/api/orgs/${organisation.slug}/projects/${project.id}/takeoffs`;
const first = await fetch(takeoffsUrl, { method: "POST", headers: { cookie, "content-type": "application/json" }, body: JSON.stringify({ name: "Warm-up", priceBookId: book!.id }) });
if (first.status !== 201) throw new Error(`takeoff route answered ${first.status}: ${await first.text()}`);
const { takeoff } = (await first.json()) as { takeoff: { id: string; result: { openingsTotal: number; bid: { total: number } } } };

async function load(title: string, opts: autocannon.Options) {
  const r = await autocannon({ connections: 20, duration: 10, ...opts });
  const non2xx = r.non2xx + r.errors + r.timeouts;
  return { route: title, "req/s": Math.round(r.requests.average), "p50 ms": r.latency.p50, "p99 ms": r.latency.p99, requests: r.requests.total, "non-2xx or errors": non2xx };
}

const trivial = await load("GET /api/health (trivial)", { url: `${base}/api/health` });
const results = await load("GET …/takeoffs/[id] (results)", { url: `${takeoffsUrl}/${takeoff.id}`, headers: { cookie } });
const run = await load("POST …/takeoffs (run + save)", {
  url: takeoffsUrl,
  method: "POST",
  headers: { cookie, "content-type": "application/json" },
  body: JSON.stringify({ name: "Load", priceBookId: book!.id }),
});
await pool.end();

const ratio = (r: typeof trivial) => ({ ...r, "req/s vs trivial": `${((r["req/s"] / trivial["req/s"]) * 100).toFixed(1)}%`, "p50 vs trivial": `${(r["p50 ms"] / Math.max(1, trivial["p50 ms"])).toFixed(1)}×` });
console.log(`\nAPI benchmark — job of ${Object.values(UNITS).reduce((a, b) => a + b, 0)} units, ${takeoff.result.openingsTotal} openings (bid ${usd(takeoff.result.bid.total)}); 20 connections × 10 s each, loopback, next start\n`);
console.table([ratio(trivial), ratio(results), ratio(run)]);
