import { pool } from "@/db/client";

const TABLES = ["users", "organisations", "memberships", "invitations", "projects", "price_books", "price_book_items", "price_book_changes"] as const;

/** Every row of every tenant table, as text: equal snapshots mean a refused request changed nothing. */
export async function snapshot(): Promise<string> {
  const parts: string[] = [];
  for (const t of TABLES) {
    const { rows } = await pool.query(`select * from ${t} order by id`);
    parts.push(`${t}:${JSON.stringify(rows)}`);
  }
  return parts.join("\n");
}
