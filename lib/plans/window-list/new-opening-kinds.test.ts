import { describe, expect, it } from "vitest";
import { EMPTY_DRAFT, planCreate } from "./new-opening";

const draft = (o: Partial<typeof EMPTY_DRAFT>) => ({ ...EMPTY_DRAFT, mark: "K1", setback: "1 7/16", ...o });

describe("the new-opening form with opening kinds", () => {
  it("sends a mulled unit's widths as a list, with its mull gap and height, and no width of its own", () => {
    const plan = planCreate(draft({ kind: "mulled", widths: "35 1/2, 35 1/2", mullGap: "1 1/2", height: "54", width: "99" }));
    expect(plan).toEqual({ kind: "send", body: expect.objectContaining({ kind: "mulled", widths: [35.5, 35.5], mullGap: 1.5, height: 54 }) });
    expect(plan.kind === "send" && "width" in plan.body && plan.body.width !== undefined).toBe(false);
  });

  it("sends a door with its sides and no setback (the wall fields are not shown for a door)", () => {
    const plan = planCreate(draft({ kind: "door", width: "30", height: "81", sides: "1", setback: "" }));
    expect(plan).toEqual({ kind: "send", body: expect.objectContaining({ kind: "door", width: 30, height: 81, sides: 1 }) });
  });

  it("names the unit whose width cannot be read, and a missing spring height", () => {
    expect(planCreate(draft({ kind: "mulled", widths: "35, wide", mullGap: "1 1/2", height: "54" }))).toEqual({
      kind: "invalid",
      fields: { widths: expect.stringMatching(/^Unit 2: Unit width: write a length/) },
    });
    expect(planCreate(draft({ kind: "round-top", width: "48" }))).toEqual({ kind: "invalid", fields: { springHeight: expect.stringMatching(/spring height/) } });
  });

  it("a plain window is sent exactly as before, without a kind", () => {
    const plan = planCreate(draft({ width: "36", height: "60" }));
    expect(plan).toEqual({ kind: "send", body: { mark: "K1", width: 36, height: 60, setback: 1.4375, notes: null } });
  });
});
