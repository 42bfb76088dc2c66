"use client";

import { useQuery, useQueryClient } from "@tanstack/react-query";
import type { FormEvent } from "react";
import { Button } from "@/components/ui/button";
import { Card, Notice } from "@/components/ui/card";
import { Field, Select, TextInput } from "@/components/ui/field";
import { FormError, SubmitButton } from "@/components/ui/form-error";
import { StatusBadge } from "@/components/ui/status-badge";
import { projectDetailsKey, projectListKey, projectQuery, updateProject, type ClientProject, type ProjectPatch } from "@/lib/client/projects";
import { useFormMutation } from "@/lib/client/use-form-mutation";
import { formatDate } from "@/lib/format-date";

export function ProjectDetail({ orgSlug, initial, canWrite }: { orgSlug: string; initial: ClientProject; canWrite: boolean }) {
  const scope = { orgSlug, projectId: initial.id };
  const queryClient = useQueryClient();
  const { data: project } = useQuery({ ...projectQuery(scope), initialData: initial });
  const save = useFormMutation({
    mutationFn: (patch: ProjectPatch) => updateProject(scope, patch),
    onSuccess: (saved) => {
      queryClient.setQueryData(projectDetailsKey(scope), saved);
      void queryClient.invalidateQueries({ queryKey: projectListKey(orgSlug) });
    },
  });
  const { errors: fields } = save;

  function submit(e: FormEvent<HTMLFormElement>) {
    e.preventDefault();
    save.submit(Object.fromEntries(new FormData(e.currentTarget)) as ProjectPatch);
  }

  return (
    <div className="space-y-6">
      <div>
        <h1 className="flex flex-wrap items-center gap-3 text-2xl font-bold">
          {project.name} <StatusBadge status={project.status} />
          {project.archivedAt && <span className="text-sm font-normal text-graphite-600">(archived)</span>}
        </h1>
      </div>
      {!canWrite ? (
        <Card title="Details">
          <dl className="grid grid-cols-[10rem_1fr] gap-y-2 text-sm">
            <dt className="text-graphite-600">General contractor</dt>
            <dd>{project.generalContractor ?? "—"}</dd>
            <dt className="text-graphite-600">Bid due</dt>
            <dd>{project.bidDue ? formatDate(project.bidDue) : "—"}</dd>
          </dl>
          <p className="mt-4 text-xs text-graphite-600">Your role can read this project; estimators and admins edit it.</p>
        </Card>
      ) : (
        <Card title="Details">
          <form onSubmit={submit} className="grid gap-4 sm:grid-cols-2" noValidate key={project.updatedAt.getTime()}>
            {save.formError && (
              <div className="sm:col-span-2">
                <FormError form={save} />
              </div>
            )}
            {save.mutation.isSuccess && (
              <div className="sm:col-span-2">
                <Notice>Saved.</Notice>
              </div>
            )}
            <Field label="Project name" name="name" error={fields.name}>
              <TextInput name="name" defaultValue={project.name} maxLength={160} error={fields.name} />
            </Field>
            <Field label="General contractor" name="generalContractor" error={fields.generalContractor}>
              <TextInput name="generalContractor" defaultValue={project.generalContractor ?? ""} maxLength={160} error={fields.generalContractor} />
            </Field>
            <Field label="Bid due" name="bidDue" error={fields.bidDue}>
              <TextInput name="bidDue" type="date" defaultValue={project.bidDue ?? ""} error={fields.bidDue} />
            </Field>
            {project.submittedTakeoff ? (
              <Field label="Status" name="status" error={fields.status} hint={`Bid submitted: ${project.submittedTakeoff.name}. Mark the award when it is known.`}>
                <Select name="status" defaultValue={project.status} error={fields.status}>
                  <option value="submitted">Submitted</option>
                  <option value="won">Won</option>
                  <option value="lost">Lost</option>
                </Select>
              </Field>
            ) : (
              // No select while nothing is submitted: the status follows from the takeoffs.
              <div className="space-y-1 text-sm">
                <p className="font-medium text-graphite-700">Status</p>
                <p>Draft</p>
                <p className="text-xs text-graphite-600">Becomes “Submitted” when a takeoff is submitted as the bid.</p>
                {fields.status && <p className="text-xs font-medium text-alarm-700" role="alert">⚠ {fields.status}</p>}
              </div>
            )}
            <div className="flex flex-wrap gap-3 sm:col-span-2">
              <SubmitButton pending={save.pending} busy="Saving…">
                Save changes
              </SubmitButton>
              <Button type="button" look="secondary" disabled={save.pending} onClick={() => save.submit({ archived: !project.archivedAt })}>
                {project.archivedAt ? "Restore from archive" : "Archive project"}
              </Button>
            </div>
          </form>
        </Card>
      )}
    </div>
  );
}
