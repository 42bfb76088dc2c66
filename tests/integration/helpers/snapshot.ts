import { pool } from "@/db/client";

const TABLES = [
  "users",
  "organisations",
  "memberships",
  "invitations",
  "projects",
  "unit_types",
  "plan_sets",
  "sheets",
  "opening_types",
  "tags",
  "price_books",
  "price_book_items",
  "price_book_changes",
  "takeoffs",
  "takeoff_sends",
] as const;

/** Every row of every tenant table, as text: equal snapshots mean a refused request changed nothing. */
export async function snapshot(): Promise<string> {
  const parts: string[] = [];
  for (const t of TABLES) {
    const { rows } = await pool.query(`select * from ${t} order by id`);
    parts.push(`${t}:${JSON.stringify(rows)}`);
  }
  return parts.join("\n");
}
