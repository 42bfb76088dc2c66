import { describe, expect, it } from "vitest";
import { cutList } from "../cut-list";
import type { BayOpening, CutPiece, TrimSpec } from "../types";

const all = (pieces: CutPiece[], part: string) => pieces.filter((p) => p.part === part);
const spec: TrimSpec = { style: "stool-and-apron", casingWidth: 3.5, casingThickness: 0.75, reveal: 0.25 };
const bay = (turn: number, extra: Partial<BayOpening> = {}): BayOpening => ({ kind: "bay", widths: [24, 48, 24], turn, height: 50, setback: 1, mullGap: 6, ...extra });
const sixteenth = (x: number) => Math.floor(x * 16 + 0.5) / 16;

describe("bay and bow windows", () => {
  it.each([
    [45, 22.5],
    [30, 15],
  ])("stool saw setting at a corner is half the flanker's turn: %d° → %d° (Fine Homebuilding and carpentry texts; a miter bisects the corner)", (turn, setting) => {
    const stools = all(cutList(bay(turn), spec), "stool");
    expect(stools.map((s) => s.cutAngles)).toEqual([
      [0, setting],
      [setting, setting],
    ]);
    expect(stools.map((s) => s.ends)).toEqual([
      ["square", "miter"],
      ["miter", "miter"],
    ]);
  });

  it("stool segments: long point on the back edge, setback·tan(turn/2) past each corner (derived); mirrored flankers are one line of two", () => {
    const [flanker, centre] = all(cutList(bay(45), spec), "stool");
    const k = Math.tan(Math.PI / 8);
    // Flanker: 24 + (1/4 + 3 1/2 + horn 1 1/2) at the wall + half the 6 in gap at the corner.
    expect(flanker).toMatchObject({ quantity: 2, length: sixteenth(24 + 5.25 + 3 + k), width: 2 });
    expect(centre).toMatchObject({ quantity: 1, length: sixteenth(48 + 6 + 2 * k) });
  });

  it("a bow of five units at 10° has a 5° saw setting at each of its four corners", () => {
    const pieces = cutList(bay(10, { widths: [20, 20, 20, 20, 20] }), spec);
    expect(all(pieces, "stool").flatMap((s) => s.cutAngles ?? [])).toEqual([0, 5, 5, 5]);
    expect(all(pieces, "stool").map((s) => s.quantity)).toEqual([2, 3]);
    expect(all(pieces, "mullion-casing")).toEqual([
      { part: "mullion-casing", material: "mullion", quantity: 8, length: 50.25, width: 2.75, edgeBevel: 5, ends: ["square", "square"] },
    ]);
  });

  it("casing where unit planes meet: heads per unit, mitered at the wall-end legs and beveled at the corners; two beveled mullion casings per corner", () => {
    const pieces = cutList(bay(45), spec);
    expect(all(pieces, "casing-leg")).toEqual([{ part: "casing-leg", material: "casing", quantity: 2, length: 53.75, ends: ["square", "miter"] }]);
    expect(all(pieces, "casing-head")).toEqual([
      { part: "casing-head", material: "casing", quantity: 2, length: 24 + 3.75 + 3, ends: ["miter", "bevel"], cutAngles: [45, 22.5] },
      { part: "casing-head", material: "casing", quantity: 1, length: 54, ends: ["bevel", "bevel"], cutAngles: [22.5, 22.5] },
    ]);
    expect(all(pieces, "mullion-casing")).toEqual([
      { part: "mullion-casing", material: "mullion", quantity: 4, length: 50.25, width: 2.75, edgeBevel: 22.5, ends: ["square", "square"] },
    ]);
    expect(all(pieces, "apron").map((p) => [p.quantity, p.length, p.ends])).toEqual([
      [2, 30.75, ["return", "bevel"]],
      [1, 54, ["bevel", "bevel"]],
    ]);
    expect(all(pieces, "extension-head").map((p) => [p.quantity, p.length])).toEqual([
      [2, 24],
      [1, 48],
    ]);
  });

  it("one-piece seat board: the wall-aligned rectangle round the stool outline (derived, checked against the plan of a symmetric bay)", () => {
    for (const turn of [30, 45]) {
      const seat = all(cutList(bay(turn, { seat: "one-piece" }), spec), "seat-board");
      const a = (turn * Math.PI) / 180;
      const [flanker, centre, back, front] = [24 + 5.25 + 3, 48 + 6, 1, 1];
      // Across: the centre, both flankers' runs along the wall and the back edge's overhang at the wall ends.
      const across = centre + 2 * flanker * Math.cos(a) + 2 * back * Math.sin(a);
      // Deep: from the front corner at a wall end to the back edge of the centre unit.
      const deep = flanker * Math.sin(a) + back + front * Math.cos(a);
      expect(seat).toEqual([{ part: "seat-board", material: "stool", quantity: 1, length: sixteenth(across), width: sixteenth(deep), ends: ["square", "square"] }]);
      expect(all(cutList(bay(turn, { seat: "one-piece" }), spec), "stool")).toEqual([]);
    }
  });

  it("picture-frame: heads and bottoms per unit, mullion casings H + 2r, no stool or apron", () => {
    const pieces = cutList(bay(45), { ...spec, style: "picture-frame" });
    expect(all(pieces, "casing-bottom")).toEqual(all(pieces, "casing-head").map((p) => ({ ...p, part: "casing-bottom" })));
    expect(all(pieces, "mullion-casing")[0]?.length).toBe(50.5);
    expect(pieces.some((p) => p.material === "stool" || p.material === "apron")).toBe(false);
  });
});
