"use client";

import { useMutation } from "@tanstack/react-query";
import type { FormEvent } from "react";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/card";
import { Field, TextInput } from "@/components/ui/field";
import { api, ApiError } from "@/lib/api-client";

export function SendBidForm({ url, onSent }: { url: string; onSent: () => void }) {
  const send = useMutation({
    mutationFn: (body: { to: string; message: string }) => api<{ sent: { to: string } }>(url, { method: "POST", body }),
    onSuccess: onSent,
  });
  const fields = send.error instanceof ApiError ? send.error.fields : {};
  function submit(e: FormEvent<HTMLFormElement>) {
    e.preventDefault();
    const form = e.currentTarget;
    send.mutate(Object.fromEntries(new FormData(form)) as { to: string; message: string }, { onSuccess: () => form.reset() });
  }
  return (
    <form onSubmit={submit} className="grid gap-3 rounded-md border border-maple-200 p-3 sm:grid-cols-[1fr_2fr_auto] sm:items-end" noValidate>
      <Field label="E-mail the bid to" name="to" error={fields.to}>
        <TextInput name="to" type="email" placeholder="estimating@contractor.example" error={fields.to} />
      </Field>
      <Field label="Message (optional)" name="message" error={fields.message}>
        <TextInput name="message" maxLength={2000} error={fields.message} />
      </Field>
      <Button type="submit" disabled={send.isPending}>
        {send.isPending ? "Sending…" : "Send bid"}
      </Button>
      {send.isError && !fields.to && (
        <div className="sm:col-span-3">
          <Notice tone="error">{send.error.message}</Notice>
        </div>
      )}
      {send.isSuccess && (
        <div className="sm:col-span-3">
          <Notice>Sent to {send.data.sent.to}.</Notice>
        </div>
      )}
    </form>
  );
}
