"use client";

import { useQueryClient } from "@tanstack/react-query";
import { useState } from "react";
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
      const res = await fetch(`${pending.path}${sep}tags=${pending.tags}`, { method: "DELETE" });
      if (res.ok) {
        setPending(null);
        return;
      }
      const body = (await res.json().catch(() => ({}))) as { error?: string; removes?: { tags: number; openings: number } };
      setError(body.error ?? `Not deleted (${res.status}).`);
      // Someone tagged meanwhile: the question now shows what a delete would take, to confirm afresh.
      if (body.removes) setPending({ ...pending, ...body.removes });
    } catch {
      setError("Could not reach the server; nothing was deleted.");
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
