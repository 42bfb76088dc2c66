import { NextResponse } from "next/server";
import { toAppError } from "@/lib/errors";

/** The one mapping from errors to HTTP. Unknown errors are logged and answered 500 without detail. */
export function errorResponse(error: unknown): NextResponse {
  const known = toAppError(error);
  if (known) {
    return NextResponse.json({ ...known.details, error: known.message, fields: known.fields }, { status: known.status });
  }
  console.error(error);
  return NextResponse.json({ error: "Something went wrong on our side." }, { status: 500 });
}
