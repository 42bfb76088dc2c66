import { beforeEach, describe, expect, it } from "vitest";
import { eq, sql } from "drizzle-orm";
import * as takeoffsRoute from "@/app/api/orgs/[orgSlug]/projects/[projectId]/takeoffs/route";
import { db } from "@/db/client";
import { priceBookItems, takeoffs } from "@/db/schema";
import type { TakeoffView } from "@/lib/server/takeoffs/takeoffs";
import { call, sessionCookie } from "./helpers/http";
import { addTestPriceBook } from "./helpers/takeoff-world";
import { makeOrg, type World } from "./helpers/world";

// A rerun with unchanged snapshots reuses the stored result by input hash instead of solving again.
// To see that it was reused rather than recomputed, the stored result is marked by hand first:
// a recomputation could never produce the mark.
let home: World;
let book: Awaited<ReturnType<typeof addTestPriceBook>>;
beforeEach(async () => {
  home = await makeOrg("Saltmarsh");
  book = await addTestPriceBook(home.org.id);
});

const run = async (w: World, priceBookId: string, name = "Base bid") => {
  const res = await call(takeoffsRoute.POST, {
    method: "POST",
    path: "/x",
    params: { orgSlug: w.org.slug, projectId: w.project.id },
    body: { name, priceBookId },
    cookie: await sessionCookie(w.people.estimator),
  });
  expect(res.status).toBe(201);
  return res.json.takeoff as TakeoffView;
};
const hashOf = async (id: string) => (await db.select({ h: takeoffs.inputHash }).from(takeoffs).where(eq(takeoffs.id, id)))[0]!.h;
const mark = (id: string) => db.execute(sql`update takeoffs set result = jsonb_set(result, '{openingsTotal}', '999') where id = ${id}`);

describe("reusing a computed takeoff", () => {
  it("an unchanged rerun reuses the stored result; a changed price computes again", async () => {
    const first = await run(home, book.priceBookId);
    expect(first.result.openingsTotal).toBe(1);
    await mark(first.id);
    const again = await run(home, book.priceBookId, "Again");
    expect(await hashOf(again.id)).toBe(await hashOf(first.id));
    expect(again.result.openingsTotal).toBe(999);

    await db.update(priceBookItems).set({ stock: [{ length: 96, price: 99 }, { length: 144, price: 150 }] }).where(eq(priceBookItems.id, book.items[0]!.id));
    const changed = await run(home, book.priceBookId, "After a price change");
    expect(await hashOf(changed.id)).not.toBe(await hashOf(first.id));
    expect(changed.result.openingsTotal).toBe(1);
  });

  it("never reuses another organisation's result, even under the same hash", async () => {
    const first = await run(home, book.priceBookId);
    const other = await makeOrg("Fernhollow");
    const theirs = await run(other, (await addTestPriceBook(other.org.id)).priceBookId);
    await mark(theirs.id);
    await db.update(takeoffs).set({ inputHash: await hashOf(first.id) }).where(eq(takeoffs.id, theirs.id));
    await db.delete(takeoffs).where(eq(takeoffs.id, first.id));
    expect((await run(home, book.priceBookId)).result.openingsTotal).toBe(1);
  });
});

describe("the results route's kept snapshot text", () => {
  const scopeOf = (w: World) => ({ orgId: w.org.id, projectId: w.project.id });

  it("answers exactly what serialising the row would, fresh or kept, and follows renames and deletes", async () => {
    const { getTakeoff } = await import("@/lib/server/takeoffs/takeoffs");
    const { takeoffJson } = await import("@/lib/server/takeoffs/takeoff-json");
    const { updateTakeoff, deleteTakeoff } = await import("@/lib/server/takeoffs/lifecycle");
    const first = await run(home, book.priceBookId);
    const s = scopeOf(home);
    // The same JSON value (key order aside: PostgreSQL's jsonb keeps keys in its own order).
    const expected = async () => JSON.parse(JSON.stringify({ takeoff: await getTakeoff(s, first.id) }));
    expect(JSON.parse(await takeoffJson(s, first.id))).toEqual(await expected()); // kept by the run
    expect(JSON.parse(await takeoffJson(s, first.id))).toEqual(await expected());
    await updateTakeoff(s, first.id, { name: "Renamed", note: "after the run" });
    const renamed = await takeoffJson(s, first.id);
    expect(JSON.parse(renamed)).toEqual(await expected());
    expect(JSON.parse(renamed).takeoff.name).toBe("Renamed");
    await deleteTakeoff(s, first.id);
    await expect(takeoffJson(s, first.id)).rejects.toMatchObject({ status: 404 });
  });

  it("a server that did not run the takeoff reads it once, then answers from the kept text", async () => {
    const { getTakeoff } = await import("@/lib/server/takeoffs/takeoffs");
    const { takeoffJson } = await import("@/lib/server/takeoffs/takeoff-json");
    const { copyTakeoff } = await import("@/lib/server/takeoffs/lifecycle");
    const s = scopeOf(home);
    const first = await run(home, book.priceBookId);
    const copy = await copyTakeoff({ ...s, userId: home.people.estimator.id }, first.id); // never kept by a run
    const fresh = await takeoffJson(s, copy.id);
    expect(JSON.parse(fresh)).toEqual(JSON.parse(JSON.stringify({ takeoff: await getTakeoff(s, copy.id) })));
    expect(await takeoffJson(s, copy.id)).toBe(fresh);
  });

  it("another organisation's scope never reads the kept text", async () => {
    const { takeoffJson } = await import("@/lib/server/takeoffs/takeoff-json");
    const first = await run(home, book.priceBookId);
    const other = await makeOrg("Quillfield");
    await expect(takeoffJson({ orgId: other.org.id, projectId: home.project.id }, first.id)).rejects.toMatchObject({ status: 404 });
    await expect(takeoffJson({ orgId: other.org.id, projectId: other.project.id }, first.id)).rejects.toMatchObject({ status: 404 });
  });
});
