"use client";

import { useQueryClient } from "@tanstack/react-query";
import { useState } from "react";
import { ClientError, refusal, request } from "@/lib/client/fetch";
import { projectKey } from "@/lib/client/project-scope";

/** What the person is asked about: the thing, how to delete it, and what goes with it. */
export interface RemovalRequest {
  title: string;
  confirmLabel: string;
  /** The DELETE address without the `tags` confirmation. */
  path: string;
  tags: number;
  openings: number;
}

/**
 * One pending delete on the plans page at a time: ask, then DELETE with `tags=N` (the count shown), so
 * the server refuses if the drawings changed meanwhile; on success the sheets and counts are re-read.
 */
export function useRemoval(orgSlug: string, projectId: string) {
  const queryClient = useQueryClient();
  const [pending, setPending] = useState<RemovalRequest | null>(null);
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<string | null>(null);

  const refresh = () => {
    // Sheets, counts, tags and plan sets all sit under the project's key prefix.
    void queryClient.invalidateQueries({ queryKey: projectKey({ orgSlug, projectId }) });
  };

  async function confirm() {
    if (!pending) return;
    setBusy(true);
    setError(null);
    try {
      const sep = pending.path.includes("?") ? "&" : "?";
      await request<void>(`${pending.path}${sep}tags=${pending.tags}`, { method: "DELETE" });
      setPending(null);
    } catch (failure) {
      if (!(failure instanceof ClientError)) {
        setError("Could not reach the server; nothing was deleted.");
        return;
      }
      setError(failure.message);
      // Someone tagged meanwhile: the question now shows what a delete would take, to confirm afresh.
      const changed = refusal(failure, "confirm_removal");
      if (changed) setPending({ ...pending, ...changed.removes });
    } finally {
      setBusy(false);
      refresh();
    }
  }

  return {
    pending,
    busy,
    error,
    ask: (r: RemovalRequest) => {
      setError(null);
      setPending(r);
    },
    cancel: () => setPending(null),
    confirm,
  };
}
