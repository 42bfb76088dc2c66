"use client";

import Link from "next/link";
import { signIn } from "next-auth/react";
import { useRouter } from "next/navigation";
import { useState, type FormEvent } from "react";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/card";
import { Field, TextInput } from "@/components/ui/field";
import { api, ApiError } from "@/lib/api-client";

export function SignUpForm() {
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
      const { organisation } = await api<{ organisation: { slug: string } }>("/api/signup", { method: "POST", body: form });
      await signIn("credentials", { email: form.email, password: form.password, redirect: false });
      router.push(`/${organisation.slug}/projects`);
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
      <h1 className="text-xl font-bold">Create your company&apos;s account</h1>
      <p className="text-sm text-graphite-700">You will be the admin; invite your estimators and project managers next.</p>
      {error && <Notice tone="error">{error}</Notice>}
      <Field label="Your name" name="name" error={fields.name}>
        <TextInput name="name" autoComplete="name" maxLength={100} error={fields.name} />
      </Field>
      <Field label="Company name" name="organisationName" error={fields.organisationName}>
        <TextInput name="organisationName" autoComplete="organization" maxLength={100} error={fields.organisationName} />
      </Field>
      <Field label="E-mail" name="email" error={fields.email}>
        <TextInput name="email" type="email" autoComplete="email" error={fields.email} />
      </Field>
      <Field label="Password" name="password" error={fields.password} hint="At least 8 characters.">
        <TextInput name="password" type="password" autoComplete="new-password" error={fields.password} />
      </Field>
      <Button type="submit" disabled={busy} className="w-full">
        {busy ? "Creating…" : "Create account"}
      </Button>
      <p className="text-sm text-graphite-700">
        Already have an account?{" "}
        <Link href="/sign-in" className="font-semibold text-spruce-700 underline">
          Sign in
        </Link>
      </p>
    </form>
  );
}
