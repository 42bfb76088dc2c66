"use client";

import { useMutation, useQueryClient } from "@tanstack/react-query";
import { useState, type FormEvent } from "react";
import { Button } from "@/components/ui/button";
import { DeleteRowButton } from "@/components/ui/delete-row-button";
import { SubmitButton } from "@/components/ui/form-error";
import { ClientError, request } from "@/lib/client/fetch";
import type { ProjectScope } from "@/lib/client/project-scope";
import { takeoffPath, takeoffsKey } from "@/lib/client/takeoffs";
import { useFormMutation } from "@/lib/client/use-form-mutation";
import type { TakeoffListItem } from "@/lib/takeoffs/view";

/**
 * Rename or delete a draft from the list (the takeoff routes allow both for drafts). A submitted
 * takeoff is the bid and is locked, so it offers neither and says why.
 */
export function TakeoffRowActions({ takeoff, scope }: { takeoff: TakeoffListItem; scope: ProjectScope }) {
  const queryClient = useQueryClient();
  const [renaming, setRenaming] = useState(false);
  const url = takeoffPath({ ...scope, takeoffId: takeoff.id });
  const done = () => queryClient.invalidateQueries({ queryKey: takeoffsKey(scope) });
  const rename = useFormMutation({
    mutationFn: (name: string) => request(url, { method: "PATCH", body: { name } }),
    onSuccess: async () => {
      await done();
      setRenaming(false);
    },
  });
  const remove = useMutation({ mutationFn: () => request(url, { method: "DELETE" }), onSuccess: done });
  const error = rename.mutation.error ?? remove.error;
  const message = error instanceof ClientError ? (error.fields.name ?? error.message) : error ? "Could not reach the server; nothing changed." : null;

  if (takeoff.status === "submitted") return <span className="text-xs text-graphite-600">Locked: the submitted bid</span>;
  function submit(e: FormEvent<HTMLFormElement>) {
    e.preventDefault();
    rename.submit(String(new FormData(e.currentTarget).get("name") ?? "").trim());
  }
  return (
    <div className="space-y-1">
      {renaming ? (
        <form onSubmit={submit} className="flex flex-wrap items-center gap-1.5">
          <input
            name="name"
            aria-label={`New name for ${takeoff.name}`}
            defaultValue={takeoff.name}
            maxLength={80}
            autoFocus
            onKeyDown={(e) => e.key === "Escape" && (setRenaming(false), rename.reset())}
            className="w-44 rounded-md border border-graphite-400 bg-white px-2 py-1 text-sm"
          />
          <SubmitButton pending={rename.pending} busy="Saving…" className="px-2 py-1 text-xs">
            Save
          </SubmitButton>
          <Button type="button" look="quiet" className="px-2 py-1 text-xs" onClick={() => (setRenaming(false), rename.reset())}>
            Cancel
          </Button>
        </form>
      ) : (
        <div className="flex items-center gap-1.5">
          <Button type="button" look="secondary" className="px-2 py-0.5 text-xs" onClick={() => setRenaming(true)} aria-label={`Rename ${takeoff.name}`}>
            Rename
          </Button>
          <DeleteRowButton
            what={`takeoff ${takeoff.name}`}
            question={`Delete the takeoff "${takeoff.name}"? Its cut lists, board order and bid go with it.`}
            busy={remove.isPending}
            onDelete={() => remove.mutate()}
          />
        </div>
      )}
      {message && (
        <p role="alert" className="text-xs font-medium text-alarm-700">
          ⚠ {message}
        </p>
      )}
    </div>
  );
}
