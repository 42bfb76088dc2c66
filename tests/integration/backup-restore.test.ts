/**
 * `npm run demo:backup` and `npm run demo:restore FILE`: a backup of a database and its stored plan files,
 * restored into a brand-new PostgreSQL cluster, gives back the same rows and the same files.
 */
import { execFile } from "node:child_process";
import { createHash } from "node:crypto";
import { mkdtemp, readdir, readFile, rm, writeFile, mkdir } from "node:fs/promises";
import { tmpdir } from "node:os";
import path from "node:path";
import { promisify } from "node:util";
import pg from "pg";
import { afterAll, expect, it } from "vitest";
import { makeOrg } from "./helpers/world";

const run = promisify(execFile);
const SCRATCH = `restore-${process.pid}`;
let work: string;

/** Every table's row count and a digest of its rows, in one stable text. */
async function fingerprint(url: string) {
  const client = new pg.Client({ connectionString: url });
  await client.connect();
  try {
    const { rows: tables } = await client.query<{ name: string }>(
      "select table_name as name from information_schema.tables where table_schema = 'public' order by 1",
    );
    const lines: string[] = [];
    for (const { name } of tables) {
      const { rows } = await client.query(`select count(*)::int as n, md5(coalesce(string_agg(t::text, '|' order by t::text), '')) as digest from "${name}" t`);
      lines.push(`${name} ${rows[0].n} ${rows[0].digest}`);
    }
    return lines.join("\n");
  } finally {
    await client.end();
  }
}

async function files(dir: string) {
  const out: string[] = [];
  for (const name of (await readdir(dir, { recursive: true, withFileTypes: true })).filter((e) => e.isFile())) {
    const full = path.join(name.parentPath, name.name);
    out.push(`${path.relative(dir, full)} ${createHash("md5").update(await readFile(full)).digest("hex")}`);
  }
  return out.sort();
}

afterAll(async () => {
  // Stop and remove the scratch cluster this test made.
  await run("bash", ["-c", 'source scripts/lib.sh && pg_down && rm -rf "$(pg_dir)"'], { env: { ...process.env, MITERWISE_PG_CLUSTER: SCRATCH } }).catch(() => {});
  if (work) await rm(work, { recursive: true, force: true });
});

it("a backup restored into a fresh cluster has the same rows and the same stored files", { timeout: 120_000 }, async () => {
  await makeOrg("Tamarack");
  work = await mkdtemp(path.join(tmpdir(), "miterwise-backup-"));
  const source = path.join(work, "uploads");
  await mkdir(path.join(source, "files"), { recursive: true });
  await writeFile(path.join(source, "files", "plan-key-1"), Buffer.from("%PDF-1.7 stored plan bytes"));
  await writeFile(path.join(source, "files", "plan-key-1.json"), JSON.stringify({ key: "plan-key-1" }));
  const dbName = new URL(process.env.DATABASE_URL!).pathname.slice(1);
  const file = path.join(work, "backup.tar");

  await run("bash", ["scripts/demo-backup.sh", file], {
    env: { ...process.env, MITERWISE_PG_CLUSTER: "test", MITERWISE_DB: dbName, UPLOAD_STAND_IN_DIR: source },
  });
  const restored = path.join(work, "restored-uploads");
  await run("bash", ["scripts/demo-restore.sh", file], {
    env: { ...process.env, MITERWISE_PG_CLUSTER: SCRATCH, MITERWISE_DB: "miterwise_restored", UPLOAD_STAND_IN_DIR: restored },
  });
  const { stdout: port } = await run("bash", ["-c", "source scripts/lib.sh && echo $PGPORT"], { env: { ...process.env, MITERWISE_PG_CLUSTER: SCRATCH } });
  const restoredUrl = new URL(process.env.DATABASE_URL!);
  restoredUrl.port = port.trim();
  restoredUrl.pathname = "/miterwise_restored";

  const [before, after] = [await fingerprint(process.env.DATABASE_URL!), await fingerprint(restoredUrl.href)];
  expect(after.split("\n").length).toBeGreaterThan(10);
  expect(after).toBe(before);
  expect(await files(restored)).toEqual(await files(source));
});
