import { describe, expect, it } from "vitest";
import { cutList } from "../cut-list";
import type { Opening, TrimSpec } from "../types";

const spec: TrimSpec = { style: "stool-and-apron", casingWidth: 2.5, casingThickness: 0.75, reveal: 0.25 };

describe("opening kinds refuse bad input with a message naming the field", () => {
  it.each<[string, unknown, RegExp]>([
    ["fewer than two mulled units", { kind: "mulled", widths: [30], height: 40, setback: 0, mullGap: 4 }, /^widths: a mulled opening needs at least two units$/],
    ["a mull gap no wider than two reveals", { kind: "mulled", widths: [30, 30], height: 40, setback: 0, mullGap: 0.5 }, /^mullGap: mull gap must be more than twice the reveal \(1\/2"\)/],
    ["a door cased on three sides", { kind: "door", width: 30, height: 80, sides: 3 }, /^sides: sides must be 1 or 2$/],
    ["a door with no sides", { kind: "door", width: 30, height: 80 }, /^sides: sides must be 1 or 2$/],
    ["an unknown kind", { kind: "skylight", width: 30, height: 40, setback: 0 }, /^kind: kind must be one of "window", "mulled", "door", "round-top", "segment-top", "bay"$/],
    ["a round-top without a spring height", { kind: "round-top", width: 30, setback: 0 }, /^springHeight: /],
    ["a segment rising more than half its span", { kind: "segment-top", width: 30, springHeight: 40, rise: 16, setback: 0 }, /^rise: rise must be at most half the width$/],
    ["a bay of two units", { kind: "bay", widths: [24, 48], turn: 45, height: 50, setback: 1, mullGap: 6 }, /^widths: a bay or bow needs at least three units$/],
    ["a bay turning 90°", { kind: "bay", widths: [24, 48, 24], turn: 90, height: 50, setback: 1, mullGap: 6 }, /^turn: turn must be less than 90 degrees$/],
    ["a bay mull gap no wider than two reveals", { kind: "bay", widths: [24, 48, 24], turn: 45, height: 50, setback: 1, mullGap: 0.5 }, /^mullGap: /],
    ["a mulled unit width of zero", { kind: "mulled", widths: [30, 0], height: 40, setback: 0, mullGap: 4 }, /^widths\.1: unit width must be greater than 0$/],
  ])("%s", (_label, opening, message) => {
    expect(() => cutList(opening as Opening, spec)).toThrow(message);
  });

  it("an opening without a kind is the rectangular window, and kind \"window\" is the same", () => {
    const o = { width: 30, height: 40, setback: 1 };
    expect(cutList({ ...o, kind: "window" }, spec)).toEqual(cutList(o, spec));
  });

  it("the reuse of recent cut lists tells kinds and unit widths apart (regression: the key once held only width, height and setback)", () => {
    const a = cutList({ kind: "mulled", widths: [30, 30], height: 40, setback: 0, mullGap: 4 }, spec);
    const b = cutList({ kind: "mulled", widths: [30, 40], height: 40, setback: 0, mullGap: 4 }, spec);
    expect(b.find((p) => p.part === "casing-head")!.length).toBe(a.find((p) => p.part === "casing-head")!.length + 10);
    const door1 = cutList({ kind: "door", width: 30, height: 80, sides: 1 }, spec);
    const door2 = cutList({ kind: "door", width: 30, height: 80, sides: 2 }, spec);
    expect(door2[0]!.quantity).toBe(2 * door1[0]!.quantity);
    const segments = { ...spec, curvedCasing: "segments" as const, segmentBoardWidth: 5.5 };
    expect(() => cutList({ kind: "round-top", width: 30, springHeight: 40, setback: 0 }, { ...segments, segmentBoardWidth: 2 })).toThrow(/segmentBoardWidth/);
  });
});
