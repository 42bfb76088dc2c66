"use client";

import { useQueryClient } from "@tanstack/react-query";
import type { FormEvent } from "react";
import { Card, Notice } from "@/components/ui/card";
import { Field, Select, TextInput } from "@/components/ui/field";
import { FormError, SubmitButton } from "@/components/ui/form-error";
import { invitationsKey, sendInvitation } from "@/lib/client/invitations";
import { useFormMutation } from "@/lib/client/use-form-mutation";
import { roleLabels } from "@/lib/permissions";

export function InviteForm({ orgSlug }: { orgSlug: string }) {
  const queryClient = useQueryClient();
  const invite = useFormMutation({
    mutationFn: (body: { email: string; role: string }) => sendInvitation(orgSlug, body),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: invitationsKey(orgSlug) }),
  });
  const fields = invite.errors;
  const sent = invite.mutation.data;

  function submit(e: FormEvent<HTMLFormElement>) {
    e.preventDefault();
    const form = e.currentTarget;
    const data = Object.fromEntries(new FormData(form)) as { email: string; role: string };
    // Only the address is cleared: the next person invited is often given the same role.
    invite.submit(data, { onSuccess: () => ((form.elements.namedItem("email") as HTMLInputElement).value = "") });
  }

  return (
    <Card title="Invite someone">
      <form onSubmit={submit} className="space-y-3" noValidate>
        <FormError form={invite} />
        {invite.mutation.isSuccess && sent && (
          <Notice>
            Invitation sent to {sent.invitation.email}.
            {sent.replaced.length > 0 &&
              ` It replaces the earlier invitation (as ${sent.replaced.map((r) => roleLabels[r.role].toLowerCase()).join(", ")}), whose link no longer works.`}
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
        <SubmitButton pending={invite.pending} busy="Sending…">
          Send invitation
        </SubmitButton>
      </form>
    </Card>
  );
}
