"use client";

import Link from "next/link";
import { useQuery } from "@tanstack/react-query";
import { useState } from "react";
import { Card, Notice } from "@/components/ui/card";
import { StatusBadge } from "@/components/ui/status-badge";
import { projectsQuery } from "@/lib/client/projects";
import { formatDate } from "@/lib/format-date";
import { NewProjectForm } from "./new-project-form";

export function ProjectsView({ orgSlug, canWrite }: { orgSlug: string; canWrite: boolean }) {
  const [showArchived, setShowArchived] = useState(false);
  const query = useQuery(projectsQuery(orgSlug, showArchived));

  return (
    <div className="grid gap-6 lg:grid-cols-[1fr_20rem]">
      <Card
        title="Projects"
        actions={
          <label className="flex items-center gap-2 text-sm text-graphite-700">
            <input type="checkbox" checked={showArchived} onChange={(e) => setShowArchived(e.target.checked)} />
            Show archived
          </label>
        }
      >
        {query.isPending && <p className="text-sm text-graphite-600">Loading projects…</p>}
        {query.isError && <Notice tone="error">{query.error.message}</Notice>}
        {query.data && query.data.length === 0 && (
          <p className="text-sm text-graphite-600">No projects yet.{canWrite ? " Create the first one." : ""}</p>
        )}
        {query.data && query.data.length > 0 && (
          <div className="overflow-x-auto">
            <table className="w-full text-sm">
              <thead className="border-b border-maple-200 text-left text-graphite-600">
                <tr>
                  <th className="py-2 pr-3 font-medium">Project</th>
                  <th className="py-2 pr-3 font-medium">General contractor</th>
                  <th className="py-2 pr-3 text-right font-medium">Bid due</th>
                  <th className="py-2 font-medium">Status</th>
                </tr>
              </thead>
              <tbody>
                {query.data.map((p) => (
                  <tr key={p.id} className="border-b border-maple-100 last:border-0">
                    <td className="py-2 pr-3">
                      <Link href={`/${orgSlug}/projects/${p.id}`} className="font-medium text-spruce-700 underline-offset-2 hover:underline">
                        {p.name}
                      </Link>
                      {p.archivedAt && <span className="ml-2 text-xs text-graphite-600">(archived)</span>}
                    </td>
                    <td className="py-2 pr-3">{p.generalContractor ?? "—"}</td>
                    <td className="num py-2 pr-3">{p.bidDue ? formatDate(p.bidDue) : "—"}</td>
                    <td className="py-2">
                      <StatusBadge status={p.status} />
                    </td>
                  </tr>
                ))}
              </tbody>
            </table>
          </div>
        )}
      </Card>
      {canWrite && <NewProjectForm orgSlug={orgSlug} />}
    </div>
  );
}
