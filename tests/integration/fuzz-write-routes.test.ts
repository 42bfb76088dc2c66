/**
 * Property-based fuzzing of every write route and method: hostile bodies (any JSON; valid bodies with one
 * field swapped for an out-of-range number, a NUL, half a surrogate pair, a huge string; unknown fields),
 * hostile path parameters (NUL or junk in the org slug and ids) and hostile `?version=`. Whatever comes in,
 * the answer is never a 5xx, and a refusal (4xx) leaves every tenant table exactly as it was.
 * Bounded: RUNS cases per route, so the whole file stays well under a minute on a quiet machine.
 */
import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import fc from "fast-check";
import { NextRequest } from "next/server";
import * as projectsRoute from "@/app/api/orgs/[orgSlug]/projects/route";
import * as projectRoute from "@/app/api/orgs/[orgSlug]/projects/[projectId]/route";
import * as memberRoute from "@/app/api/orgs/[orgSlug]/members/[memberId]/route";
import * as invitationsRoute from "@/app/api/orgs/[orgSlug]/invitations/route";
import * as invitationRoute from "@/app/api/orgs/[orgSlug]/invitations/[invitationId]/route";
import * as unitTypesRoute from "@/app/api/orgs/[orgSlug]/projects/[projectId]/unit-types/route";
import * as unitTypeRoute from "@/app/api/orgs/[orgSlug]/projects/[projectId]/unit-types/[unitTypeId]/route";
import * as sheetRoute from "@/app/api/orgs/[orgSlug]/projects/[projectId]/sheets/[sheetId]/route";
import * as openingTypesRoute from "@/app/api/orgs/[orgSlug]/projects/[projectId]/opening-types/route";
import * as openingTypeRoute from "@/app/api/orgs/[orgSlug]/projects/[projectId]/opening-types/[openingTypeId]/route";
import * as tagsRoute from "@/app/api/orgs/[orgSlug]/projects/[projectId]/tags/route";
import * as tagRoute from "@/app/api/orgs/[orgSlug]/projects/[projectId]/tags/[tagId]/route";
import * as takeoffsRoute from "@/app/api/orgs/[orgSlug]/projects/[projectId]/takeoffs/route";
import * as takeoffRoute from "@/app/api/orgs/[orgSlug]/projects/[projectId]/takeoffs/[takeoffId]/route";
import * as takeoffCopyRoute from "@/app/api/orgs/[orgSlug]/projects/[projectId]/takeoffs/[takeoffId]/copy/route";
import * as takeoffSubmitRoute from "@/app/api/orgs/[orgSlug]/projects/[projectId]/takeoffs/[takeoffId]/submit/route";
import * as takeoffSendsRoute from "@/app/api/orgs/[orgSlug]/projects/[projectId]/takeoffs/[takeoffId]/sends/route";
import * as priceBooksRoute from "@/app/api/orgs/[orgSlug]/price-books/route";
import * as priceBookRoute from "@/app/api/orgs/[orgSlug]/price-books/[priceBookId]/route";
import * as priceBookItemsRoute from "@/app/api/orgs/[orgSlug]/price-books/[priceBookId]/items/route";
import * as priceBookItemRoute from "@/app/api/orgs/[orgSlug]/price-books/[priceBookId]/items/[itemId]/route";
import * as priceBookCsvRoute from "@/app/api/orgs/[orgSlug]/price-books/[priceBookId]/csv/route";
import * as settingsRoute from "@/app/api/orgs/[orgSlug]/settings/route";
import * as signupRoute from "@/app/api/signup/route";
import * as acceptRoute from "@/app/api/invitations/accept/route";
import { pool } from "@/db/client";
import { env } from "@/lib/env";
import { sessionCookie } from "./helpers/http";
import { addTestPriceBook } from "./helpers/takeoff-world";
import { makeOrg, unique, type World } from "./helpers/world";

vi.mock("next/headers", async () => (await import("./helpers/action")).nextHeadersMock);

const RUNS = 12;

// Route handlers differ in their params type; the fuzzer only needs to call them.
// eslint-disable-next-line @typescript-eslint/no-explicit-any
type Handler = (req: NextRequest, ctx: { params: Promise<any> }) => Promise<Response>;
interface WriteRoute {
  name: string;
  handler: Handler;
  method: "POST" | "PATCH" | "DELETE";
  /** Valid path parameters; the fuzzer sometimes swaps one for junk. */
  params: () => Record<string, string>;
  /** A valid body, which the fuzzer bends one field at a time; none for body-less methods. */
  body?: () => Record<string, unknown>;
  /** DELETE routes read `?version=N`. */
  version?: boolean;
}

/**
 * One query, cheap enough to run around every request: the row count of every tenant table (an insert or
 * delete anywhere shows) and a digest of every row of the fuzzed organisation (an update there shows).
 */
const TABLES = ["users", "organisations", "memberships", "invitations", "projects", "unit_types", "plan_sets", "sheets", "opening_types", "tags", "price_books", "price_book_items", "price_book_changes", "takeoffs", "takeoff_sends"];
const ORG_TABLES = TABLES.filter((t) => !["users", "organisations"].includes(t));
let fingerprintSql = "";
async function fingerprint(): Promise<string> {
  const { rows } = await pool.query<{ f: string }>(fingerprintSql, [w.org.id]);
  return rows[0]!.f;
}

const INT4 = 2 ** 31;
/** Values that have made handlers fall over before, and their cousins. */
const nasty = fc.oneof(
  fc.constantFrom(INT4, INT4 - 1, -INT4 - 1, 2 ** 53, -1, 0, 1e308, -0, 0.5),
  fc.constantFrom("\u0000", "a\u0000b", "\uD800", "x\uDFFFy", "%00", "%E0%A4%A", "", " ", "'; drop table users; --", "=1+1", "../../etc/passwd"),
  fc.constantFrom(null, true, false, [], {}, [[[[[]]]]], { orgId: "x" }),
  fc.string({ unit: "binary", maxLength: 40 }),
  fc.string({ maxLength: 3000 }),
  fc.integer(),
  fc.double(),
);
const junkSegment = fc.oneof(
  fc.constantFrom("\u0000", "%00", "a\u0000", "\uD800", "", "..", "00000000-0000-0000-0000-000000000000", "not-a-uuid"),
  fc.uuid(),
  fc.string({ unit: "binary", maxLength: 30 }),
);
const junkVersion = fc.oneof(fc.constantFrom("2147483648", "99999999999999999999", "-1", "0", "1e3", "1.5", "abc", "", "%00", "1"), fc.string({ maxLength: 12 }));

/** A request body: any JSON at all, or a valid body with one field bent or one unknown field added. */
function bodyFor(route: WriteRoute) {
  const base = route.body?.() ?? {};
  const keys = Object.keys(base);
  return fc.oneof(
    fc.jsonValue(),
    fc.record({ key: keys.length > 0 ? fc.constantFrom(...keys) : fc.constant("name"), value: nasty }).map(({ key, value }) => ({ ...base, [key]: value })),
    fc.record({ key: fc.constantFrom("orgId", "role", "createdBy", "id", "__proto__", "constructor"), value: nasty }).map(({ key, value }) => ({ ...base, [key]: value })),
  );
}

let w: World;
let cookie: string;
let routes: WriteRoute[] = [];
const seen = { requests: 0, serverErrors: 0, refusals: 0, accepted: 0 };

beforeAll(async () => {
  const counts = TABLES.map((t) => `(select count(*) from ${t})::text`);
  const digests = ORG_TABLES.map((t) => `(select md5(coalesce(string_agg(x::text, ',' order by x::text), '')) from ${t} x where x.org_id = $1)`);
  const org = `(select md5(x::text) from organisations x where x.id = $1)`;
  fingerprintSql = `select concat_ws(':', ${[...counts, ...digests, org].join(", ")}) as f`;
  w = await makeOrg("Fuzzwood");
  cookie = await sessionCookie(w.people.admin);
  const { priceBookId } = await addTestPriceBook(w.org.id);
  const orgParams = { orgSlug: w.org.slug };
  const proj = { ...orgParams, projectId: w.project.id };
  const book = { ...orgParams, priceBookId: w.priceBook.book.id };
  const run = await takeoffsRoute.POST(request("POST", "/x", { name: "Fuzz base", priceBookId }), { params: Promise.resolve(proj) });
  const takeoffId = ((await run.json()) as { takeoff?: { id: string } }).takeoff?.id ?? crypto.randomUUID();
  const takeoff = { ...proj, takeoffId };
  const trim = { stool: true };
  routes = [
    { name: "create project", handler: projectsRoute.POST, method: "POST", params: () => orgParams, body: () => ({ name: `Fuzz ${unique()}`, generalContractor: "Harbor Ridge", bidDue: "2027-01-02" }) },
    { name: "update project", handler: projectRoute.PATCH, method: "PATCH", params: () => proj, body: () => ({ name: "Renamed", status: "draft", archived: false }) },
    { name: "change a role", handler: memberRoute.PATCH, method: "PATCH", params: () => ({ ...orgParams, memberId: w.spare.membershipId }), body: () => ({ role: "estimator" }) },
    { name: "remove a member", handler: memberRoute.DELETE, method: "DELETE", params: () => ({ ...orgParams, memberId: crypto.randomUUID() }) },
    { name: "invite", handler: invitationsRoute.POST, method: "POST", params: () => orgParams, body: () => ({ email: `fz-${unique()}@example.test`, role: "estimator" }) },
    { name: "withdraw an invitation", handler: invitationRoute.DELETE, method: "DELETE", params: () => ({ ...orgParams, invitationId: crypto.randomUUID() }) },
    { name: "add a unit type", handler: unitTypesRoute.POST, method: "POST", params: () => proj, body: () => ({ name: `Type ${unique()}`, count: 3 }) },
    { name: "edit a unit type", handler: unitTypeRoute.PATCH, method: "PATCH", params: () => ({ ...proj, unitTypeId: w.plans.unitType.id }), body: () => ({ version: 1, count: 4, name: "Type Z" }) },
    { name: "delete a unit type", handler: unitTypeRoute.DELETE, method: "DELETE", params: () => ({ ...proj, unitTypeId: crypto.randomUUID() }), version: true },
    { name: "calibrate a sheet", handler: sheetRoute.PATCH, method: "PATCH", params: () => ({ ...proj, sheetId: w.plans.sheet.id }), body: () => ({ version: 1, label: "A-202", scale: { ratio: 48, label: "1/4 in" } }) },
    { name: "add an opening type", handler: openingTypesRoute.POST, method: "POST", params: () => proj, body: () => ({ mark: `W${unique()}`, width: "35 1/2", height: "59 1/2", setback: "9/16" }) },
    { name: "edit an opening type", handler: openingTypeRoute.PATCH, method: "PATCH", params: () => ({ ...proj, openingTypeId: w.plans.w1.id }), body: () => ({ version: 1, width: "36 1/4", trim }) },
    { name: "delete an opening type", handler: openingTypeRoute.DELETE, method: "DELETE", params: () => ({ ...proj, openingTypeId: crypto.randomUUID() }), version: true },
    { name: "place a tag", handler: tagsRoute.POST, method: "POST", params: () => proj, body: () => ({ sheetId: w.plans.sheet.id, openingTypeId: w.plans.w2.id, x: 10, y: 20 }) },
    { name: "move a tag", handler: tagRoute.PATCH, method: "PATCH", params: () => ({ ...proj, tagId: w.plans.tag.id }), body: () => ({ version: 1, x: 5, y: 6 }) },
    { name: "delete a tag", handler: tagRoute.DELETE, method: "DELETE", params: () => ({ ...proj, tagId: w.plans.tag.id }), version: true },
    { name: "run a takeoff", handler: takeoffsRoute.POST, method: "POST", params: () => proj, body: () => ({ name: "Alt", note: "n", priceBookId, casingItemId: null }) },
    { name: "rename a takeoff", handler: takeoffRoute.PATCH, method: "PATCH", params: () => takeoff, body: () => ({ name: "Base 2", note: "x" }) },
    { name: "delete a takeoff", handler: takeoffRoute.DELETE, method: "DELETE", params: () => ({ ...proj, takeoffId: crypto.randomUUID() }) },
    { name: "copy a takeoff", handler: takeoffCopyRoute.POST, method: "POST", params: () => takeoff },
    { name: "submit a takeoff", handler: takeoffSubmitRoute.POST, method: "POST", params: () => ({ ...proj, takeoffId: crypto.randomUUID() }) },
    { name: "send a bid", handler: takeoffSendsRoute.POST, method: "POST", params: () => ({ ...proj, takeoffId: crypto.randomUUID() }), body: () => ({ to: "gc@example.test", message: "Hello" }) },
    { name: "create a price book", handler: priceBooksRoute.POST, method: "POST", params: () => orgParams, body: () => ({ name: `Book ${unique()}`, markup: 0.1, taxRate: 0.05, taxLabour: false }) },
    { name: "edit a price book", handler: priceBookRoute.PATCH, method: "PATCH", params: () => book, body: () => ({ version: 1, markup: 0.2, name: "Renamed book" }) },
    { name: "delete a price book", handler: priceBookRoute.DELETE, method: "DELETE", params: () => ({ ...orgParams, priceBookId: crypto.randomUUID() }), version: true },
    { name: "add a price-book item", handler: priceBookItemsRoute.POST, method: "POST", params: () => book, body: () => ({ name: "Apron 3 1/2", kind: "apron", faceWidth: "3 1/2", thickness: "11/16", species: "Poplar", supplierCode: "AP-35", stock: [{ length: "8'", price: "12.40" }] }) },
    { name: "edit a price-book item", handler: priceBookItemRoute.PATCH, method: "PATCH", params: () => ({ ...book, itemId: w.priceBook.item.id }), body: () => ({ version: 1, name: "Casing 2 1/2", species: "Pine", stock: [{ length: "8'", price: "10.60" }] }) },
    { name: "delete a price-book item", handler: priceBookItemRoute.DELETE, method: "DELETE", params: () => ({ ...book, itemId: w.priceBook.spareItem.id }), version: true },
    { name: "import a price-book CSV", handler: priceBookCsvRoute.POST, method: "POST", params: () => book, body: () => ({ csv: "name,kind,face_width,thickness,species,supplier_code,price 8'\nApron,apron,3 1/2,11/16,Poplar,,12.40\n", mode: "merge", apply: false }) },
    { name: "change settings", handler: settingsRoute.PATCH, method: "PATCH", params: () => orgParams, body: () => ({ kerf: "1/8", wastePercent: 10 }) },
    { name: "sign up", handler: signupRoute.POST as Handler, method: "POST", params: () => ({}), body: () => ({ name: "Fuzz Person", email: `fz-${unique()}@example.test`, password: "long enough password", organisationName: `Fuzz Co ${unique()}` }) },
    { name: "accept an invitation", handler: acceptRoute.POST as Handler, method: "POST", params: () => ({}), body: () => ({ token: "not-a-real-token", name: "Someone", password: "long enough password" }) },
  ];
}, 60_000);

afterAll(() => {
  // The figures the issue asked for; printed, not asserted.
  console.log(`fuzz: ${seen.requests} requests, ${seen.accepted} accepted, ${seen.refusals} refused (4xx), ${seen.serverErrors} answered 5xx`);
});

function request(method: string, path: string, body?: unknown) {
  const headers = new Headers({ cookie });
  if (body !== undefined) headers.set("content-type", "application/json");
  return new NextRequest(new URL(path, env.NEXTAUTH_URL), { method, headers, body: body === undefined ? undefined : JSON.stringify(body) });
}

describe("fuzzing every write route", () => {
  it("has a case for each write route", () => {
    expect(routes.length).toBeGreaterThanOrEqual(30);
  });

  // The table is built in beforeAll (it needs the world), so the cases are indexed here and looked up at run time.
  for (let i = 0; i < 32; i++) {
    it(`route #${i + 1}: no 5xx, and a refusal changes nothing`, async () => {
      const route = routes[i];
      if (!route) return;
      const cases = fc.record({
        body: route.method === "DELETE" ? fc.constant(undefined) : bodyFor(route),
        // Mostly the real parameters, sometimes one of them swapped for junk.
        swap: fc.option(fc.record({ which: fc.nat(), value: junkSegment }), { freq: 3 }),
        version: junkVersion,
      });
      await fc.assert(
        fc.asyncProperty(cases, async ({ body, swap, version }) => {
          const params = { ...route.params() };
          const names = Object.keys(params);
          if (swap && names.length > 0) params[names[swap.which % names.length]!] = swap.value;
          const path = route.version ? `/x?version=${encodeURIComponent(version)}` : "/x";
          const before = await fingerprint();
          const res = await route.handler(request(route.method, path, body), { params: Promise.resolve(params) });
          seen.requests++;
          const text = await res.text();
          if (res.status >= 500) seen.serverErrors++;
          else if (res.status >= 400) seen.refusals++;
          else seen.accepted++;
          expect(res.status, `${route.name} ${JSON.stringify({ params, body, version })} → ${text}`).toBeLessThan(500);
          if (res.status >= 400) {
            expect(JSON.parse(text)).toHaveProperty("error");
            expect(await fingerprint(), `${route.name}: refused but changed data`).toBe(before);
          }
        }),
        { numRuns: RUNS },
      );
    });
  }
});
