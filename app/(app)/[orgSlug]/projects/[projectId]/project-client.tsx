"use client";

import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import type { FormEvent } from "react";
import { Button } from "@/components/ui/button";
import { Card, Notice } from "@/components/ui/card";
import { Field, Select, TextInput } from "@/components/ui/field";
import { StatusBadge } from "@/components/ui/status-badge";
import { api, ApiError } from "@/lib/api-client";
import { formatDate } from "@/lib/format-date";
import type { ProjectView } from "@/lib/server/projects/projects";

type Patch = Partial<{ name: string; generalContractor: string; bidDue: string; status: string; archived: boolean }>;

export function ProjectDetail({ orgSlug, initial, canWrite }: { orgSlug: string; initial: ProjectView; canWrite: boolean }) {
  const url = `/api/orgs/${orgSlug}/projects/${initial.id}`;
  const queryClient = useQueryClient();
  const { data } = useQuery({
    queryKey: ["project", orgSlug, initial.id],
    queryFn: () => api<{ project: ProjectView }>(url),
    initialData: { project: initial },
  });
  const project = data.project;
  const save = useMutation({
    mutationFn: (patch: Patch) => api<{ project: ProjectView }>(url, { method: "PATCH", body: patch }),
    onSuccess: (result) => {
      queryClient.setQueryData(["project", orgSlug, initial.id], result);
      void queryClient.invalidateQueries({ queryKey: ["projects", orgSlug] });
    },
  });
  const fields = save.error instanceof ApiError ? save.error.fields : {};

  function submit(e: FormEvent<HTMLFormElement>) {
    e.preventDefault();
    save.mutate(Object.fromEntries(new FormData(e.currentTarget)) as Patch);
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
          <form onSubmit={submit} className="grid gap-4 sm:grid-cols-2" noValidate key={project.updatedAt.toString()}>
            {save.isError && (
              <div className="sm:col-span-2">
                <Notice tone="error">{save.error.message}</Notice>
              </div>
            )}
            {save.isSuccess && (
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
              <Button type="submit" disabled={save.isPending}>
                {save.isPending ? "Saving…" : "Save changes"}
              </Button>
              <Button type="button" look="secondary" disabled={save.isPending} onClick={() => save.mutate({ archived: !project.archivedAt })}>
                {project.archivedAt ? "Restore from archive" : "Archive project"}
              </Button>
            </div>
          </form>
        </Card>
      )}
    </div>
  );
}
