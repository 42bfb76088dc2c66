import { expect, it } from "vitest";
import { GET } from "@/app/api/health/route";

// Public on purpose (load balancers have no session); it reveals nothing about any organisation.
it("answers ok to anyone, with no organisation data", async () => {
  const res = GET();
  expect(res.status).toBe(200);
  expect(await res.json()).toEqual({ ok: true });
});
