"use client";

import { useCallback, useRef, useState } from "react";
import type { TagView } from "@/lib/plans/api-types";
import {
  describe,
  emptyStack,
  forgetTag,
  inverseOf,
  record,
  redoOf,
  remapId,
  takeRedo,
  takeUndo,
  type TagFields,
  type TagPatch,
  type TagRequest,
  type UndoEntry,
  type UndoStack,
} from "@/lib/plans/viewer/undo-stack";
import type { Notify, TagMutations } from "./use-tag-mutations";

const fieldsOf = (t: TagView): TagFields => ({ openingTypeId: t.openingTypeId, x: t.x, y: t.y, measuredWidth: t.measuredWidth });

/** Tag edits that can be undone: each records its entry once the server has accepted it. */
export function useUndoableTagEdits(m: TagMutations, notify: Notify) {
  const [stack, setStackState] = useState<UndoStack>(emptyStack);
  const ref = useRef(stack);
  const setStack = useCallback((fn: (s: UndoStack) => UndoStack) => {
    ref.current = fn(ref.current);
    setStackState(ref.current);
  }, []);
  const push = useCallback((e: UndoEntry) => setStack((s) => record(s, e)), [setStack]);

  const place = useCallback(
    async (fields: TagFields) => {
      const tag = await m.create(fields);
      if (tag) push({ kind: "place", tagId: tag.id, tag: fieldsOf(tag) });
      return tag;
    },
    [m, push],
  );

  const change = useCallback(
    async (id: string, after: TagPatch) => {
      const cur = m.getTag(id);
      if (!cur) return null;
      const before: TagPatch = {};
      for (const k of Object.keys(after) as (keyof TagFields)[]) Object.assign(before, { [k]: cur[k] });
      const tag = await m.update(id, after);
      if (tag) push({ kind: "update", tagId: id, before, after });
      return tag;
    },
    [m, push],
  );

  const remove = useCallback(
    async (id: string) => {
      const cur = m.getTag(id);
      if (!cur) return false;
      const ok = await m.remove(id);
      if (ok) push({ kind: "delete", tagId: id, tag: fieldsOf(cur) });
      return ok;
    },
    [m, push],
  );

  const run = useCallback(
    async (req: TagRequest): Promise<boolean> => {
      if (req.kind === "create") {
        const tag = await m.create(req.tag);
        if (tag) setStack((s) => remapId(s, req.replacesId, tag.id));
        return tag !== null;
      }
      if (req.kind === "delete") return m.remove(req.tagId);
      return (await m.update(req.tagId, req.patch)) !== null;
    },
    [m, setStack],
  );

  const step = useCallback(
    async (dir: "undo" | "redo") => {
      const taken = dir === "undo" ? takeUndo(ref.current) : takeRedo(ref.current);
      if (!taken) return;
      setStack(() => taken.stack);
      const ok = await run(dir === "undo" ? inverseOf(taken.entry) : redoOf(taken.entry));
      if (ok) notify("info", `${dir === "undo" ? "Undone" : "Redone"}: ${describe(taken.entry)}.`);
      // The tag changed under us (someone else's edit): its history no longer applies.
      else setStack((s) => forgetTag(s, taken.entry.tagId));
    },
    [run, setStack, notify],
  );

  return {
    place,
    change,
    remove,
    undo: useCallback(() => step("undo"), [step]),
    redo: useCallback(() => step("redo"), [step]),
    /** Someone else deleted the tag: its history no longer applies. */
    forget: useCallback((tagId: string) => setStack((s) => forgetTag(s, tagId)), [setStack]),
    canUndo: stack.past.length > 0,
    canRedo: stack.future.length > 0,
  };
}

export type TagEdits = ReturnType<typeof useUndoableTagEdits>;
