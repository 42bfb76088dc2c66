import { afterEach, describe, expect, it, vi } from "vitest";
import { ClientError, fieldsOf, refusal, request } from "./fetch";

/** Answers every fetch with this status and JSON body, as a route handler would through lib/api/error-response.ts. */
function answer(status: number, body: unknown) {
  vi.stubGlobal("fetch", async () => new Response(body === undefined ? null : JSON.stringify(body), { status, headers: { "content-type": "application/json" } }));
}

afterEach(() => vi.unstubAllGlobals());

async function refused(): Promise<ClientError> {
  try {
    await request("/api/x", { method: "PATCH", body: {} });
  } catch (error) {
    if (error instanceof ClientError) return error;
    throw error;
  }
  throw new Error("expected a refusal");
}

describe("request", () => {
  it("returns the JSON of a success, and nothing for a 204", async () => {
    answer(200, { project: { id: "p1" } });
    expect(await request("/api/x")).toEqual({ project: { id: "p1" } });
    answer(204, undefined);
    expect(await request("/api/x", { method: "DELETE" })).toBeUndefined();
  });

  it.each([
    ["stale", 409, { current: { id: "r1", version: 3 } }],
    ["confirm_removal", 409, { removes: { tags: 4, openings: 1 } }],
    ["price_gaps", 409, { gaps: [{ mark: "W1" }] }],
    ["import_refused", 422, { preview: { ok: false } }],
    ["preview_changed", 409, { preview: { ok: true } }],
  ] as const)("reads a %s refusal by its code, with its details typed", async (code, status, details) => {
    answer(status, { error: "No.", code, ...details });
    const error = await refused();
    expect(error).toMatchObject({ status, code, message: "No.", fields: {} });
    expect(refusal(error, code)).toEqual(details);
    // Another code's details are not read into this one, whatever the body holds.
    expect(refusal(error, code === "stale" ? "confirm_removal" : "stale")).toBeNull();
  });

  it("tells two 409s apart by code alone: a conflict that happens to carry `current` is not stale", async () => {
    answer(409, { error: "Mark already used.", code: "conflict", fields: { mark: "Mark already used in this project." }, current: null });
    const error = await refused();
    expect(refusal(error, "stale")).toBeNull();
    expect(error.code).toBe("conflict");
    expect(fieldsOf(error)).toEqual({ mark: "Mark already used in this project." });
    expect(error.hasFields).toBe(true);
  });

  it("keeps the field messages of a 422 and leaves them out of the details", async () => {
    answer(422, { error: "Some fields need attention.", code: "invalid", fields: { name: "Name is required." } });
    const error = await refused();
    expect(error).toMatchObject({ status: 422, code: "invalid", fields: { name: "Name is required." }, details: {} });
  });

  it("still refuses an answer that is not ours (no JSON, no code), by its status", async () => {
    vi.stubGlobal("fetch", async () => new Response("<html>Bad gateway</html>", { status: 502 }));
    expect(await refused()).toMatchObject({ status: 502, code: "internal", message: "Request failed (502).", fields: {} });
    vi.stubGlobal("fetch", async () => new Response("nope", { status: 400 }));
    expect(await refused()).toMatchObject({ status: 400, code: "bad_request" });
  });

  it("lets a network failure through as it is, so a form can say the server was not reached", async () => {
    vi.stubGlobal("fetch", async () => {
      throw new TypeError("Failed to fetch");
    });
    await expect(request("/api/x")).rejects.toThrow(TypeError);
    expect(fieldsOf(new TypeError("Failed to fetch"))).toEqual({});
  });

  it("sends JSON with its content type, and no body or header for a GET", async () => {
    const seen: RequestInit[] = [];
    vi.stubGlobal("fetch", async (_path: string, init: RequestInit) => (seen.push(init), new Response("{}", { status: 200 })));
    await request("/api/x", { method: "POST", body: { name: "Wren" } });
    await request("/api/x");
    expect(seen[0]).toMatchObject({ method: "POST", headers: { "content-type": "application/json" }, body: '{"name":"Wren"}' });
    expect(seen[1]).toMatchObject({ method: "GET", headers: undefined, body: undefined });
  });
});
