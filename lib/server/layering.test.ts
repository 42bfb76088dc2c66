import { readdirSync, readFileSync, statSync } from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";

/**
 * The one direction imports run (DEVELOPERS.md, "Layers"):
 *   app → lib/server (use cases) → db/queries (data access) and takeoff/ (the engine)
 * db/ takes nothing from lib/ or app/; takeoff/ takes nothing from the rest of the project; lib/ never
 * reaches up into app/ or components/; pages, route handlers and components reach the database only
 * through lib/server. Browser code may take a type from lib/server or db/schema (erased at build), never a value.
 */
const root = path.resolve(__dirname, "../..");
const read = (file: string) => readFileSync(path.join(root, file), "utf8");
/** Module specifiers with whether the import is type-only (`import type …` or `export type …`). */
const imports = (source: string) =>
  [...source.matchAll(/^(import|export)(\s+type)?[^;]*?from\s+"([^"]+)"/gms)].map((m) => ({ from: m[3]!, typeOnly: !!m[2] }));

function filesUnder(dir: string): string[] {
  return readdirSync(path.join(root, dir)).flatMap((name) => {
    const rel = path.join(dir, name);
    if (statSync(path.join(root, rel)).isDirectory()) return filesUnder(rel);
    return /\.(ts|tsx|mts|mjs)$/.test(name) && !/\.test\.tsx?$/.test(name) ? [rel] : [];
  });
}

const offending = (files: string[], banned: (from: string, typeOnly: boolean) => boolean) =>
  files.flatMap((f) => imports(read(f)).filter((i) => banned(i.from, i.typeOnly)).map((i) => `${f} → ${i.from}`));

const startsWithAny = (from: string, prefixes: string[]) => prefixes.some((p) => from === p || from.startsWith(`${p}/`));

describe("import direction", () => {
  it("db/ imports nothing from lib/, app/ or components/", () => {
    expect(offending(filesUnder("db"), (from) => startsWithAny(from, ["@/lib", "@/app", "@/components"]))).toEqual([]);
  });

  it("takeoff/ (the engine) imports nothing else of the project", () => {
    expect(offending(filesUnder("takeoff"), (from) => startsWithAny(from, ["@/lib", "@/db", "@/app", "@/components"]))).toEqual([]);
  });

  it("lib/ never reaches up into app/ or components/", () => {
    expect(offending(filesUnder("lib"), (from) => startsWithAny(from, ["@/app", "@/components"]))).toEqual([]);
  });

  it("pages and route handlers reach the database only through lib/server", () => {
    expect(offending(filesUnder("app"), (from, typeOnly) => startsWithAny(from, ["@/db"]) && !(typeOnly && from === "@/db/schema"))).toEqual([]);
  });

  it("components take no value from lib/server or db/", () => {
    expect(offending(filesUnder("components"), (from, typeOnly) => startsWithAny(from, ["@/db", "@/lib/server"]) && !typeOnly)).toEqual([]);
  });

  it("the check sees imports at all (a broken pattern would pass everything)", () => {
    expect(imports(read("lib/server/takeoffs/run-takeoff.ts")).map((i) => i.from)).toContain("@/db/queries/takeoffs");
    expect(imports('import type { A } from "@/db/schema";')).toEqual([{ from: "@/db/schema", typeOnly: true }]);
  });
});
