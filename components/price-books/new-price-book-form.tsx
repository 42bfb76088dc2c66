"use client";

import { useQueryClient } from "@tanstack/react-query";
import { useRouter } from "next/navigation";
import { useState, type FormEvent } from "react";
import { Card } from "@/components/ui/card";
import { FormError, SubmitButton } from "@/components/ui/form-error";
import { Field, TextInput } from "@/components/ui/field";
import { request } from "@/lib/client/fetch";
import { useFormMutation } from "@/lib/client/use-form-mutation";
import { priceBooksKey, priceBooksPath } from "@/lib/client/price-books";
import { fieldErrorsOf } from "@/lib/plans/window-list/field-errors";
import type { PriceBookSummary } from "@/lib/price-books/types";
import { priceBookCreateSchema } from "@/lib/validators/price-books";

/** A new, empty book; its rates start at zero and are set on the book's page, where it opens. */
export function NewPriceBookForm({ orgSlug }: { orgSlug: string }) {
  const router = useRouter();
  const queryClient = useQueryClient();
  const [name, setName] = useState("");
  const create = useFormMutation({
    mutationFn: (body: unknown) => request<{ priceBook: PriceBookSummary }>(priceBooksPath(orgSlug), { method: "POST", body }),
    onSuccess: ({ priceBook }) => {
      void queryClient.invalidateQueries({ queryKey: priceBooksKey(orgSlug) });
      router.push(`/${orgSlug}/price-books/${priceBook.id}`);
    },
  });
  const { errors } = create;

  function submit(e: FormEvent) {
    e.preventDefault();
    const parsed = priceBookCreateSchema.safeParse({ name });
    if (!parsed.success) return create.refuse(fieldErrorsOf(parsed.error));
    create.submit({ name });
  }

  return (
    <Card title="New price book">
      <form onSubmit={submit} className="space-y-3" noValidate>
        <FormError form={create} hideFor={["name"]} />
        <Field label="Name" name="price-book-name" error={errors.name} hint="For example the supplier and the year the prices hold for.">
          <TextInput name="price-book-name" maxLength={120} value={name} onChange={(e) => (setName(e.target.value), create.clear(() => true))} error={errors.name} />
        </Field>
        <SubmitButton pending={create.pending} busy="Creating…">
          Create price book
        </SubmitButton>
      </form>
    </Card>
  );
}
