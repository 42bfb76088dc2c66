"use client";

import { useCallback, useMemo, useRef } from "react";
import { useQueryClient } from "@tanstack/react-query";
import { refusal, request, ClientError } from "@/lib/client/fetch";
import type { TagView } from "@/lib/plans/api-types";
import type { TagFields, TagPatch } from "@/lib/plans/viewer/undo-stack";
import { keys, projectBase, type SheetScope, type ViewerTag } from "./use-sheet-data";

export type Notify = (tone: "info" | "error", text: string) => void;

/**
 * Per-tag requests against the API, drawn on screen before the server answers. Requests for one tag run one
 * after another, each reading the tag's latest version when it is sent: two quick moves of the same tag must
 * not refuse each other. A refusal puts the server's copy on screen (see `refused`).
 */
export function useTagMutations(scope: SheetScope, notify: Notify, onGone: (tagId: string) => void) {
  const qc = useQueryClient();
  const tagsKey = keys.tags(scope);
  const base = projectBase(scope);
  const queues = useRef(new Map<string, Promise<unknown>>());
  const seq = useRef(0);

  const setTags = useCallback((fn: (tags: ViewerTag[]) => ViewerTag[]) => qc.setQueryData<ViewerTag[]>(tagsKey, (old) => fn(old ?? [])), [qc, tagsKey]);
  const getTag = useCallback((id: string) => qc.getQueryData<ViewerTag[]>(tagsKey)?.find((t) => t.id === id), [qc, tagsKey]);
  const replace = useCallback((id: string, tag: ViewerTag | null) => setTags((ts) => (tag ? ts.map((t) => (t.id === id ? tag : t)) : ts.filter((t) => t.id !== id))), [setTags]);

  const serial = useCallback(<T,>(id: string, run: () => Promise<T>): Promise<T> => {
    const next = (queues.current.get(id) ?? Promise.resolve()).catch(() => undefined).then(run);
    queues.current.set(id, next);
    return next;
  }, []);

  const afterChange = useCallback(() => {
    void qc.invalidateQueries({ queryKey: keys.counts(scope) });
    void qc.invalidateQueries({ queryKey: keys.sheets(scope) });
  }, [qc, scope]);

  /** `stale` carries the tag as it is now (or null); this API answers `not_found` once it is gone. Either way: show theirs. */
  const refused = useCallback(
    (id: string, error: unknown, previous: ViewerTag | undefined) => {
      const stale = refusal(error, "stale");
      if (error instanceof ClientError && (stale || error.code === "not_found")) {
        const current = (stale?.current as TagView | null | undefined) ?? null;
        replace(id, current);
        if (!current) onGone(id);
        notify("error", current ? error.message : "Someone else deleted this tag; it is gone from the sheet.");
        void qc.invalidateQueries({ queryKey: tagsKey });
        afterChange();
        return;
      }
      if (previous) setTags((ts) => (ts.some((t) => t.id === id) ? ts.map((t) => (t.id === id ? previous : t)) : [...ts, previous]));
      notify("error", error instanceof Error ? error.message : "The change was not saved.");
    },
    [replace, onGone, notify, qc, tagsKey, afterChange, setTags],
  );

  const create = useCallback(
    async (fields: TagFields): Promise<TagView | null> => {
      const tempId = `pending-${++seq.current}`;
      await qc.cancelQueries({ queryKey: tagsKey });
      setTags((ts) => [...ts, { id: tempId, sheetId: scope.sheetId, ...fields, widthMismatch: false, version: 0, pending: true }]);
      try {
        const { tag } = await request<{ tag: TagView }>(`${base}/tags`, { method: "POST", body: { sheetId: scope.sheetId, ...fields } });
        replace(tempId, tag);
        return tag;
      } catch (error) {
        replace(tempId, null);
        notify("error", error instanceof Error ? `Tag not placed: ${error.message}` : "Tag not placed.");
        return null;
      } finally {
        afterChange();
      }
    },
    [qc, tagsKey, setTags, scope.sheetId, base, replace, notify, afterChange],
  );

  const update = useCallback(
    (id: string, patch: TagPatch): Promise<TagView | null> =>
      serial(id, async () => {
        const before = getTag(id);
        if (!before || before.pending) return null;
        await qc.cancelQueries({ queryKey: tagsKey });
        replace(id, { ...before, ...patch });
        try {
          const { tag } = await request<{ tag: TagView }>(`${base}/tags/${id}`, { method: "PATCH", body: { version: before.version, ...patch } });
          replace(id, tag);
          return tag;
        } catch (error) {
          refused(id, error, before);
          return null;
        } finally {
          afterChange();
        }
      }),
    [serial, getTag, qc, tagsKey, replace, base, refused, afterChange],
  );

  const remove = useCallback(
    (id: string): Promise<boolean> =>
      serial(id, async () => {
        const before = getTag(id);
        if (!before || before.pending) return false;
        await qc.cancelQueries({ queryKey: tagsKey });
        replace(id, null);
        try {
          await request<void>(`${base}/tags/${id}?version=${before.version}`, { method: "DELETE" });
          return true;
        } catch (error) {
          refused(id, error, before);
          return false;
        } finally {
          afterChange();
        }
      }),
    [serial, getTag, qc, tagsKey, replace, base, refused, afterChange],
  );

  return useMemo(() => ({ create, update, remove, getTag }), [create, update, remove, getTag]);
}

export type TagMutations = ReturnType<typeof useTagMutations>;
