import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { cutList } from "./cut-list";
import { Q } from "./testing/rational";
import type { CutPiece, TrimSpec, WindowOpening as Opening } from "./types";

const find = (pieces: CutPiece[], part: string) => pieces.find((p) => p.part === part);
const r16 = (q: Q) => q.nearestSixteenth().toNumber();

describe("cut list: stool-and-apron", () => {
  const spec: TrimSpec = { style: "stool-and-apron", casingWidth: 2.5, casingThickness: 0.6875 };

  it("a leg of 23 1/4 stool-to-head with 1/8 reveal and 2 1/2 casing is 25 7/8 long point (common practice)", () => {
    const pieces = cutList({ width: 30, height: 23.25, setback: 0 }, spec);
    expect(find(pieces, "casing-leg")).toEqual({ part: "casing-leg", material: "casing", quantity: 2, length: 25.875, ends: ["square", "miter"] });
  });

  it("applies the default reveal of 1/8 in (common practice: 1/16–1/8)", () => {
    const withDefault = cutList({ width: 30, height: 40, setback: 0 }, spec);
    const explicit = cutList({ width: 30, height: 40, setback: 0 }, { ...spec, reveal: 0.125 });
    expect(withDefault).toEqual(explicit);
    expect(find(withDefault, "casing-head")?.length).toBe(30 + 0.25 + 5);
  });

  it("defaults the horn to twice the casing thickness (common practice)", () => {
    const pieces = cutList({ width: 30, height: 40, setback: 0 }, spec);
    expect(find(pieces, "stool")?.length).toBe(30 + 0.25 + 5 + 2 * (2 * 0.6875));
  });

  it("stool width is setback plus the 1 in default projection (common practice)", () => {
    const pieces = cutList({ width: 30, height: 40, setback: 1.1875 }, spec);
    expect(find(pieces, "stool")?.width).toBe(2.1875);
  });

  it("extension sides run H + t with the 3/4 in default thickness (PS 20: 1-in nominal boards dress to 3/4 in)", () => {
    const pieces = cutList({ width: 30, height: 40, setback: 1.1875 }, spec);
    expect(find(pieces, "extension-side")).toEqual({
      part: "extension-side", material: "extension", quantity: 2, length: 40.75, width: 1.1875, ends: ["square", "square"],
    });
    expect(find(pieces, "extension-head")).toMatchObject({ quantity: 1, length: 30, width: 1.1875 });
  });

  it("apron: return-mitered by default with two returns as long as the casing is thick", () => {
    const pieces = cutList({ width: 30, height: 40, setback: 0 }, { ...spec, apronInset: 0.5 });
    expect(find(pieces, "apron")).toMatchObject({ material: "apron", quantity: 1, length: 35.25 - 1, ends: ["return", "return"] });
    expect(find(pieces, "apron-return")).toMatchObject({ material: "apron", quantity: 2, length: 0.6875 });
  });

  it("apron without returns has square ends and no return pieces", () => {
    const pieces = cutList({ width: 30, height: 40, setback: 0 }, { ...spec, apronReturns: false });
    expect(find(pieces, "apron")?.ends).toEqual(["square", "square"]);
    expect(find(pieces, "apron-return")).toBeUndefined();
  });

  it("has no extension pieces when the setback is 0", () => {
    const parts = cutList({ width: 30, height: 40, setback: 0 }, spec).map((p) => p.part);
    expect(parts).toEqual(["casing-leg", "casing-head", "stool", "apron", "apron-return"]);
  });
});

describe("cut list: picture-frame", () => {
  it("four mitered casing pieces and four extension pieces", () => {
    const pieces = cutList({ width: 30, height: 48, setback: 0.5 }, { style: "picture-frame", casingWidth: 3.25, casingThickness: 0.75 });
    expect(pieces).toEqual([
      { part: "casing-leg", material: "casing", quantity: 2, length: 48 + 0.25 + 6.5, ends: ["miter", "miter"] },
      { part: "casing-head", material: "casing", quantity: 1, length: 30 + 0.25 + 6.5, ends: ["miter", "miter"] },
      { part: "casing-bottom", material: "casing", quantity: 1, length: 30 + 0.25 + 6.5, ends: ["miter", "miter"] },
      { part: "extension-side", material: "extension", quantity: 2, length: 49.5, width: 0.5, ends: ["square", "square"] },
      { part: "extension-head", material: "extension", quantity: 1, length: 30, width: 0.5, ends: ["square", "square"] },
      { part: "extension-bottom", material: "extension", quantity: 1, length: 30, width: 0.5, ends: ["square", "square"] },
    ]);
  });
});

/** The formulas evaluated independently with BigInt rationals, then rounded to 1/16. */
function expected(o: Opening, s: Required<Omit<TrimSpec, "curvedCasing" | "segmentBoardWidth">>): Record<string, number> {
  const [W, H, S, Cw, Ct] = [o.width, o.height, o.setback, s.casingWidth, s.casingThickness].map((x) => Q.of(x)) as [Q, Q, Q, Q, Q];
  const [r, h, t] = [s.reveal, s.stoolHorn, s.extensionThickness].map((x) => Q.of(x)) as [Q, Q, Q];
  const across = W.add(r.mul(2)).add(Cw.mul(2));
  if (s.style === "stool-and-apron") {
    return {
      "casing-leg": r16(H.add(r).add(Cw)),
      "casing-head": r16(across),
      stool: r16(across.add(h.mul(2))),
      "stool-width": r16(S.add(s.stoolProjection)),
      apron: r16(across.sub(Q.of(s.apronInset).mul(2))),
      "apron-return": r16(Ct),
      "extension-side": r16(H.add(t)),
      "extension-head": r16(W),
    };
  }
  return {
    "casing-leg": r16(H.add(r.mul(2)).add(Cw.mul(2))),
    "casing-head": r16(across),
    "casing-bottom": r16(across),
    "extension-side": r16(H.add(t.mul(2))),
    "extension-head": r16(W),
    "extension-bottom": r16(W),
  };
}

describe("cut list matches the formulas computed with a second exact arithmetic (BigInt rationals)", () => {
  const len = (lo: number, hi: number) => fc.integer({ min: lo * 64, max: hi * 64 }).map((n) => n / 64);
  const decimal = (lo: number, hi: number) => fc.integer({ min: lo * 1000, max: hi * 1000 }).map((n) => n / 1000);
  it("for random openings and specs, dyadic and decimal", () => {
    fc.assert(
      fc.property(
        fc.constantFrom("stool-and-apron" as const, "picture-frame" as const),
        fc.oneof(len(12, 96), decimal(12, 96)),
        fc.oneof(len(12, 96), decimal(12, 96)),
        fc.oneof(len(0, 8), decimal(0, 8)),
        fc.record({
          cw: len(1, 6),
          ct: len(0.25, 1.5),
          reveal: len(0, 0.25),
          horn: len(0, 2),
          proj: len(0, 2),
          inset: len(0, 1),
          t: len(0.25, 1.5),
        }),
        (style, width, height, setback, v) => {
          const spec = {
            style,
            casingWidth: v.cw,
            casingThickness: v.ct,
            reveal: v.reveal,
            stoolHorn: v.horn,
            stoolProjection: v.proj,
            apronInset: v.inset,
            apronReturns: true,
            extensionThickness: v.t,
          };
          const opening = { width, height, setback };
          const pieces = cutList(opening, spec);
          const want = expected(opening, spec);
          for (const p of pieces) {
            expect(p.length).toBe(want[p.part]);
            if (p.part === "stool") expect(p.width).toBe(want["stool-width"]);
            if (p.material === "extension") expect(p.width).toBe(r16(Q.of(setback)));
          }
          const parts = pieces.map((p) => p.part);
          expect(parts.some((p) => p.startsWith("extension"))).toBe(setback > 0);
        },
      ),
      { numRuns: 300 },
    );
  });

  it("rounds an exact half sixteenth up", () => {
    // W = 30 1/32: head = 30 1/32 + 1/4 + 5 = 35 9/32 → 35 5/16
    const pieces = cutList({ width: 30.03125, height: 40, setback: 0 }, { style: "stool-and-apron", casingWidth: 2.5, casingThickness: 0.75 });
    expect(find(pieces, "casing-head")?.length).toBe(35.3125);
  });

  it("hands out copies: changing a returned piece does not change the next call", () => {
    const o = { width: 31, height: 41, setback: 0 };
    const s: TrimSpec = { style: "picture-frame", casingWidth: 2.5, casingThickness: 0.75 };
    const first = cutList(o, s);
    (first[0] as CutPiece).length = 1;
    (first[0] as CutPiece).ends[0] = "square";
    expect(cutList(o, s)[0]).toMatchObject({ length: 41 + 0.25 + 5, ends: ["miter", "miter"] });
  });
});

describe("bad input throws an Error naming the field", () => {
  const spec: TrimSpec = { style: "stool-and-apron", casingWidth: 2.5, casingThickness: 0.75 };
  const opening: Opening = { width: 30, height: 40, setback: 1 };
  it.each<[string, Opening, TrimSpec, RegExp]>([
    ["non-finite width", { ...opening, width: Number.NaN }, spec, /width/],
    ["infinite height", { ...opening, height: Number.POSITIVE_INFINITY }, spec, /height/],
    ["zero width", { ...opening, width: 0 }, spec, /width/],
    ["negative height", { ...opening, height: -1 }, spec, /height/],
    ["negative setback", { ...opening, setback: -0.5 }, spec, /setback/],
    ["negative casing thickness", opening, { ...spec, casingThickness: -0.75 }, /casing thickness/],
    ["negative extension thickness", opening, { ...spec, extensionThickness: -1 }, /extension thickness/],
    ["reveal as wide as the casing", opening, { ...spec, reveal: 2.5 }, /reveal/],
    ["unknown style", opening, { ...spec, style: "craftsman" as never }, /style/],
    ["string width", { ...opening, width: "30" as never }, spec, /width/],
    ["apron inset eating the apron", opening, { ...spec, apronInset: 40 }, /apronInset/],
  ])("%s", (_label, o, s, message) => {
    expect(() => cutList(o, s)).toThrow(message);
  });
});
