"use client";

import { signIn } from "next-auth/react";
import { useRouter } from "next/navigation";
import type { FormEvent } from "react";
import { Field, TextInput } from "@/components/ui/field";
import { FormError, SubmitButton } from "@/components/ui/form-error";
import { request } from "@/lib/client/fetch";
import { useFormMutation } from "@/lib/client/use-form-mutation";

export function AcceptInviteForm({ token, email, hasAccount }: { token: string; email: string; hasAccount: boolean }) {
  const router = useRouter();
  const accept = useFormMutation({
    mutationFn: async (form: Record<string, string>) => {
      const joined = await request<{ orgSlug: string }>("/api/invitations/accept", { method: "POST", body: { token, ...form } });
      const res = await signIn("credentials", { email, password: form.password, redirect: false });
      return res?.ok ? `/${joined.orgSlug}/projects` : "/sign-in?joined=1";
    },
    onSuccess: (next) => {
      router.push(next);
      router.refresh();
    },
    offline: "Could not reach Miterwise. Check your connection and try again.",
  });
  const fields = accept.errors;
  // After success the page is changing: the button stays busy until the next one replaces this.
  const busy = accept.pending || accept.mutation.isSuccess;

  function submit(e: FormEvent<HTMLFormElement>) {
    e.preventDefault();
    accept.submit(Object.fromEntries(new FormData(e.currentTarget)) as Record<string, string>);
  }

  return (
    <form onSubmit={submit} className="space-y-4" noValidate>
      <FormError form={accept} />
      {hasAccount ? (
        <p className="text-sm text-graphite-700">You already have a Miterwise account. Enter its password to join.</p>
      ) : (
        <Field label="Your name" name="name" error={fields.name}>
          <TextInput name="name" autoComplete="name" maxLength={100} error={fields.name} />
        </Field>
      )}
      <Field
        label={hasAccount ? "Your password" : "Choose a password"}
        name="password"
        error={fields.password}
        hint={hasAccount ? undefined : "At least 8 characters."}
      >
        <TextInput name="password" type="password" autoComplete={hasAccount ? "current-password" : "new-password"} error={fields.password} />
      </Field>
      <SubmitButton pending={busy} busy="Joining…" className="w-full">
        Join
      </SubmitButton>
    </form>
  );
}
