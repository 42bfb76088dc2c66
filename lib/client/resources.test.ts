/**
 * One owner per client resource: a query key is only ever filled by the module that owns it, so a page that
 * caches a shape and a page that reads it always agree (a Plans page once filed `{ openingTypes }` where the
 * viewer expected a bare list, and the viewer crashed when opened from it). And one fetch client: a request
 * outside lib/client would bring its own idea of what a refusal looks like.
 */
import { readdirSync, readFileSync, statSync } from "node:fs";
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import { countsKey } from "./counts";
import { invitationsKey } from "./invitations";
import { membersKey } from "./members";
import { openingTypesKey } from "./opening-types";
import { planSetsQuery } from "./plan-sets";
import { priceBookChangesKey, priceBookKey } from "./price-books";
import { priceBooksKey } from "./price-books";
import { priceGapsQuery } from "./price-gaps";
import { projectDetailsKey, projectsQuery } from "./projects";
import { sendsKey } from "./sends";
import { sheetKey, sheetsKey } from "./sheets";
import { tagsKey } from "./tags";
import { takeoffKey, takeoffsKey } from "./takeoffs";
import { unitTypesKey } from "./unit-types";

const scope = { orgSlug: "acme", projectId: "p1" };
const book = { orgSlug: "acme", priceBookId: "b1" };
const takeoff = { ...scope, takeoffId: "t1" };

const allKeys = (s: typeof scope) => [
  sheetsKey(s),
  sheetKey(s, "s1"),
  tagsKey(s, "s1"),
  countsKey(s),
  openingTypesKey(s),
  unitTypesKey(s),
  planSetsQuery(s).queryKey,
  priceGapsQuery(s, null, "v1").queryKey,
  projectDetailsKey(s),
  takeoffsKey(s),
  takeoffKey({ ...s, takeoffId: "t1" }),
  sendsKey({ ...s, takeoffId: "t1" }),
  projectsQuery(s.orgSlug, false).queryKey,
  projectsQuery(s.orgSlug, true).queryKey,
  membersKey(s.orgSlug),
  invitationsKey(s.orgSlug),
  priceBooksKey(s.orgSlug),
  priceBookKey({ orgSlug: s.orgSlug, priceBookId: "b1" }),
  priceBookChangesKey({ orgSlug: s.orgSlug, priceBookId: "b1" }),
];

function sourceFiles(dir: string): string[] {
  return readdirSync(dir).flatMap((name) => {
    const path = join(dir, name);
    if (statSync(path).isDirectory()) return sourceFiles(path);
    return /\.tsx?$/.test(name) && !/\.test\.tsx?$/.test(name) ? [path] : [];
  });
}

/** Client code: components/, app/ outside its route handlers, and the lib/ modules marked "use client" (lib/client aside). */
const clientFiles = () => [
  ...sourceFiles("components"),
  ...sourceFiles("app").filter((path) => !path.startsWith(join("app", "api"))),
  ...sourceFiles("lib").filter((path) => !path.startsWith(join("lib", "client")) && /^["']use client["']/.test(readFileSync(path, "utf8"))),
];

/** The files of `files` whose text (comments left out) matches `pattern`. */
const offending = (files: string[], pattern: RegExp) =>
  files.filter((path) => pattern.test(readFileSync(path, "utf8").replace(/\/\*[\s\S]*?\*\/|\/\/.*$/gm, "")));

describe("client resource keys", () => {
  it("give every resource its own key", () => {
    const all = allKeys(scope).map((k) => JSON.stringify(k));
    expect(new Set(all).size).toBe(all.length);
  });

  it("keep one project's entries apart from another's and another organisation's", () => {
    const here = allKeys(scope).map((k) => JSON.stringify(k));
    for (const elsewhere of [{ ...scope, projectId: "p2" }, { ...scope, orgSlug: "other" }]) {
      const project = elsewhere.projectId !== scope.projectId;
      for (const [i, key] of allKeys(elsewhere).entries()) {
        // Organisation-wide keys (the lists) are the same for every project of one organisation, as they should be.
        const orgWide = !JSON.stringify(key).includes(`"${scope.projectId}"`) && !JSON.stringify(key).includes(`"${elsewhere.projectId}"`);
        if (project && orgWide) continue;
        expect(JSON.stringify(key), `key ${i}`).not.toBe(here[i]);
      }
    }
    expect(priceBookKey(book)).not.toEqual(priceBookKey({ ...book, priceBookId: "b2" }));
    expect(sendsKey(takeoff)).not.toEqual(sendsKey({ ...takeoff, takeoffId: "t2" }));
  });

  it("put a project's resources under its prefix, and the organisation's lists outside every project's", () => {
    const prefix = JSON.stringify(["orgs", "acme", "projects", "p1"]).slice(0, -1);
    for (const key of [sheetsKey(scope), planSetsQuery(scope).queryKey, takeoffsKey(scope), sendsKey(takeoff), projectDetailsKey(scope)]) {
      expect(JSON.stringify(key).startsWith(prefix)).toBe(true);
    }
    for (const key of [projectsQuery("acme", true).queryKey, membersKey("acme"), priceBooksKey("acme"), priceBookKey(book)]) {
      expect(JSON.stringify(key).startsWith(JSON.stringify(["orgs", "acme", "projects"]).slice(0, -1))).toBe(false);
    }
  });
});

describe("outside lib/client", () => {
  it("no query key is spelled out: pages and components take them from the resource modules", () => {
    // An array literal as a key, or a key built by hand from the organisation's slug.
    const handWritten = /queryKey\s*:\s*\[|\[\s*["'][\w-]+["']\s*,\s*\w*\.?orgSlug/;
    expect(offending(clientFiles(), handWritten)).toEqual([]);
  });

  it("nothing calls fetch( itself: every request goes through lib/client/fetch.ts", () => {
    // Uploads go through UploadThing's own client and PDFs through pdf.js, neither of which is a call to fetch here.
    expect(offending(clientFiles(), /(^|[^\w.])fetch\s*\(/m)).toEqual([]);
  });

  it("no module tells one refusal from another by the shape of its body", () => {
    expect(offending(clientFiles(), /["']current["']\s+in\b|\.body\.(current|preview|removes)|status\s*===\s*409/)).toEqual([]);
  });

  it("the guards see what they are meant to see", () => {
    // Each pattern above, tried on a line of the kind it exists to catch, so a broken pattern cannot pass quietly.
    expect(/queryKey\s*:\s*\[/.test(`useQuery({ queryKey: ["projects", orgSlug] })`)).toBe(true);
    expect(/(^|[^\w.])fetch\s*\(/m.test("const res = await fetch(`/api/x`);")).toBe(true);
    expect(/(^|[^\w.])fetch\s*\(/m.test("qc.fetchQuery(x); prefetch(y)")).toBe(false);
  });
});
