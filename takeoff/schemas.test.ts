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
