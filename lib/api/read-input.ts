import type { z } from "zod";
import type { NextRequest } from "next/server";
import { versionParam } from "@/lib/validators/plans";
import { isUuid } from "@/lib/ids";
import { AppError, fieldErrors, invalid } from "@/lib/errors";
import { unknownFields } from "./unknown-fields";

const MAX_BODY_BYTES = 64 * 1024;

/**
 * True only for `application/json`, optionally with `charset=utf-8`. A substring test would let
 * `text/plain; x=application/json` through — a "simple" content type that a browser sends cross-site
 * without a preflight, so it must never reach a state-changing handler (RFC 9110 §8.3.1 grammar).
 */
export function isJsonMediaType(header: string | null): boolean {
  if (!header) return false;
  const [type = "", ...params] = header.split(";");
  if (type.trim().toLowerCase() !== "application/json") return false;
  return params.every((param) => {
    const [name = "", value = ""] = param.split("=");
    return name.trim().toLowerCase() === "charset" && value.trim().replace(/^"(.*)"$/, "$1").toLowerCase() === "utf-8";
  });
}

/**
 * Parses a JSON body against a schema: wrong media type → 415, malformed → 400, oversized → 413,
 * wrong or unknown fields → 422 naming each field.
 */
export async function readJson<S extends z.ZodType>(req: Request, schema: S): Promise<z.output<S>> {
  if (!isJsonMediaType(req.headers.get("content-type"))) {
    throw new AppError(415, "Send the request body as JSON (Content-Type: application/json).");
  }
  const raw = await req.text();
  if (raw.length > MAX_BODY_BYTES) throw new AppError(413, "The request body is too large.");
  let body: unknown;
  try {
    body = JSON.parse(raw);
  } catch {
    throw new AppError(400, "The request body is not valid JSON.");
  }
  return parseStrict(schema, body);
}

/** A schema parse that also refuses keys the schema does not name, instead of dropping them. */
export function parseStrict<S extends z.ZodType>(schema: S, value: unknown): z.output<S> {
  const parsed = schema.safeParse(value);
  const unknown = Object.fromEntries(unknownFields(schema, value).map((key) => [key, `${key} is not a field this accepts.`]));
  if (parsed.success && Object.keys(unknown).length === 0) return parsed.data;
  const fields = { ...unknown, ...(parsed.success ? {} : fieldErrors(parsed.error)) };
  throw invalid(fields, Object.keys(unknown).length > 0 ? `Unknown field: ${Object.keys(unknown).join(", ")}.` : undefined);
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
