/**
 * One owner per client resource: a query key is only ever filled by the module that owns it, so a page that
 * caches a shape and a page that reads it always agree (a Plans page once filed `{ openingTypes }` where the
 * viewer expected a bare list, and the viewer crashed when opened from it).
 */
import { readdirSync, readFileSync, statSync } from "node:fs";
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import { countsKey } from "./counts";
import { openingTypesKey } from "./opening-types";
import { sheetKey, sheetsKey } from "./sheets";
import { tagsKey } from "./tags";
import { unitTypesKey } from "./unit-types";

const scope = { orgSlug: "acme", projectId: "p1" };

function sourceFiles(dir: string): string[] {
  return readdirSync(dir).flatMap((name) => {
    const path = join(dir, name);
    if (statSync(path).isDirectory()) return sourceFiles(path);
    return /\.tsx?$/.test(name) && !name.endsWith(".test.ts") ? [path] : [];
  });
}

describe("project resource keys", () => {
  it("give every resource its own key", () => {
    const all = [sheetsKey(scope), sheetKey(scope, "s1"), tagsKey(scope, "s1"), countsKey(scope), openingTypesKey(scope), unitTypesKey(scope)].map((k) => JSON.stringify(k));
    expect(new Set(all).size).toBe(all.length);
  });

  it("keep one project's entries apart from another's and another organisation's", () => {
    expect(countsKey(scope)).not.toEqual(countsKey({ ...scope, projectId: "p2" }));
    expect(countsKey(scope)).not.toEqual(countsKey({ ...scope, orgSlug: "other" }));
  });

  it("are only spelled out in lib/client: pages and components take them from there", () => {
    const owned = /\[\s*["'](sheets?|tags|counts|opening-types|unit-types)["']\s*,\s*\w*\.?orgSlug/;
    const offenders = ["app", "components", "lib"]
      .flatMap((dir) => sourceFiles(dir))
      .filter((path) => !path.startsWith(join("lib", "client")) && owned.test(readFileSync(path, "utf8")));
    expect(offenders).toEqual([]);
  });
});
