"use client";

import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { Button } from "@/components/ui/button";
import { Card, Notice } from "@/components/ui/card";
import { request } from "@/lib/client/fetch";
import { invitationsKey, invitationsPath, invitationsQuery } from "@/lib/client/invitations";
import { roleLabels } from "@/lib/permissions";

export function PendingInvitations({ orgSlug }: { orgSlug: string }) {
  const queryClient = useQueryClient();
  const key = invitationsKey(orgSlug);
  const pending = useQuery(invitationsQuery(orgSlug));
  const withdraw = useMutation({
    mutationFn: (id: string) => request(`${invitationsPath(orgSlug)}/${id}`, { method: "DELETE" }),
    onSettled: () => queryClient.invalidateQueries({ queryKey: key }),
  });

  if (!pending.data || pending.data.length === 0) return null;
  return (
    <Card title="Pending invitations">
      {withdraw.isError && <Notice tone="error">{withdraw.error.message}</Notice>}
      <ul className="divide-y divide-maple-100 text-sm">
        {pending.data.map((i) => (
          <li key={i.id} className="flex flex-wrap items-center justify-between gap-2 py-2">
            <span>
              {i.email} · {roleLabels[i.role]}
              <span className="ml-2 text-xs text-graphite-600">expires {new Date(i.expiresAt).toLocaleDateString("en-US")}</span>
            </span>
            <Button look="quiet" className="px-2 py-1 text-xs" onClick={() => withdraw.mutate(i.id)}>
              Withdraw
            </Button>
          </li>
        ))}
      </ul>
    </Card>
  );
}
