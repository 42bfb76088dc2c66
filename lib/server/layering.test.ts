import { readdirSync, readFileSync, statSync } from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";

/**
 * The one direction imports run: app → lib/server (use cases) → db/queries (data access). db/queries
 * and db/tables import only db/* and the engine's types; route handlers and server pages reach the
 * database through lib/server, never db/ directly.
 */
const root = path.resolve(__dirname, "../..");
const read = (file: string) => readFileSync(path.join(root, file), "utf8");
const imports = (source: string) => [...source.matchAll(/from\s+"([^"]+)"/g)].map((m) => m[1]!);

function filesUnder(dir: string, pick: (name: string) => boolean): string[] {
  return readdirSync(path.join(root, dir)).flatMap((name) => {
    const rel = path.join(dir, name);
    if (statSync(path.join(root, rel)).isDirectory()) return filesUnder(rel, pick);
    return pick(name) ? [rel] : [];
  });
}

// Still being moved to lib/server (projects, price books, takeoffs, settings), and two tables that take
// their JSON column types from lib/takeoffs/types; remove each as it lands.
const MOVING = new Set([
  ...["project-scope", "projects", "price-books", "price-book-items", "price-book-import", "price-book-changes", "price-book-scope", "takeoffs", "takeoff-lifecycle", "takeoff-documents", "takeoff-compare", "price-gaps", "settings"].map(
    (n) => `db/queries/${n}.ts`,
  ),
  "db/tables/accounts.ts",
  "db/tables/takeoffs.ts",
]);

describe("import direction", () => {
  const dbFiles = [...filesUnder("db/queries", (n) => n.endsWith(".ts")), ...filesUnder("db/tables", (n) => n.endsWith(".ts"))].filter((f) => !MOVING.has(f));

  it.each(dbFiles)("%s imports nothing from lib/ or app/", (file) => {
    expect(imports(read(file)).filter((i) => i.startsWith("@/lib") || i.startsWith("@/app"))).toEqual([]);
  });

  const org = "app/api/orgs/[orgSlug]";
  const routes = [
    ...["members", "invitations"].flatMap((d) => filesUnder(`${org}/${d}`, (n) => n === "route.ts")),
    ...["counts", "opening-types", "plan-sets", "sheets", "tags", "unit-types"].flatMap((d) => filesUnder(`${org}/projects/[projectId]/${d}`, (n) => n === "route.ts")),
    ...filesUnder("app/api/invitations", (n) => n === "route.ts"),
    ...filesUnder("app/api/signup", (n) => n === "route.ts"),
    "app/api/uploadthing/core.ts",
    "app/(auth)/invite/[token]/page.tsx",
    "app/(app)/orgs/page.tsx",
    "app/(app)/[orgSlug]/layout.tsx",
    "app/(app)/[orgSlug]/members/page.tsx",
    "app/(app)/[orgSlug]/projects/[projectId]/sheets/[sheetId]/load-sheet.ts",
  ];

  it.each(routes)("%s reaches the database only through lib/server", (file) => {
    expect(imports(read(file)).filter((i) => i.startsWith("@/db"))).toEqual([]);
  });
});
