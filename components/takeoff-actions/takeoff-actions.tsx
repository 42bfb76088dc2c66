"use client";

import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { useRouter } from "next/navigation";
import { Button } from "@/components/ui/button";
import { Card, Notice } from "@/components/ui/card";
import { LockMark } from "@/components/ui/lock-mark";
import { request } from "@/lib/client/fetch";
import { sendsKey, sendsQuery } from "@/lib/client/sends";
import { takeoffKey, takeoffPath } from "@/lib/client/takeoffs";
import { SendBidForm } from "./send-bid-form";

interface Props {
  orgSlug: string;
  projectId: string;
  takeoffId: string;
  status: "draft" | "submitted";
  canSubmit: boolean;
  canRun: boolean;
}

/** What can be done with a saved takeoff: documents out, marking it as the bid (which locks it), sending, copying. */
export function TakeoffActions({ orgSlug, projectId, takeoffId, status, canSubmit, canRun }: Props) {
  const scope = { orgSlug, projectId, takeoffId };
  const base = takeoffPath(scope);
  const router = useRouter();
  const queryClient = useQueryClient();
  const sends = useQuery(sendsQuery(scope));
  const submit = useMutation({
    mutationFn: () => request(`${base}/submit`, { method: "POST" }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: takeoffKey(scope) }),
  });
  const copy = useMutation({
    mutationFn: () => request<{ takeoff: { id: string } }>(`${base}/copy`, { method: "POST" }),
    onSuccess: ({ takeoff }) => router.push(`/${orgSlug}/projects/${projectId}/takeoffs/${takeoff.id}`),
  });
  const error = submit.error ?? copy.error;

  return (
    <Card title="Bid documents" actions={status === "submitted" ? <span className="text-sm font-semibold text-brass-700"><LockMark /> Submitted bid — locked</span> : null}>
      <div className="space-y-4 print:hidden">
        {error && <Notice tone="error">{error.message}</Notice>}
        <div className="flex flex-wrap gap-2">
          <a className="rounded-md border border-graphite-400 bg-white px-3 py-2 text-sm font-semibold hover:bg-maple-100" href={`${base}/order-csv`} download>
            Material order (CSV)
          </a>
          <a className="rounded-md border border-graphite-400 bg-white px-3 py-2 text-sm font-semibold hover:bg-maple-100" href={`${base}/bid-pdf`} download>
            Bid summary (PDF)
          </a>
          <a className="rounded-md border border-graphite-400 bg-white px-3 py-2 text-sm font-semibold hover:bg-maple-100" href={`/${orgSlug}/projects/${projectId}/takeoffs/${takeoffId}/cut-list`}>
            Crew cut list (print)
          </a>
          {canSubmit && status === "draft" && (
            <Button
              look="primary"
              disabled={submit.isPending}
              onClick={() => {
                if (confirm("Mark this takeoff as the submitted bid? It will be locked for everyone; a copy can be made to continue.")) submit.mutate();
              }}
            >
              Mark as submitted bid
            </Button>
          )}
          {canRun && (
            <Button look="secondary" disabled={copy.isPending} onClick={() => copy.mutate()}>
              Make a copy to continue
            </Button>
          )}
        </div>
        {canSubmit && <SendBidForm scope={scope} onSent={() => queryClient.invalidateQueries({ queryKey: sendsKey(scope) })} />}
        {sends.data && sends.data.length > 0 && (
          <div>
            <h3 className="text-sm font-semibold">Sent</h3>
            <ul className="mt-1 space-y-0.5 text-sm" aria-label="Bid e-mails sent">
              {sends.data.map((s) => (
                <li key={`${s.to}-${s.sentAt}`}>
                  ✉ {s.to} · {new Date(s.sentAt).toLocaleString("en-US")} {s.sentByName ? `· by ${s.sentByName}` : ""}
                </li>
              ))}
            </ul>
          </div>
        )}
      </div>
    </Card>
  );
}
