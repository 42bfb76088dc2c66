import { describe, expect, it } from "vitest";
import { EMPTY_DRAFT, planCreate, readWall, type OpeningDraft } from "./new-opening";

const draft = (over: Partial<OpeningDraft>): OpeningDraft => ({ ...EMPTY_DRAFT, mark: "W1", width: "35 1/2", height: `4'-11 1/2"`, ...over });

describe("readWall", () => {
  it("works the setback out with the engine: 2x6 + 1/2 board − 3 1/4 frame = 2 3/4", () => {
    const r = readWall({ stud: "2x6", wallboard: "1/2", layers: "1", sheathing: "", frameDepth: "3 1/4" });
    expect(r).toEqual({ ok: true, setback: 2.75, wall: { stud: "2x6", wallboard: "1/2", wallboardLayers: 1, frameDepth: 3.25 } });
  });

  it("counts sheathing and every layer of board", () => {
    const r = readWall({ stud: "2x4", wallboard: "5/8", layers: "2", sheathing: "7/16", frameDepth: "4 9/16" });
    expect(r.ok && r.setback).toBe(0.4375 + 3.5 + 1.25 - 4.5625);
  });

  it.each([
    [{ frameDepth: "" }, "wallBuildUp.frameDepth", `Frame depth: write a length such as 35 1/2, 2'-11 1/2" or 902 mm.`],
    [{ frameDepth: "9" }, "wallBuildUp.frameDepth", "frame depth is greater than the wall depth"],
    [{ layers: "1.5", frameDepth: "3" }, "wallBuildUp.wallboardLayers", "Layers must be a whole number from 1 to 4."],
    [{ sheathing: "thick", frameDepth: "3" }, "wallBuildUp.sheathing", `Sheathing: write a length such as 35 1/2, 2'-11 1/2" or 902 mm.`],
  ])("refuses %j", (over, key, message) => {
    const r = readWall({ ...EMPTY_DRAFT.wall, ...over });
    expect(r).toEqual({ ok: false, fields: { [key]: message } });
  });
});

describe("planCreate", () => {
  it("sends lengths as inches and leaves blank trim fields to the organisation's defaults", () => {
    expect(planCreate(draft({ setback: "4 9/16", notes: "" }))).toEqual({
      kind: "send",
      body: { mark: "W1", width: 35.5, height: 59.5, setback: 4.5625, notes: null },
    });
  });

  it("sends the wall build-up instead of a setback when derived", () => {
    const r = planCreate(draft({ setbackFrom: "wall", setback: "ignored", wall: { ...EMPTY_DRAFT.wall, frameDepth: "3 1/4" } }));
    expect(r).toEqual({
      kind: "send",
      body: { mark: "W1", width: 35.5, height: 59.5, wallBuildUp: { stud: "2x6", wallboard: "1/2", wallboardLayers: 1, frameDepth: 3.25 }, notes: null },
    });
  });

  it("sends the trim fields that were typed", () => {
    const r = planCreate(draft({ setback: "0", style: "picture-frame", casingWidth: "3 1/4", casingThickness: "3/4", reveal: "3/16", apronReturns: "no" }));
    expect(r.kind === "send" && r.body.trimSpec).toEqual({ style: "picture-frame", casingWidth: 3.25, casingThickness: 0.75, reveal: 0.1875, apronReturns: false });
  });

  it("collects every problem at once, keyed like the API's field errors", () => {
    const r = planCreate(draft({ mark: "", width: "wide", setbackFrom: "wall", casingWidth: "1/8", reveal: "1/4" }));
    expect(r).toEqual({
      kind: "invalid",
      fields: {
        "trimSpec.reveal": "reveal must be less than the casing width",
        "wallBuildUp.frameDepth": `Frame depth: write a length such as 35 1/2, 2'-11 1/2" or 902 mm.`,
        mark: "Mark is required.",
        width: `Width: write a length such as 35 1/2, 2'-11 1/2" or 902 mm.`,
      },
    });
  });

  it("asks for a setback when typed and left empty", () => {
    const r = planCreate(draft({ setback: "" }));
    expect(r.kind === "invalid" && Object.keys(r.fields)).toEqual(["setback"]);
  });
});
