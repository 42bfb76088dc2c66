import type { z } from "zod";
import type { NextRequest } from "next/server";
import { versionParam } from "@/lib/validators/plans";
import { isUuid } from "@/lib/ids";
import { AppError, fieldErrors, invalid } from "@/lib/errors";

const MAX_BODY_BYTES = 64 * 1024;

/** Parses a JSON body against a schema: malformed or oversized JSON → 400/413, wrong fields → 422. */
export async function readJson<S extends z.ZodType>(req: Request, schema: S): Promise<z.output<S>> {
  if (!(req.headers.get("content-type") ?? "").includes("application/json")) {
    throw new AppError(400, "Send the request body as JSON (Content-Type: application/json).");
  }
  const raw = await req.text();
  if (raw.length > MAX_BODY_BYTES) throw new AppError(413, "The request body is too large.");
  let body: unknown;
  try {
    body = JSON.parse(raw);
  } catch {
    throw new AppError(400, "The request body is not valid JSON.");
  }
  const parsed = schema.safeParse(body);
  if (!parsed.success) throw invalid(fieldErrors(parsed.error));
  return parsed.data;
}

/** Route ids that are not UUIDs cannot name a row: answer 404 rather than letting PostgreSQL raise. */
export function parseId(value: string | undefined, what: string): string {
  if (!isUuid(value)) {
    throw new AppError(404, `No such ${what}.`);
  }
  return value;
}

/** `?version=N` on a DELETE: the version the client last saw, so a delete can be stale too. */
export function readVersion(req: NextRequest): number {
  const parsed = versionParam.safeParse(req.nextUrl.searchParams.get("version") ?? undefined);
  if (!parsed.success) throw invalid({ version: "Give ?version=N: reload and try again." });
  return parsed.data;
}
