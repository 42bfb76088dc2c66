import { describe, expect, it } from "vitest";
import { emptyStack, forgetTag, inverseOf, record, redoOf, remapId, takeRedo, takeUndo, type UndoEntry } from "./undo-stack";

const tag = { openingTypeId: "w1", x: 10, y: 20, measuredWidth: null };
const place: UndoEntry = { kind: "place", tagId: "a", tag };
const move: UndoEntry = { kind: "update", tagId: "a", before: { x: 10, y: 20 }, after: { x: 30, y: 40 } };

describe("undo stack", () => {
  it("undoes and redoes in order, and a new edit clears redo", () => {
    let s = record(record(emptyStack(), place), move);
    const u = takeUndo(s)!;
    expect(u.entry).toBe(move);
    s = u.stack;
    expect(takeRedo(s)!.entry).toBe(move);
    s = record(s, { kind: "delete", tagId: "a", tag });
    expect(s.future).toEqual([]);
    expect(takeRedo(s)).toBeNull();
    expect(takeUndo(emptyStack())).toBeNull();
  });

  it("sends the inverse: delete for a placement, create for a deletion, the old fields for an update", () => {
    expect(inverseOf(place)).toEqual({ kind: "delete", tagId: "a" });
    expect(inverseOf({ kind: "delete", tagId: "a", tag })).toEqual({ kind: "create", tag, replacesId: "a" });
    expect(inverseOf(move)).toEqual({ kind: "update", tagId: "a", patch: { x: 10, y: 20 } });
    expect(redoOf(move)).toEqual({ kind: "update", tagId: "a", patch: { x: 30, y: 40 } });
    expect(redoOf(place)).toEqual({ kind: "create", tag, replacesId: "a" });
  });

  it("follows a re-created tag to its new id on both sides", () => {
    const s = remapId({ past: [place], future: [move] }, "a", "b");
    expect(s.past[0]!.tagId).toBe("b");
    expect(s.future[0]!.tagId).toBe("b");
  });

  it("forgets a tag someone else deleted and keeps the rest", () => {
    const other: UndoEntry = { kind: "place", tagId: "z", tag };
    const s = forgetTag({ past: [place, other], future: [move] }, "a");
    expect(s).toEqual({ past: [other], future: [] });
  });

  it("keeps at most the limit, dropping the oldest", () => {
    let s = emptyStack();
    for (let i = 0; i < 5; i++) s = record(s, { ...place, tagId: String(i) }, 3);
    expect(s.past.map((e) => e.tagId)).toEqual(["2", "3", "4"]);
  });
});
