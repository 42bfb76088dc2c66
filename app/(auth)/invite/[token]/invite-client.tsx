"use client";

import { signIn } from "next-auth/react";
import { useRouter } from "next/navigation";
import { useState, type FormEvent } from "react";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/card";
import { Field, TextInput } from "@/components/ui/field";
import { api, ApiError } from "@/lib/api-client";

export function AcceptInviteForm({ token, email, hasAccount }: { token: string; email: string; hasAccount: boolean }) {
  const router = useRouter();
  const [error, setError] = useState<string | null>(null);
  const [fields, setFields] = useState<Record<string, string>>({});
  const [busy, setBusy] = useState(false);

  async function submit(e: FormEvent<HTMLFormElement>) {
    e.preventDefault();
    const form = Object.fromEntries(new FormData(e.currentTarget)) as Record<string, string>;
    setBusy(true);
    setError(null);
    setFields({});
    try {
      const joined = await api<{ orgSlug: string }>("/api/invitations/accept", { method: "POST", body: { token, ...form } });
      const res = await signIn("credentials", { email, password: form.password, redirect: false });
      router.push(res?.ok ? `/${joined.orgSlug}/projects` : "/sign-in?joined=1");
      router.refresh();
    } catch (err) {
      setBusy(false);
      if (err instanceof ApiError) {
        setError(err.message);
        setFields(err.fields);
      } else setError("Could not reach Miterwise. Check your connection and try again.");
    }
  }

  return (
    <form onSubmit={submit} className="space-y-4" noValidate>
      {error && <Notice tone="error">{error}</Notice>}
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
      <Button type="submit" disabled={busy} className="w-full">
        {busy ? "Joining…" : "Join"}
      </Button>
    </form>
  );
}
