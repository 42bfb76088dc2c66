/**
 * Undo/redo history of tag edits. Pure and immutable: the viewer keeps one in state and sends the inverse
 * request itself. Entries name tags by id; re-creating a deleted tag gives it a new id, so `remapId` rewrites
 * every entry that named the old one, and later undos still reach the right tag.
 */

export interface TagFields {
  openingTypeId: string;
  x: number;
  y: number;
  measuredWidth: number | null;
}

export type TagPatch = Partial<TagFields>;

export type UndoEntry =
  | { kind: "place"; tagId: string; tag: TagFields }
  | { kind: "delete"; tagId: string; tag: TagFields }
  | { kind: "update"; tagId: string; before: TagPatch; after: TagPatch };

export interface UndoStack {
  past: UndoEntry[];
  future: UndoEntry[];
}

/** Enough for a long tagging session; the oldest edits fall off. */
export const UNDO_LIMIT = 200;

export const emptyStack = (): UndoStack => ({ past: [], future: [] });

/** A new edit clears the redo side, as in every editor. */
export function record(stack: UndoStack, entry: UndoEntry, limit = UNDO_LIMIT): UndoStack {
  return { past: [...stack.past, entry].slice(-limit), future: [] };
}

export function takeUndo(stack: UndoStack): { entry: UndoEntry; stack: UndoStack } | null {
  const entry = stack.past.at(-1);
  if (!entry) return null;
  return { entry, stack: { past: stack.past.slice(0, -1), future: [...stack.future, entry] } };
}

export function takeRedo(stack: UndoStack): { entry: UndoEntry; stack: UndoStack } | null {
  const entry = stack.future.at(-1);
  if (!entry) return null;
  return { entry, stack: { past: [...stack.past, entry], future: stack.future.slice(0, -1) } };
}

export function remapId(stack: UndoStack, from: string, to: string): UndoStack {
  const fix = (e: UndoEntry): UndoEntry => (e.tagId === from ? { ...e, tagId: to } : e);
  return { past: stack.past.map(fix), future: stack.future.map(fix) };
}

/** Drops every entry about a tag that no longer exists (someone else deleted it), so undo cannot fail on it. */
export function forgetTag(stack: UndoStack, tagId: string): UndoStack {
  const keep = (e: UndoEntry) => e.tagId !== tagId;
  return { past: stack.past.filter(keep), future: stack.future.filter(keep) };
}

/** What undoing an entry must do to the server; redo does the entry itself. */
export type TagRequest =
  | { kind: "create"; tag: TagFields; replacesId: string }
  | { kind: "delete"; tagId: string }
  | { kind: "update"; tagId: string; patch: TagPatch };

export function inverseOf(entry: UndoEntry): TagRequest {
  switch (entry.kind) {
    case "place":
      return { kind: "delete", tagId: entry.tagId };
    case "delete":
      return { kind: "create", tag: entry.tag, replacesId: entry.tagId };
    case "update":
      return { kind: "update", tagId: entry.tagId, patch: entry.before };
  }
}

export function redoOf(entry: UndoEntry): TagRequest {
  switch (entry.kind) {
    case "place":
      return { kind: "create", tag: entry.tag, replacesId: entry.tagId };
    case "delete":
      return { kind: "delete", tagId: entry.tagId };
    case "update":
      return { kind: "update", tagId: entry.tagId, patch: entry.after };
  }
}

export function describe(entry: UndoEntry): string {
  if (entry.kind === "place") return "place tag";
  if (entry.kind === "delete") return "delete tag";
  if (entry.after.openingTypeId !== undefined) return "retype tag";
  if (entry.after.measuredWidth !== undefined) return "measured width";
  return "move tag";
}
