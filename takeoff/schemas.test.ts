import { describe, expect, it } from "vitest";
import { lengthTextSchema, openingSchema, stockItemSchema, takeoffLineSchema, trimSpecSchema } from "./index";

// Field names and messages follow the engine contract; zod (zod package) does the checking.
describe("zod schemas shared with the API and forms", () => {
  it("point their issues at the field", () => {
    const spec = trimSpecSchema.safeParse({ style: "picture-frame", casingWidth: 2.5, casingThickness: 0.75, reveal: 3 });
    expect(spec.success).toBe(false);
    expect(spec.error?.issues[0]?.path).toEqual(["reveal"]);
    const opening = openingSchema.safeParse({ width: 30, height: -1, setback: 0 });
    expect(opening.error?.issues[0]).toMatchObject({ path: ["height"], message: "opening height must be greater than 0" });
    const line = takeoffLineSchema.safeParse({ opening: { width: 30, height: 40, setback: 0 }, spec: { style: "x" }, quantity: 1 });
    expect(line.error?.issues.map((i) => i.path.join("."))).toContain("spec.style");
    expect(stockItemSchema.safeParse({ length: 96, price: 10, width: 0 }).error?.issues[0]?.path).toEqual(["width"]);
  });

  it("accept good input unchanged", () => {
    const spec = { style: "stool-and-apron", casingWidth: 2.5, casingThickness: 0.6875, apronReturns: false } as const;
    expect(trimSpecSchema.parse(spec)).toEqual(spec);
  });

  it("read typed lengths in forms (1 in = 25.4 mm exactly, NIST Handbook 44 Appendix C)", () => {
    expect(lengthTextSchema.parse(`2'-1 7/8"`)).toBe(25.875);
    expect(lengthTextSchema.parse("635 mm")).toBe(25);
    const bad = lengthTextSchema.safeParse("7/8/9");
    expect(bad.success).toBe(false);
    expect(bad.error?.issues[0]?.message).toMatch(/cannot read length/);
  });
});

describe("opening kinds in the shared schema", () => {
  it.each([
    { width: 30, height: 40, setback: 0 },
    { kind: "window", width: 30, height: 40, setback: 0 },
    { kind: "mulled", widths: [30, 30], height: 40, setback: 0.5, mullGap: 3.5 },
    { kind: "door", width: 30, height: 81, sides: 2 },
    { kind: "round-top", width: 48, springHeight: 40, setback: 1 },
    { kind: "segment-top", width: 48, springHeight: 40, rise: 8, setback: 1 },
    { kind: "bay", widths: [24, 48, 24], turn: 45, height: 50, setback: 1, mullGap: 6, seat: "one-piece" },
  ])("accepts %o unchanged", (opening) => {
    expect(openingSchema.parse(opening)).toEqual(opening);
  });

  it("points each kind's issues at its own field", () => {
    const path = (v: unknown) => openingSchema.safeParse(v).error?.issues[0]?.path.join(".");
    expect(path({ kind: "mulled", widths: [30, -1], height: 40, setback: 0, mullGap: 3 })).toBe("widths.1");
    expect(path({ kind: "door", width: 30, height: 81, sides: 0 })).toBe("sides");
    expect(path({ kind: "segment-top", width: 30, springHeight: 40, rise: 20, setback: 0 })).toBe("rise");
    expect(path({ kind: "bay", widths: [24, 48, 24], turn: 0, height: 50, setback: 1, mullGap: 6 })).toBe("turn");
    expect(path({ kind: "arched", width: 30 })).toBe("kind");
  });

  it("a spec that cuts curved casing as segments needs a board width wider than the casing", () => {
    const base = { style: "stool-and-apron", casingWidth: 3.5, casingThickness: 0.75 } as const;
    expect(trimSpecSchema.safeParse({ ...base, curvedCasing: "segments" }).error?.issues[0]?.path).toEqual(["segmentBoardWidth"]);
    expect(trimSpecSchema.safeParse({ ...base, curvedCasing: "segments", segmentBoardWidth: 3.5 }).error?.issues[0]?.path).toEqual(["segmentBoardWidth"]);
    expect(trimSpecSchema.parse({ ...base, curvedCasing: "segments", segmentBoardWidth: 5.5 })).toEqual({ ...base, curvedCasing: "segments", segmentBoardWidth: 5.5 });
  });
});
