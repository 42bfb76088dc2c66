"use client";

import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { Button } from "@/components/ui/button";
import { Card, Notice } from "@/components/ui/card";
import { request } from "@/lib/client/fetch";
import { membersKey, membersPath, membersQuery } from "@/lib/client/members";
import { roleLabels } from "@/lib/permissions";
import type { Role } from "@/db/schema";
import { InviteForm } from "./invite-form";
import { PendingInvitations } from "./pending-invitations";

export function MembersView({ orgSlug, canManage, currentUserId }: { orgSlug: string; canManage: boolean; currentUserId: string }) {
  const queryClient = useQueryClient();
  const key = membersKey(orgSlug);
  const members = useQuery(membersQuery(orgSlug));
  const change = useMutation({
    mutationFn: ({ id, role }: { id: string; role: Role }) => request(`${membersPath(orgSlug)}/${id}`, { method: "PATCH", body: { role } }),
    onSettled: () => queryClient.invalidateQueries({ queryKey: key }),
  });
  const remove = useMutation({
    mutationFn: (id: string) => request(`${membersPath(orgSlug)}/${id}`, { method: "DELETE" }),
    onSettled: () => queryClient.invalidateQueries({ queryKey: key }),
  });
  const error = change.error ?? remove.error;

  return (
    <div className="grid gap-6 lg:grid-cols-[1fr_20rem]">
      <div className="space-y-6">
        <Card title="Members">
          {error && <Notice tone="error">{error.message}</Notice>}
          {members.isPending && <p className="text-sm text-graphite-600">Loading members…</p>}
          {members.isError && <Notice tone="error">{members.error.message}</Notice>}
          {members.data && (
            <table className="mt-2 w-full text-sm">
              <thead className="border-b border-maple-200 text-left text-graphite-600">
                <tr>
                  <th className="py-2 pr-3 font-medium">Name</th>
                  <th className="py-2 pr-3 font-medium">E-mail</th>
                  <th className="py-2 pr-3 font-medium">Role</th>
                  {canManage && <th className="py-2 font-medium"><span className="sr-only">Actions</span></th>}
                </tr>
              </thead>
              <tbody>
                {members.data.map((m) => (
                  <tr key={m.id} className="border-b border-maple-100 last:border-0">
                    <td className="py-2 pr-3 font-medium">
                      {m.name}
                      {m.userId === currentUserId && <span className="ml-1 text-xs text-graphite-600">(you)</span>}
                    </td>
                    <td className="py-2 pr-3">{m.email}</td>
                    <td className="py-2 pr-3">
                      {canManage ? (
                        <select
                          aria-label={`Role of ${m.name}`}
                          className="rounded-md border border-graphite-400 bg-white px-2 py-1"
                          value={m.role}
                          onChange={(e) => change.mutate({ id: m.id, role: e.target.value as Role })}
                        >
                          {(Object.keys(roleLabels) as Role[]).map((r) => (
                            <option key={r} value={r}>
                              {roleLabels[r]}
                            </option>
                          ))}
                        </select>
                      ) : (
                        roleLabels[m.role]
                      )}
                    </td>
                    {canManage && (
                      <td className="py-2 text-right">
                        <Button
                          look="danger"
                          className="px-2 py-1 text-xs"
                          onClick={() => {
                            if (confirm(`Remove ${m.name} from this organisation?`)) remove.mutate(m.id);
                          }}
                        >
                          Remove
                        </Button>
                      </td>
                    )}
                  </tr>
                ))}
              </tbody>
            </table>
          )}
        </Card>
        {canManage && <PendingInvitations orgSlug={orgSlug} />}
      </div>
      {canManage ? (
        <InviteForm orgSlug={orgSlug} />
      ) : (
        <Card title="Your access">
          <p className="text-sm text-graphite-700">Only admins invite people and change roles.</p>
        </Card>
      )}
    </div>
  );
}
