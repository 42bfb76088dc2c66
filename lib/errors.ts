import { ZodError } from "zod";

/** Errors that carry their HTTP meaning; everything the API refuses is one of these. */
export class AppError extends Error {
  constructor(
    readonly status: 400 | 401 | 403 | 404 | 409 | 410 | 413 | 415 | 422 | 429 | 503,
    message: string,
    readonly fields?: Record<string, string>,
    /** Extra data for the client, e.g. the current row after a stale edit. */
    readonly details?: Record<string, unknown>,
  ) {
    super(message);
  }
}

/** Someone saved this row since you loaded it: answer 409 with the row as it is now. */
export const stale = (current: unknown) =>
  new AppError(409, "Someone else changed this since you loaded it. The latest version is shown; make your change again.", undefined, {
    current,
  });

export const unauthenticated = () => new AppError(401, "Sign in to continue.");
export const forbidden = () => new AppError(403, "Your role does not allow this.");
export const notFound = (what = "Not found") => new AppError(404, what);
/** The thing existed but can no longer be used (a spent or expired link). */
export const gone = (message: string) => new AppError(410, message);
export const conflict = (message: string, fields?: Record<string, string>) => new AppError(409, message, fields);
export const invalid = (fields: Record<string, string>, message = "Some fields need attention.") =>
  new AppError(422, message, fields);

/** zod issues → one message per field (the first), keyed by dotted path. */
export function fieldErrors(error: ZodError): Record<string, string> {
  const out: Record<string, string> = {};
  for (const issue of error.issues) {
    const key = issue.path.join(".") || "_";
    out[key] ??= issue.message;
  }
  return out;
}

export function toAppError(error: unknown): AppError | null {
  if (error instanceof AppError) return error;
  if (error instanceof ZodError) return invalid(fieldErrors(error));
  return null;
}
