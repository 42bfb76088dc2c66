"use client";

import Link from "next/link";
import { signIn } from "next-auth/react";
import { useRouter } from "next/navigation";
import type { FormEvent } from "react";
import { Notice } from "@/components/ui/card";
import { Field, TextInput } from "@/components/ui/field";
import { FormError, SubmitButton } from "@/components/ui/form-error";
import { useFormMutation } from "@/lib/client/use-form-mutation";

export function SignInForm({ next, joined }: { next: string; joined: boolean }) {
  const router = useRouter();
  // next-auth's signIn stays the mechanism; only the pending and message display is the shared one.
  const signInForm = useFormMutation({
    mutationFn: async (credentials: { email: string; password: string }) => {
      const res = await signIn("credentials", { ...credentials, redirect: false });
      if (!res || res.error) throw new Error(res?.error && res.error !== "CredentialsSignin" ? res.error : "Wrong e-mail or password.");
    },
    onSuccess: () => {
      router.push(next);
      router.refresh();
    },
  });
  // The button keeps saying "Signing in…" until the next page (or its loading state) replaces this one.
  const busy = signInForm.pending || signInForm.mutation.isSuccess;

  function submit(e: FormEvent<HTMLFormElement>) {
    e.preventDefault();
    const form = new FormData(e.currentTarget);
    signInForm.submit({ email: String(form.get("email")), password: String(form.get("password")) });
  }

  return (
    <form onSubmit={submit} className="space-y-4" noValidate>
      <h1 className="text-xl font-bold">Sign in</h1>
      {joined && <Notice>You have joined. Sign in to continue.</Notice>}
      <FormError form={signInForm} />
      <Field label="E-mail" name="email">
        <TextInput name="email" type="email" autoComplete="email" required />
      </Field>
      <Field label="Password" name="password">
        <TextInput name="password" type="password" autoComplete="current-password" required />
      </Field>
      <SubmitButton pending={busy} busy="Signing in…" className="w-full">
        Sign in
      </SubmitButton>
      <p className="text-sm text-graphite-700">
        New to Miterwise?{" "}
        <Link href="/sign-up" className="font-semibold text-spruce-700 underline">
          Create your company&apos;s account
        </Link>
      </p>
    </form>
  );
}
