import { describe, expect, it } from "vitest";
import { DRESSED_LUMBER, GYPSUM_BOARD_THICKNESS } from "./nominal-sizes";
import { wallSetback } from "./wall-build-up";

describe("nominal sizes", () => {
  it("PS 20 (American Softwood Lumber Standard): 2x4 dressed = 1 1/2 x 3 1/2 in, 2x6 = 1 1/2 x 5 1/2, 1x boards 3/4 thick", () => {
    expect(DRESSED_LUMBER["2x4"]).toEqual({ thickness: 1.5, width: 3.5 });
    expect(DRESSED_LUMBER["2x6"]).toEqual({ thickness: 1.5, width: 5.5 });
    expect(DRESSED_LUMBER["1x6"]).toEqual({ thickness: 0.75, width: 5.5 });
  });

  it("ASTM C1396: gypsum board 1/2 in and 5/8 in", () => {
    expect(GYPSUM_BOARD_THICKNESS["1/2"]).toBe(0.5);
    expect(GYPSUM_BOARD_THICKNESS["5/8"]).toBe(0.625);
  });
});

describe("wallSetback", () => {
  it("2x4 stud (3 1/2, PS 20) + 1/2 board (ASTM C1396) + 7/16 sheathing − 3 1/4 frame = 1 3/16", () => {
    expect(wallSetback({ stud: "2x4", wallboard: "1/2", sheathing: 7 / 16, frameDepth: 3.25 })).toBe(1.1875);
  });

  it("2x6 stud (5 1/2, PS 20) + two layers of 5/8 board (ASTM C1396) − 4 9/16 frame = 2 3/16", () => {
    expect(wallSetback({ stud: "2x6", wallboard: "5/8", wallboardLayers: 2, frameDepth: 4.5625 })).toBe(2.1875);
  });

  it("is zero when the frame is flush with the wall face and throws when it is deeper", () => {
    expect(wallSetback({ stud: "2x4", wallboard: "1/2", frameDepth: 4 })).toBe(0);
    expect(() => wallSetback({ stud: "2x4", wallboard: "1/2", frameDepth: 4.5 })).toThrow(/frameDepth/);
  });

  it("rejects unknown sizes by field", () => {
    expect(() => wallSetback({ stud: "2x5" as never, wallboard: "1/2", frameDepth: 3 })).toThrow(/stud/);
    expect(() => wallSetback({ stud: "2x4", wallboard: "3/4" as never, frameDepth: 3 })).toThrow(/wallboard/);
  });
});
