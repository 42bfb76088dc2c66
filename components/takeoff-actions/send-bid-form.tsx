"use client";

import type { FormEvent } from "react";
import { Notice } from "@/components/ui/card";
import { Field, TextInput } from "@/components/ui/field";
import { FormError, SubmitButton } from "@/components/ui/form-error";
import { request } from "@/lib/client/fetch";
import { sendsPath } from "@/lib/client/sends";
import type { TakeoffScope } from "@/lib/client/takeoffs";
import { useFormMutation } from "@/lib/client/use-form-mutation";

export function SendBidForm({ scope, onSent }: { scope: TakeoffScope; onSent: () => void }) {
  const send = useFormMutation({
    mutationFn: (body: { to: string; message: string }) => request<{ sent: { to: string } }>(sendsPath(scope), { method: "POST", body }),
    onSuccess: onSent,
  });
  const fields = send.errors;
  function submit(e: FormEvent<HTMLFormElement>) {
    e.preventDefault();
    const form = e.currentTarget;
    send.submit(Object.fromEntries(new FormData(form)) as { to: string; message: string }, { onSuccess: () => form.reset() });
  }
  return (
    <form onSubmit={submit} className="grid gap-3 rounded-md border border-maple-200 p-3 sm:grid-cols-[1fr_2fr_auto] sm:items-end" noValidate>
      <Field label="E-mail the bid to" name="to" error={fields.to}>
        <TextInput name="to" type="email" placeholder="estimating@contractor.example" error={fields.to} />
      </Field>
      <Field label="Message (optional)" name="message" error={fields.message}>
        <TextInput name="message" maxLength={2000} error={fields.message} />
      </Field>
      <SubmitButton pending={send.pending} busy="Sending…">
        Send bid
      </SubmitButton>
      {send.formError && !fields.to && (
        <div className="sm:col-span-3">
          <FormError form={send} />
        </div>
      )}
      {send.mutation.isSuccess && (
        <div className="sm:col-span-3">
          <Notice>Sent to {send.mutation.data.sent.to}.</Notice>
        </div>
      )}
    </form>
  );
}
