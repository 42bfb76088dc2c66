"use client";

import { useMutation, useQueryClient } from "@tanstack/react-query";
import type { FormEvent } from "react";
import { Button } from "@/components/ui/button";
import { Card, Notice } from "@/components/ui/card";
import { Field, Select, TextInput } from "@/components/ui/field";
import { api, ApiError } from "@/lib/api-client";
import type { Role } from "@/db/schema";
import { roleLabels } from "@/lib/permissions";

export function InviteForm({ orgSlug }: { orgSlug: string }) {
  const queryClient = useQueryClient();
  const invite = useMutation({
    mutationFn: (body: { email: string; role: string }) =>
      api<{ invitation: { email: string; role: Role }; replaced: { role: Role }[] }>(`/api/orgs/${orgSlug}/invitations`, { method: "POST", body }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: ["invitations", orgSlug] }),
  });
  const fields = invite.error instanceof ApiError ? invite.error.fields : {};

  function submit(e: FormEvent<HTMLFormElement>) {
    e.preventDefault();
    const form = e.currentTarget;
    const data = Object.fromEntries(new FormData(form)) as { email: string; role: string };
    // Only the address is cleared: the next person invited is often given the same role.
    invite.mutate(data, { onSuccess: () => ((form.elements.namedItem("email") as HTMLInputElement).value = "") });
  }

  return (
    <Card title="Invite someone">
      <form onSubmit={submit} className="space-y-3" noValidate>
        {invite.isError && <Notice tone="error">{invite.error.message}</Notice>}
        {invite.isSuccess && (
          <Notice>
            Invitation sent to {invite.data.invitation.email}.
            {invite.data.replaced.length > 0 &&
              ` It replaces the earlier invitation (as ${invite.data.replaced.map((r) => roleLabels[r.role].toLowerCase()).join(", ")}), whose link no longer works.`}
          </Notice>
        )}
        <Field label="E-mail" name="email" error={fields.email}>
          <TextInput name="email" type="email" error={fields.email} />
        </Field>
        <Field label="Role" name="role" error={fields.role}>
          <Select name="role" defaultValue="estimator">
            <option value="estimator">Estimator — plans, tags, takeoffs</option>
            <option value="project_manager">Project manager — reads, compares, submits</option>
            <option value="admin">Admin — members and price books</option>
          </Select>
        </Field>
        <Button type="submit" disabled={invite.isPending}>
          {invite.isPending ? "Sending…" : "Send invitation"}
        </Button>
      </form>
    </Card>
  );
}
