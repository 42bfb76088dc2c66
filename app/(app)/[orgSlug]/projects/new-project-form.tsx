"use client";

import { useQueryClient } from "@tanstack/react-query";
import { useActionState, useEffect, useRef } from "react";
import { Button } from "@/components/ui/button";
import { Card, Notice } from "@/components/ui/card";
import { Field, TextInput } from "@/components/ui/field";
import { createProjectAction } from "./actions";

export function NewProjectForm({ orgSlug }: { orgSlug: string }) {
  const [state, formAction, pending] = useActionState(createProjectAction, null);
  const queryClient = useQueryClient();
  const formRef = useRef<HTMLFormElement>(null);
  const fields = state && !state.ok ? (state.fields ?? {}) : {};

  useEffect(() => {
    if (state?.ok) {
      formRef.current?.reset();
      void queryClient.invalidateQueries({ queryKey: ["projects", orgSlug] });
    }
  }, [state, orgSlug, queryClient]);

  return (
    <Card title="New project">
      <form ref={formRef} action={formAction} className="space-y-3" noValidate>
        <input type="hidden" name="orgSlug" value={orgSlug} />
        {state && !state.ok && <Notice tone="error">{state.error}</Notice>}
        {state?.ok && <Notice>Created “{state.data.name}”.</Notice>}
        <Field label="Project name" name="name" error={fields.name}>
          <TextInput name="name" maxLength={160} error={fields.name} />
        </Field>
        <Field label="General contractor" name="generalContractor" error={fields.generalContractor}>
          <TextInput name="generalContractor" maxLength={160} error={fields.generalContractor} />
        </Field>
        <Field label="Bid due" name="bidDue" error={fields.bidDue}>
          <TextInput name="bidDue" type="date" error={fields.bidDue} />
        </Field>
        <Button type="submit" disabled={pending}>
          {pending ? "Creating…" : "Create project"}
        </Button>
      </form>
    </Card>
  );
}
