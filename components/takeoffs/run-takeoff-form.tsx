"use client";

import { useQueryClient } from "@tanstack/react-query";
import { useRouter } from "next/navigation";
import { useState, type FormEvent } from "react";
import { Card, Notice } from "@/components/ui/card";
import { SubmitButton } from "@/components/ui/form-error";
import { Field, Select, TextInput } from "@/components/ui/field";
import { request } from "@/lib/client/fetch";
import { takeoffsKey, takeoffsPath } from "@/lib/client/takeoffs";
import { useFormMutation } from "@/lib/client/use-form-mutation";
import { inchesText } from "@/lib/takeoffs/format";
import { takeoffsPage } from "@/lib/takeoffs/view";

export interface PriceBookChoice {
  id: string;
  name: string;
}

export interface CasingChoice {
  id: string;
  priceBookId: string;
  name: string;
  faceWidth: number;
  thickness: number;
  species: string | null;
}

const casingText = (c: CasingChoice) =>
  `${c.name} (${inchesText(c.faceWidth)} × ${inchesText(c.thickness)}${c.species ? `, ${c.species}` : ""})`;

/** Runs a takeoff from the window list as it is now and opens the result; refusals show beside their field. */
export function RunTakeoffForm({
  orgSlug,
  projectId,
  priceBooks,
  casings,
}: {
  orgSlug: string;
  projectId: string;
  priceBooks: PriceBookChoice[];
  casings: CasingChoice[];
}) {
  const router = useRouter();
  const queryClient = useQueryClient();
  const [bookId, setBookId] = useState(priceBooks[0]?.id ?? "");
  const [casingId, setCasingId] = useState("");
  const bookCasings = casings.filter((c) => c.priceBookId === bookId);

  const scope = { orgSlug, projectId };
  const run = useFormMutation({
    mutationFn: (body: { name: string; note: string; priceBookId: string; casingItemId: string | null; allowPlaceholders: boolean }) =>
      request<{ takeoff: { id: string } }>(takeoffsPath(scope), { method: "POST", body }),
    onSuccess: ({ takeoff }) => {
      void queryClient.invalidateQueries({ queryKey: takeoffsKey(scope) });
      router.push(`${takeoffsPage(orgSlug, projectId)}/${takeoff.id}`);
    },
  });
  const fields = run.errors;
  // A message not tied to a field we show (an empty window list) goes at the top of the form.
  const general = run.formError && !fields.name && !fields.note && !fields.priceBookId && !fields.casingItemId ? (fields._ ?? run.formError) : null;

  function submit(e: FormEvent<HTMLFormElement>) {
    e.preventDefault();
    const form = new FormData(e.currentTarget);
    run.submit({
      name: String(form.get("name") ?? ""),
      note: String(form.get("note") ?? ""),
      priceBookId: bookId,
      casingItemId: casingId || null,
      allowPlaceholders: form.get("allowPlaceholders") === "on",
    });
  }

  // After success the page is changing; keep the button busy rather than inviting a second run.
  const busy = run.pending || run.mutation.isSuccess;
  return (
    <Card title="Run a takeoff">
      <form onSubmit={submit} className="space-y-4" noValidate>
        <p className="text-sm text-graphite-700">
          Takes the window list, tags and unit counts as they are now, prices them from the chosen book and saves the result. Later edits
          never change a saved takeoff.
        </p>
        {general && <Notice tone="error">{general}</Notice>}
        <div className="grid gap-4 sm:grid-cols-2">
          <Field label="Name" name="name" error={fields.name} hint="For example: Base bid, Alternate 1 — oak casing">
            <TextInput name="name" maxLength={80} required error={fields.name} />
          </Field>
          <Field label="Note (optional)" name="note" error={fields.note}>
            <TextInput name="note" maxLength={500} error={fields.note} />
          </Field>
          <Field label="Price book" name="priceBookId" error={fields.priceBookId}>
            <Select
              name="priceBookId"
              value={bookId}
              error={fields.priceBookId}
              aria-describedby={fields.priceBookId ? "priceBookId-error" : undefined}
              onChange={(e) => {
                setBookId(e.target.value);
                setCasingId("");
                run.reset();
              }}
            >
              {priceBooks.map((b) => (
                <option key={b.id} value={b.id}>
                  {b.name}
                </option>
              ))}
            </Select>
          </Field>
          <Field
            label="Alternate casing (optional)"
            name="casingItemId"
            error={fields.casingItemId}
            hint={bookCasings.length === 0 ? "This book lists no casing to offer as an alternate." : "One casing for every window, to price an alternate."}
          >
            <Select name="casingItemId" value={casingId} error={fields.casingItemId} onChange={(e) => setCasingId(e.target.value)}>
              <option value="">Each window&apos;s own casing</option>
              {bookCasings.map((c) => (
                <option key={c.id} value={c.id}>
                  {casingText(c)}
                </option>
              ))}
            </Select>
          </Field>
        </div>
        <label className="flex items-start gap-2 text-sm text-graphite-900">
          <input type="checkbox" name="allowPlaceholders" className="mt-1" />
          <span>
            Price sizes the book lacks with placeholder prices
            <span className="block text-xs text-graphite-700">
              Marked as placeholders on the takeoff and its documents; the takeoff cannot be submitted as the bid until the price book has them.
            </span>
          </span>
        </label>
        <SubmitButton pending={busy} busy="Running the takeoff…" disabled={!bookId}>
          Run takeoff
        </SubmitButton>
      </form>
    </Card>
  );
}
