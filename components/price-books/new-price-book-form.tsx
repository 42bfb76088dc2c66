"use client";

import { useMutation, useQueryClient } from "@tanstack/react-query";
import { useRouter } from "next/navigation";
import { useState, type FormEvent } from "react";
import { Button } from "@/components/ui/button";
import { Card, Notice } from "@/components/ui/card";
import { Field, TextInput } from "@/components/ui/field";
import { api, ApiError } from "@/lib/api-client";
import { priceBooksKey } from "@/lib/client/price-books";
import { fieldErrorsOf } from "@/lib/plans/window-list/field-errors";
import type { PriceBookSummary } from "@/lib/price-book/types";
import { priceBookCreateSchema } from "@/lib/validators/price-book";

/** A new, empty book; its rates start at zero and are set on the book's page, where it opens. */
export function NewPriceBookForm({ orgSlug }: { orgSlug: string }) {
  const router = useRouter();
  const queryClient = useQueryClient();
  const [name, setName] = useState("");
  const [errors, setErrors] = useState<Record<string, string>>({});
  const create = useMutation({
    mutationFn: (body: unknown) => api<{ priceBook: PriceBookSummary }>(`/api/orgs/${orgSlug}/price-books`, { method: "POST", body }),
    onSuccess: ({ priceBook }) => {
      void queryClient.invalidateQueries({ queryKey: priceBooksKey(orgSlug) });
      router.push(`/${orgSlug}/price-books/${priceBook.id}`);
    },
    onError: (error) => setErrors(error instanceof ApiError ? error.fields : {}),
  });

  function submit(e: FormEvent) {
    e.preventDefault();
    const parsed = priceBookCreateSchema.safeParse({ name });
    if (!parsed.success) return setErrors(fieldErrorsOf(parsed.error));
    setErrors({});
    create.mutate({ name });
  }

  return (
    <Card title="New price book">
      <form onSubmit={submit} className="space-y-3" noValidate>
        {create.isError && !errors.name && <Notice tone="error">{create.error.message}</Notice>}
        <Field label="Name" name="price-book-name" error={errors.name} hint="For example the supplier and the year the prices hold for.">
          <TextInput name="price-book-name" maxLength={120} value={name} onChange={(e) => (setName(e.target.value), setErrors({}))} error={errors.name} />
        </Field>
        <Button type="submit" disabled={create.isPending}>
          {create.isPending ? "Creating…" : "Create price book"}
        </Button>
      </form>
    </Card>
  );
}
