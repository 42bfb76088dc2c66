import { describe, expect, it } from "vitest";
import type { ImportPreview } from "@/lib/server/price-books/import";
import { priceBookApi } from "./helpers/price-book-world";
import { snapshot } from "./helpers/snapshot";
import { addMember, makeOrg, type World } from "./helpers/world";

const HEADER = "name,kind,face_width,thickness,species,supplier_code,price 7',price 8',price 10'";
const goodRows = [`Apron 2 1/2,apron,2 1/2,11/16,Poplar,TA-250,8.40,9.60,`, `Ext board 5 1/2,extension,5 1/2,3/4,Poplar,,,18.75,23.10`];

/** A second admin of `w`: the change log must name whoever made the change, not the book's creator. */
const asSecondAdmin = async (w: World) => priceBookApi(w, await addMember(w.org.id, "admin", "Second-Admin"));

describe("CSV import", () => {
  it("one bad row among good ones: 422 naming its line and column, and nothing written", async () => {
    const w = await makeOrg("Sorrel");
    const api = await asSecondAdmin(w);
    const before = await snapshot();
    const csv = [HEADER, goodRows[0], `Stool 5 1/4,stool,5 1/4,3/4,Poplar,,,twelve,`, goodRows[1]].join("\r\n");
    const res = await api.importCsv({ csv, mode: "merge", apply: true });
    expect(res.status).toBe(422);
    expect(res.json.error).toBe("1 row needs attention; nothing was imported.");
    expect(res.json.fields).toEqual({ "line 3.price 8'": "Price: write a number such as 14.20." });
    expect((res.json.preview as ImportPreview).counts).toEqual({ create: 2, update: 0, unchanged: 0, error: 1, delete: 0 });
    expect(await snapshot()).toBe(before);
  });

  it("previewing writes nothing and says what would change, field by field", async () => {
    const w = await makeOrg("Sorrel");
    const api = await asSecondAdmin(w);
    const before = await snapshot();
    const csv = [HEADER, `Casing 2 1/2 colonial,casing,2 1/2,11/16,Primed finger-joint pine,TC-250,8.90,10.45,`, ...goodRows].join("\n");
    const res = await api.importCsv({ csv, mode: "merge", apply: false });
    expect(res.status).toBe(200);
    const preview = res.json.preview as ImportPreview;
    expect(preview.rows.map((r) => [r.line, r.action, Object.keys(r.diff)])).toEqual([
      [2, "update", ["stock"]],
      [3, "create", expect.any(Array)],
      [4, "create", expect.any(Array)],
    ]);
    expect(preview.rows[0]!.diff.stock!.after).toEqual([{ length: 84, price: 8.9 }, { length: 96, price: 10.45 }]);
    expect(await snapshot()).toBe(before);
  });

  it.each([
    ["merge", ["Casing 2 1/2 colonial", "Stool 5 1/4 bullnose", "Apron 2 1/2", "Ext board 5 1/2"].sort(), { create: 2, update: 0, unchanged: 0, error: 0, delete: 0 }],
    ["replace", ["Apron 2 1/2", "Ext board 5 1/2"], { create: 2, update: 0, unchanged: 0, error: 0, delete: 2 }],
  ])("%s: applies the plan it previewed", async (mode, names, counts) => {
    const w = await makeOrg("Sorrel");
    const api = await asSecondAdmin(w);
    const csv = [HEADER, ...goodRows].join("\n");
    const preview = (await api.importCsv({ csv, mode })).json.preview as ImportPreview;
    expect(preview.counts).toEqual(counts);
    const res = await api.importCsv({ csv, mode, apply: true, previewToken: preview.previewToken });
    expect(res.status).toBe(200);
    expect((await api.book()).items.map((i) => i.name).sort()).toEqual(names);
    const log = await api.changes();
    expect(log[0]).toMatchObject({ action: "import", userId: api.person.id, userName: "Second-Admin" });
    expect(log.filter((c) => c.summary.includes("(CSV import)")).map((c) => c.action).sort()).toEqual(
      [...Array(counts.create).fill("item.create"), ...Array(counts.delete).fill("item.delete")].sort(),
    );
  });

  it("export then import is unchanged, and applying it writes nothing", async () => {
    const w = await makeOrg("Sorrel");
    const api = await asSecondAdmin(w);
    const { res, text } = await api.exportCsv();
    expect(res.headers.get("content-type")).toBe("text/csv; charset=utf-8");
    expect(res.headers.get("content-disposition")).toMatch(/^attachment; filename="shop-prices-[0-9a-f]{6}-items-\d{4}-\d{2}-\d{2}\.csv"$/);
    const before = await snapshot();
    for (const mode of ["merge", "replace"]) {
      const applied = await api.importCsv({ csv: text, mode, apply: true });
      expect(applied.status).toBe(200);
      expect((applied.json.preview as ImportPreview).counts).toEqual({ create: 0, update: 0, unchanged: 2, error: 0, delete: 0 });
    }
    expect(await snapshot()).toBe(before);
  });

  it("refuses to apply a preview the book has moved on from (409 with the new preview)", async () => {
    const w = await makeOrg("Sorrel");
    const api = await asSecondAdmin(w);
    const csv = [HEADER, ...goodRows].join("\n");
    const { previewToken } = (await api.importCsv({ csv })).json.preview as ImportPreview;
    expect((await api.patchItem(w.priceBook.item.id, { version: 1, species: "Poplar" })).status).toBe(200);
    const before = await snapshot();
    const res = await api.importCsv({ csv, apply: true, previewToken });
    expect(res.status).toBe(409);
    expect((res.json.preview as ImportPreview).previewToken).not.toBe(previewToken);
    expect(await snapshot()).toBe(before);
  });

  it.each([
    ["no csv", { mode: "merge" }, { csv: "Paste or choose a CSV file." }],
    ["an unknown mode", { csv: "x", mode: "append" }, { mode: 'Mode must be "merge" or "replace".' }],
    ["a header the import does not know", { csv: "name,colour\nA,red\n", apply: true }, { "line 1": expect.stringMatching(/Unknown column "colour"/) }],
  ])("answers %s with 422 naming what was wrong", async (_, body, fields) => {
    const w = await makeOrg("Sorrel");
    const api = await asSecondAdmin(w);
    const before = await snapshot();
    const res = await api.importCsv(body as never);
    expect(res.status).toBe(422);
    expect(res.json.fields).toEqual(fields);
    expect(await snapshot()).toBe(before);
  });
});
