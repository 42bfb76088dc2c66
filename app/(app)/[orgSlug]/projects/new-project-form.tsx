"use client";

import { useQueryClient } from "@tanstack/react-query";
import { useRef, type FormEvent } from "react";
import { Card, Notice } from "@/components/ui/card";
import { Field, TextInput } from "@/components/ui/field";
import { FormError, SubmitButton } from "@/components/ui/form-error";
import { createProject, projectListKey } from "@/lib/client/projects";
import { useFormMutation } from "@/lib/client/use-form-mutation";

export function NewProjectForm({ orgSlug }: { orgSlug: string }) {
  const queryClient = useQueryClient();
  const formRef = useRef<HTMLFormElement>(null);
  const create = useFormMutation({
    mutationFn: (body: Record<string, string>) => createProject(orgSlug, body),
    onSuccess: () => {
      formRef.current?.reset();
      void queryClient.invalidateQueries({ queryKey: projectListKey(orgSlug) });
    },
  });
  const { errors: fields } = create;

  function submit(e: FormEvent<HTMLFormElement>) {
    e.preventDefault();
    // Sent as typed, empty fields included: the route's schema reads "" as "none" where a field is optional.
    create.submit(Object.fromEntries(new FormData(e.currentTarget)) as Record<string, string>);
  }

  return (
    <Card title="New project">
      <form ref={formRef} onSubmit={submit} className="space-y-3" noValidate>
        <FormError form={create} />
        {create.mutation.isSuccess && <Notice>Created “{create.mutation.data.name}”.</Notice>}
        <Field label="Project name" name="name" error={fields.name}>
          <TextInput name="name" maxLength={160} error={fields.name} />
        </Field>
        <Field label="General contractor" name="generalContractor" error={fields.generalContractor}>
          <TextInput name="generalContractor" maxLength={160} error={fields.generalContractor} />
        </Field>
        <Field label="Bid due" name="bidDue" error={fields.bidDue}>
          <TextInput name="bidDue" type="date" error={fields.bidDue} />
        </Field>
        <SubmitButton pending={create.pending} busy="Creating…">
          Create project
        </SubmitButton>
      </form>
    </Card>
  );
}
