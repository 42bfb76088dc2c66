import type { ErrorCode } from "@/lib/errors";

/** What each refusal code carries beside its message (see lib/errors.ts and lib/api/error-response.ts). */
export interface RefusalDetails {
  /** The row as it is now; null once it is gone. */
  stale: { current: unknown };
  /** What a delete would take now, to be confirmed afresh. */
  confirm_removal: { removes: { tags: number; openings: number } };
  price_gaps: { gaps: unknown };
  import_refused: { preview: unknown };
  preview_changed: { preview: unknown };
}

/**
 * The one client error: every refusal from our route handlers arrives as `{ error, code, fields?, ...details }`.
 * Callers tell one refusal from another by `code`, never by the shape of the body.
 */
export class ClientError extends Error {
  constructor(
    readonly status: number,
    readonly code: ErrorCode,
    message: string,
    readonly fields: Record<string, string> = {},
    /** Everything else the refusal carried; read it typed through `refusal()`. */
    readonly details: Record<string, unknown> = {},
  ) {
    super(message);
  }

  /** True when the server named at least one field, so the message belongs beside a control. */
  get hasFields() {
    return Object.keys(this.fields).length > 0;
  }
}

/** The refusal's details when `error` is a refusal with this code, else null. */
export function refusal<C extends keyof RefusalDetails>(error: unknown, code: C): RefusalDetails[C] | null {
  return error instanceof ClientError && error.code === code ? (error.details as unknown as RefusalDetails[C]) : null;
}

/** Field messages of a refusal, or none (also for a network failure). */
export const fieldsOf = (error: unknown): Record<string, string> => (error instanceof ClientError ? error.fields : {});

/**
 * Browser-side fetch for our route handlers: JSON in and out, refusals thrown as ClientError. A network
 * failure is thrown as it comes (a TypeError), so callers can say "could not reach the server".
 */
export async function request<T>(path: string, init: { method?: string; body?: unknown } = {}): Promise<T> {
  const res = await fetch(path, {
    method: init.method ?? "GET",
    headers: init.body === undefined ? undefined : { "content-type": "application/json" },
    body: init.body === undefined ? undefined : JSON.stringify(init.body),
  });
  if (res.status === 204) return undefined as T;
  const data = (await res.json().catch(() => ({}))) as Record<string, unknown>;
  if (!res.ok) {
    const { error, code, fields, ...details } = data;
    // A body without a code did not come from our handlers (a proxy, a crash page): treat it as ours failing.
    const known = typeof code === "string" ? (code as ErrorCode) : res.status >= 500 ? "internal" : "bad_request";
    const message = typeof error === "string" ? error : `Request failed (${res.status}).`;
    throw new ClientError(res.status, known, message, (fields as Record<string, string> | undefined) ?? {}, details);
  }
  return data as T;
}
