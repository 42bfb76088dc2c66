"use client";

import Link from "next/link";
import { signIn } from "next-auth/react";
import { useRouter } from "next/navigation";
import type { FormEvent } from "react";
import { Field, TextInput } from "@/components/ui/field";
import { FormError, SubmitButton } from "@/components/ui/form-error";
import { request } from "@/lib/client/fetch";
import { useFormMutation } from "@/lib/client/use-form-mutation";

export function SignUpForm() {
  const router = useRouter();
  const signUp = useFormMutation({
    mutationFn: async (form: Record<string, string>) => {
      const { organisation } = await request<{ organisation: { slug: string } }>("/api/signup", { method: "POST", body: form });
      await signIn("credentials", { email: form.email, password: form.password, redirect: false });
      return organisation;
    },
    onSuccess: (organisation) => {
      router.push(`/${organisation.slug}/projects`);
      router.refresh();
    },
    offline: "Could not reach Miterwise. Check your connection and try again.",
  });
  const fields = signUp.errors;
  // After success the page is changing: the button stays busy until the next one replaces this.
  const busy = signUp.pending || signUp.mutation.isSuccess;

  function submit(e: FormEvent<HTMLFormElement>) {
    e.preventDefault();
    signUp.submit(Object.fromEntries(new FormData(e.currentTarget)) as Record<string, string>);
  }

  return (
    <form onSubmit={submit} className="space-y-4" noValidate>
      <h1 className="text-xl font-bold">Create your company&apos;s account</h1>
      <p className="text-sm text-graphite-700">You will be the admin; invite your estimators and project managers next.</p>
      <FormError form={signUp} />
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
      <SubmitButton pending={busy} busy="Creating…" className="w-full">
        Create account
      </SubmitButton>
      <p className="text-sm text-graphite-700">
        Already have an account?{" "}
        <Link href="/sign-in" className="font-semibold text-spruce-700 underline">
          Sign in
        </Link>
      </p>
    </form>
  );
}
