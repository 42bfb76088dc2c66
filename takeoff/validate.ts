import type { z } from "zod";

/**
 * Parses with a schema and throws a plain Error naming the offending field
 * (e.g. "spec.reveal: reveal must be less than the casing width"), so callers
 * that do not use zod still learn which input was wrong.
 */
export function parseOrThrow<S extends z.ZodType>(schema: S, value: unknown, where?: string): z.output<S> {
  const result = schema.safeParse(value);
  if (result.success) return result.data;
  const issue = result.error.issues[0];
  const path = [where, ...(issue?.path ?? []).map(String)].filter((p) => p !== undefined && p !== "").join(".");
  throw new Error(`${path || "input"}: ${issue?.message ?? "invalid"}`);
}
