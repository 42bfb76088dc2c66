import { afterAll } from "vitest";
import { pool } from "@/db/client";

// Each test file runs in its own worker with its own pool; close it so the worker can exit.
afterAll(async () => {
  await pool.end();
});
