import { NextResponse } from "next/server";
import { toAppError } from "@/lib/errors";

/**
 * The one mapping from errors to HTTP: `{ error, code, fields?, ...details }`. Unknown errors are logged
 * and answered 500 without detail.
 */
export function errorResponse(error: unknown): NextResponse {
  const known = toAppError(error);
  if (known) {
    return NextResponse.json(
      { ...known.details, error: known.message, code: known.code, fields: known.fields },
      { status: known.status },
    );
  }
  console.error(error);
  return NextResponse.json({ error: "Something went wrong on our side.", code: "internal" }, { status: 500 });
}
