"use client";

import Link from "next/link";
import { signIn } from "next-auth/react";
import { useRouter } from "next/navigation";
import { useState, type FormEvent } from "react";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/card";
import { Field, TextInput } from "@/components/ui/field";

export function SignInForm({ next, joined }: { next: string; joined: boolean }) {
  const router = useRouter();
  const [error, setError] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);

  async function submit(e: FormEvent<HTMLFormElement>) {
    e.preventDefault();
    const form = new FormData(e.currentTarget);
    setBusy(true);
    setError(null);
    const res = await signIn("credentials", {
      email: String(form.get("email")),
      password: String(form.get("password")),
      redirect: false,
    });
    if (!res || res.error) {
      setBusy(false);
      setError(res?.error && res.error !== "CredentialsSignin" ? res.error : "Wrong e-mail or password.");
      return;
    }
    // The button keeps saying "Signing in…" until the next page (or its loading state) replaces this one.
    router.push(next);
    router.refresh();
  }

  return (
    <form onSubmit={submit} className="space-y-4" noValidate>
      <h1 className="text-xl font-bold">Sign in</h1>
      {joined && <Notice>You have joined. Sign in to continue.</Notice>}
      {error && <Notice tone="error">{error}</Notice>}
      <Field label="E-mail" name="email">
        <TextInput name="email" type="email" autoComplete="email" required />
      </Field>
      <Field label="Password" name="password">
        <TextInput name="password" type="password" autoComplete="current-password" required />
      </Field>
      <Button type="submit" disabled={busy} className="w-full">
        {busy ? "Signing in…" : "Sign in"}
      </Button>
      <p className="text-sm text-graphite-700">
        New to Miterwise?{" "}
        <Link href="/sign-up" className="font-semibold text-spruce-700 underline">
          Create your company&apos;s account
        </Link>
      </p>
    </form>
  );
}
