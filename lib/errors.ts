import { ZodError } from "zod";

/**
 * What kind of refusal this is, as a stable string beside the HTTP status, so a client tells one 409
 * from another (`stale` carries `current`; `confirm_removal` carries `removes`) without sniffing fields.
 */
export type ErrorCode =
  | "bad_request"
  | "unauthenticated"
  | "forbidden"
  | "cross_site"
  | "not_found"
  | "conflict"
  | "stale"
  | "locked"
  | "already_submitted"
  | "confirm_removal"
  | "preview_changed"
  | "gone"
  | "too_large"
  | "unsupported_media_type"
  | "invalid"
  | "price_gaps"
  | "placeholder_prices"
  | "import_refused"
  | "rate_limited"
  | "unavailable"
  | "internal";

type Status = 400 | 401 | 403 | 404 | 409 | 410 | 413 | 415 | 422 | 429 | 503;

const CODE_FOR_STATUS: Record<Status, ErrorCode> = {
  400: "bad_request",
  401: "unauthenticated",
  403: "forbidden",
  404: "not_found",
  409: "conflict",
  410: "gone",
  413: "too_large",
  415: "unsupported_media_type",
  422: "invalid",
  429: "rate_limited",
  503: "unavailable",
};

/** Errors that carry their HTTP meaning; everything the API refuses is one of these. */
export class AppError extends Error {
  readonly code: ErrorCode;
  constructor(
    readonly status: Status,
    message: string,
    readonly fields?: Record<string, string>,
    /** Extra data for the client, e.g. the current row after a stale edit. */
    readonly details?: Record<string, unknown>,
    code?: ErrorCode,
  ) {
    super(message);
    this.code = code ?? CODE_FOR_STATUS[status];
  }
}

/** Someone saved this row since you loaded it: answer 409 with the row as it is now. */
export const stale = (current: unknown) =>
  new AppError(
    409,
    "Someone else changed this since you loaded it. The latest version is shown; make your change again.",
    undefined,
    { current },
    "stale",
  );

export const unauthenticated = () => new AppError(401, "Sign in to continue.");
export const forbidden = () => new AppError(403, "Your role does not allow this.");
export const notFound = (what = "Not found") => new AppError(404, what);
/** The thing existed but can no longer be used (a spent or expired link). */
export const gone = (message: string) => new AppError(410, message);
export const conflict = (message: string, fields?: Record<string, string>, code: ErrorCode = "conflict") =>
  new AppError(409, message, fields, undefined, code);
export const invalid = (fields: Record<string, string>, message = "Some fields need attention.") =>
  new AppError(422, message, fields);

/** The row a data-access read found, or a 404 naming what was missing: the one place reads become refusals. */
export function orNotFound<T>(row: T | null | undefined, what: string): T {
  if (row === null || row === undefined) throw notFound(what);
  return row;
}

/**
 * After a version-checked write matched no row: the row as it is now means someone saved first (409 with
 * `current`); no row at all answers 404 like one that never was — "gone" and "not yours" must look the same.
 */
export function staleOrMissing(current: unknown, what: string): never {
  throw current === null || current === undefined ? notFound(what) : stale(current);
}

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
