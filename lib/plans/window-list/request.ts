/**
 * Browser fetch for the plans API. Like lib/api-client.ts, but a refusal keeps what the plans routes
 * send with it: the 422 `fields` and, on a 409 stale edit, `current` — the row as it is now.
 */
export class PlansApiError<T = unknown> extends Error {
  constructor(
    readonly status: number,
    message: string,
    readonly fields: Record<string, string> = {},
    /** Only for a 409 from a version check; undefined for other refusals (a 409 "in use" has none). */
    readonly current?: T | null,
  ) {
    super(message);
  }
}

export async function plansApi<T>(path: string, init: { method?: string; body?: unknown } = {}): Promise<T> {
  const res = await fetch(path, {
    method: init.method ?? "GET",
    headers: init.body === undefined ? undefined : { "content-type": "application/json" },
    body: init.body === undefined ? undefined : JSON.stringify(init.body),
  });
  if (res.status === 204) return undefined as T;
  const data = (await res.json().catch(() => ({}))) as { error?: string; fields?: Record<string, string>; current?: unknown };
  if (!res.ok) {
    const current = res.status === 409 && "current" in data ? data.current : undefined;
    throw new PlansApiError(res.status, data.error ?? `Request failed (${res.status}).`, data.fields, current);
  }
  return data as T;
}

/** Where the plans routes of one project live. */
export const projectApi = (orgSlug: string, projectId: string) => `/api/orgs/${orgSlug}/projects/${projectId}`;
