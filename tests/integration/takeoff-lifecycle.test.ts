import { beforeEach, describe, expect, it } from "vitest";
import * as takeoffsRoute from "@/app/api/orgs/[orgSlug]/projects/[projectId]/takeoffs/route";
import * as takeoffRoute from "@/app/api/orgs/[orgSlug]/projects/[projectId]/takeoffs/[takeoffId]/route";
import * as submitRoute from "@/app/api/orgs/[orgSlug]/projects/[projectId]/takeoffs/[takeoffId]/submit/route";
import * as copyRoute from "@/app/api/orgs/[orgSlug]/projects/[projectId]/takeoffs/[takeoffId]/copy/route";
import * as orderRoute from "@/app/api/orgs/[orgSlug]/projects/[projectId]/takeoffs/[takeoffId]/order-csv/route";
import * as pdfRoute from "@/app/api/orgs/[orgSlug]/projects/[projectId]/takeoffs/[takeoffId]/bid-pdf/route";
import * as sendsRoute from "@/app/api/orgs/[orgSlug]/projects/[projectId]/takeoffs/[takeoffId]/sends/route";
import type { Role } from "@/db/schema";
import type { TakeoffView } from "@/lib/server/takeoffs/takeoffs";
import { outboxDir } from "@/lib/env";
import { parseCsv } from "@/lib/price-books/csv-grammar";
import { readOutbox } from "@/lib/mail/outbox";
import { call, sessionCookie } from "./helpers/http";
import { snapshot } from "./helpers/snapshot";
import { addTestPriceBook } from "./helpers/takeoff-world";
import { makeOrg, unique, type World } from "./helpers/world";

type Actor = Role | "outsider" | "anonymous";
let home: World;
let other: World;
let takeoff: TakeoffView;

const cookieOf = async (a: Actor) => (a === "anonymous" ? undefined : sessionCookie(a === "outsider" ? other.people.admin : home.people[a]));
const at = (extra: Record<string, string> = {}) => ({ orgSlug: home.org.slug, projectId: home.project.id, takeoffId: takeoff.id, ...extra });

beforeEach(async () => {
  home = await makeOrg("Gorsedale");
  other = await makeOrg("Mallowby");
  const { priceBookId } = await addTestPriceBook(home.org.id);
  const res = await call(takeoffsRoute.POST, { method: "POST", path: "/x", params: { orgSlug: home.org.slug, projectId: home.project.id }, body: { name: "Base bid", priceBookId }, cookie: await sessionCookie(home.people.estimator) });
  takeoff = res.json.takeoff as TakeoffView;
});

describe("role × organisation for takeoff routes", () => {
  const routes: { name: string; handler: Parameters<typeof call>[0]; method: string; body?: unknown; allowed: Role[]; ok: number }[] = [
    { name: "rename", handler: takeoffRoute.PATCH, method: "PATCH", body: { name: "Base bid r1" }, allowed: ["admin", "estimator"], ok: 200 },
    { name: "delete", handler: takeoffRoute.DELETE, method: "DELETE", allowed: ["admin", "estimator"], ok: 204 },
    { name: "submit", handler: submitRoute.POST, method: "POST", allowed: ["admin", "project_manager"], ok: 200 },
    { name: "copy", handler: copyRoute.POST, method: "POST", allowed: ["admin", "estimator"], ok: 201 },
    { name: "order CSV", handler: orderRoute.GET, method: "GET", allowed: ["admin", "estimator", "project_manager"], ok: 200 },
    { name: "bid PDF", handler: pdfRoute.GET, method: "GET", allowed: ["admin", "estimator", "project_manager"], ok: 200 },
    { name: "send history", handler: sendsRoute.GET, method: "GET", allowed: ["admin", "estimator", "project_manager"], ok: 200 },
    { name: "send the bid", handler: sendsRoute.POST, method: "POST", body: { to: `gc-${unique()}@example.test` }, allowed: ["admin", "project_manager"], ok: 201 },
  ];
  const actors: Actor[] = ["admin", "estimator", "project_manager", "outsider", "anonymous"];
  describe.each(routes)("$name", (route) => {
    it.each(actors)("as %s", async (actor) => {
      const allowed = actor !== "outsider" && actor !== "anonymous" && route.allowed.includes(actor);
      const before = await snapshot();
      const res = await call(route.handler, { method: route.method, path: "/x", params: at(), body: route.body, cookie: await cookieOf(actor) });
      expect(res.status).toBe(allowed ? route.ok : actor === "anonymous" ? 401 : actor === "outsider" ? 404 : 403);
      if (!allowed) expect(await snapshot()).toBe(before);
    });
  });
});

describe("submitting locks the takeoff", () => {
  it("every role's edit is then refused, a copy continues as a draft, and the project reads submitted", async () => {
    expect((await call(submitRoute.POST, { method: "POST", path: "/x", params: at(), cookie: await cookieOf("project_manager") })).status).toBe(200);
    const before = await snapshot();
    for (const actor of ["admin", "estimator"] as const) {
      const rename = await call(takeoffRoute.PATCH, { method: "PATCH", path: "/x", params: at(), body: { name: "Sneaky" }, cookie: await cookieOf(actor) });
      expect(rename.status).toBe(409);
      expect(rename.json.error).toMatch(/locked/);
      expect((await call(takeoffRoute.DELETE, { method: "DELETE", path: "/x", params: at(), cookie: await cookieOf(actor) })).status).toBe(409);
    }
    expect((await call(takeoffRoute.PATCH, { method: "PATCH", path: "/x", params: at(), body: { name: "Sneaky" }, cookie: await cookieOf("project_manager") })).status).toBe(403);
    expect((await call(submitRoute.POST, { method: "POST", path: "/x", params: at(), cookie: await cookieOf("admin") })).status).toBe(409);
    expect(await snapshot()).toBe(before);

    const copy = await call(copyRoute.POST, { method: "POST", path: "/x", params: at(), cookie: await cookieOf("estimator") });
    expect(copy.json.takeoff).toMatchObject({ name: "Copy of Base bid", status: "draft", result: takeoff.result });
    const list = await call(takeoffsRoute.GET, { method: "GET", path: "/x", params: at(), cookie: await cookieOf("project_manager") });
    expect((list.json.takeoffs as { status: string }[]).map((t) => t.status).sort()).toEqual(["draft", "submitted"]);
  });
});

describe("documents out", () => {
  it("the order CSV lists boards to buy per item and stock length at the snapshot's prices", async () => {
    const res = await fetchRaw(orderRoute.GET, await cookieOf("project_manager"));
    expect(res.headers.get("content-type")).toMatch(/text\/csv/);
    expect(res.headers.get("content-disposition")).toContain('filename="base-bid-order.csv"');
    const text = await res.text();
    expect(text.split("\r\n")[0]).toBe("material,item,supplier_code,rip_width,stock_length,boards_planned,boards_to_buy,unit_price,extended,rip_layout");
    // Parsed, not split on commas: rip widths and layouts are quoted cells with commas in them.
    const parsed = parseCsv(text);
    if (!parsed.ok) throw new Error(parsed.message);
    const [header, ...rows] = parsed.records.map((r) => r.fields);
    const extended = rows.map((r) => Number(r[header!.indexOf("extended")]));
    expect(extended.reduce((a, b) => a + b, 0)).toBeCloseTo(takeoff.result.bid.material, 2);
  });

  it("the bid PDF is a PDF", async () => {
    const res = await fetchRaw(pdfRoute.GET, await cookieOf("estimator"));
    expect(res.headers.get("content-type")).toBe("application/pdf");
    expect(Buffer.from(await res.arrayBuffer()).subarray(0, 5).toString()).toBe("%PDF-");
  });

  it("sending e-mails the summary with the PDF attached and records who sent it, to whom, when", async () => {
    const to = `estimating-${unique()}@fenwick-hale.example`;
    const res = await call(sendsRoute.POST, { method: "POST", path: "/x", params: at(), body: { to, message: "Our bid for Building C." }, cookie: await cookieOf("project_manager") });
    expect(res.status).toBe(201);
    const mail = (await readOutbox(outboxDir())).find((m) => m.to.includes(to))!;
    expect(mail.subject).toContain(home.project.name);
    expect(mail.text).toContain("Our bid for Building C.");
    const raw = await (await import("node:fs/promises")).readFile(`${outboxDir()}/${mail.id}.eml`, "utf8");
    expect(raw).toMatch(/Content-Type: application\/pdf; name=base-bid-bid\.pdf/);
    const sends = await call(sendsRoute.GET, { method: "GET", path: "/x", params: at(), cookie: await cookieOf("estimator") });
    expect(sends.json.sends).toEqual([expect.objectContaining({ to, sentByName: home.people.project_manager.name })]);
  });

  it("a bad address is a field error and nothing is sent or recorded", async () => {
    const before = await snapshot();
    const res = await call(sendsRoute.POST, { method: "POST", path: "/x", params: at(), body: { to: "not an address" }, cookie: await cookieOf("admin") });
    expect(res.status).toBe(422);
    expect(res.json.fields?.to).toMatch(/valid e-mail/);
    expect(await snapshot()).toBe(before);
  });
});

// Route handlers differ in their params type; this only needs to call them.
// eslint-disable-next-line @typescript-eslint/no-explicit-any
async function fetchRaw(handler: (req: import("next/server").NextRequest, ctx: { params: Promise<any> }) => Promise<Response>, cookie?: string) {
  const { NextRequest } = await import("next/server");
  return handler(new NextRequest("http://127.0.0.1/x", { headers: cookie ? { cookie } : {} }), { params: Promise.resolve(at()) });
}

describe("comparing takeoffs across the organisation", () => {
  const compare = async (ids: string[], actor: Actor = "project_manager") => {
    const { GET } = await import("@/app/api/orgs/[orgSlug]/takeoffs/compare/route");
    return call(GET, { method: "GET", path: `/x?ids=${ids.join(",")}`, params: { orgSlug: home.org.slug }, cookie: await cookieOf(actor) });
  };

  it("puts two takeoffs side by side and says what changed", async () => {
    const { priceBookId, items } = await addTestPriceBook(home.org.id);
    const alt = await call(takeoffsRoute.POST, {
      method: "POST",
      path: "/x",
      params: { orgSlug: home.org.slug, projectId: home.project.id },
      body: { name: "Poplar casing", priceBookId, casingItemId: items.find((i) => i.name.includes("3 1/2"))!.id },
      cookie: await cookieOf("estimator"),
    });
    const res = await compare([takeoff.id, (alt.json.takeoff as TakeoffView).id]);
    expect(res.status).toBe(200);
    const columns = res.json.columns as { name: string; bidTotal: number }[];
    expect(columns.map((c) => c.name)).toEqual(["Base bid", "Poplar casing"]);
    expect(columns[1]!.bidTotal).toBeGreaterThan(columns[0]!.bidTotal);
    expect((res.json.differences as { reasons: string[] }[])[0]!.reasons).toContain("Alternate casing: each window's own → Casing 3 1/2 × 3/4 poplar.");
  });

  it.each([
    ["one takeoff", () => [takeoff.id], 422],
    ["five takeoffs", () => Array.from({ length: 5 }, (_, i) => `00000000-0000-4000-8000-00000000000${i}`), 422],
    ["a malformed id", () => [takeoff.id, "nope"], 422],
    ["another organisation's takeoff", () => [takeoff.id, "00000000-0000-4000-8000-000000000000"], 404],
  ] as const)("refuses %s", async (_name, ids, status) => {
    expect((await compare([...ids()])).status).toBe(status);
  });

  it("is refused to other organisations and to the signed out", async () => {
    expect((await compare([takeoff.id, takeoff.id], "outsider")).status).toBe(404);
    expect((await compare([takeoff.id, takeoff.id], "anonymous")).status).toBe(401);
  });
});
