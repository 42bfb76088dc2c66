"use client";

import { useMutation } from "@tanstack/react-query";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { Card, Notice } from "@/components/ui/card";
import type { UnitTypeView } from "@/lib/plans/api-types";
import { ClientError, request } from "@/lib/client/fetch";
import { UnitTypeForm } from "./unit-type-form";

/** The job's repeated layouts and how many of each it has. */
export function UnitTypesEditor({
  base,
  unitTypes,
  canWrite,
  onChanged,
}: {
  base: string;
  unitTypes: UnitTypeView[];
  canWrite: boolean;
  onChanged: () => void;
}) {
  const [editing, setEditing] = useState<string | null>(null);
  // Someone else saved first, or the name is taken meanwhile: reload the list so the next try starts from theirs.
  const reloadIfStale = (error: unknown): never => {
    if (error instanceof ClientError && (error.code === "stale" || error.code === "conflict")) onChanged();
    throw error;
  };
  const save = (path: string, method: "POST" | "PATCH", body: unknown) =>
    request(`${base}/unit-types${path}`, { method, body }).then(onChanged, reloadIfStale);
  const remove = useMutation({
    mutationFn: (u: UnitTypeView) => request<void>(`${base}/unit-types/${u.id}?version=${u.version}`, { method: "DELETE" }).catch(reloadIfStale),
    onSuccess: onChanged,
  });

  return (
    <Card title="Unit types">
      <p className="mb-3 text-xs text-graphite-700">
        A sheet given a unit type counts once per unit of that type. Sheets without one — corridors, lobbies, other common areas — count once.
      </p>
      {remove.isError && <Notice tone="error">{remove.error.message}</Notice>}
      {unitTypes.length === 0 && <p className="text-sm text-graphite-600">None yet: every sheet counts once.</p>}
      <ul className="divide-y divide-maple-100">
        {unitTypes.map((u) =>
          editing === u.id ? (
            <li key={u.id} className="space-y-2 py-2">
              <UnitTypeForm
                idPrefix={`unit-${u.id}`}
                initial={{ name: u.name, count: String(u.count) }}
                submitLabel="Save"
                onSubmit={(v) => save(`/${u.id}`, "PATCH", { ...v, version: u.version }).then(() => setEditing(null))}
                onCancel={() => setEditing(null)}
              />
              {/* Delete sits with the edit form: kept off the list, it is one deliberate step away. */}
              <Button
                look="danger"
                className="px-2 py-0.5 text-xs"
                disabled={remove.isPending}
                onClick={() => {
                  if (confirm(`Delete ${u.name}? Its sheets will count once, like common areas.`)) remove.mutate(u, { onSuccess: () => setEditing(null) });
                }}
              >
                Delete {u.name}
              </Button>
            </li>
          ) : (
            <li key={u.id} className="flex items-center gap-2 py-1.5 text-sm">
              <span className="min-w-0 flex-1 truncate font-medium" title={u.name}>
                {u.name}
              </span>
              <span className="num whitespace-nowrap text-graphite-700">
                × {u.count}
                <span className="sr-only"> units</span>
              </span>
              {canWrite && (
                <Button look="quiet" className="px-2 py-0.5 text-xs" onClick={() => setEditing(u.id)} aria-label={`Edit ${u.name}`}>
                  Edit
                </Button>
              )}
            </li>
          ),
        )}
      </ul>
      {canWrite && (
        <div className="mt-3 border-t border-maple-200 pt-3">
          <h3 className="mb-2 text-sm font-semibold">Add a unit type</h3>
          <UnitTypeForm idPrefix="unit-new" initial={{ name: "", count: "" }} submitLabel="Add" onSubmit={(v) => save("", "POST", v)} />
        </div>
      )}
    </Card>
  );
}
