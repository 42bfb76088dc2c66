"use client";

import { useState, type FormEvent } from "react";
import { Button } from "@/components/ui/button";
import { sameLength, stockLengthText } from "@/lib/price-books/length-text";
import { stockLength } from "@/lib/validators/price-books";

/**
 * Adds an empty price column for a stock length no item is sold in yet, so prices for it can be typed
 * straight into the table. It lasts until the page is left unless a price is entered in it.
 */
export function AddLength({ lengths, onAdd }: { lengths: number[]; onAdd: (inches: number) => void }) {
  const [text, setText] = useState("");
  const [error, setError] = useState<string | null>(null);
  function submit(e: FormEvent) {
    e.preventDefault();
    const parsed = stockLength.safeParse(text.trim());
    if (!parsed.success) return setError(parsed.error.issues[0]?.message ?? "Not a length.");
    if (lengths.some((l) => sameLength(l, parsed.data))) return setError(`There is already a ${stockLengthText(parsed.data)} column.`);
    onAdd(parsed.data);
    setText("");
    setError(null);
  }
  return (
    <form onSubmit={submit} className="flex flex-wrap items-start gap-2 text-sm" noValidate>
      <label htmlFor="add-length" className="py-1.5 font-medium text-graphite-700">
        Add a stock length column
      </label>
      <div>
        <input
          id="add-length"
          className="w-24 rounded-md border border-graphite-400 bg-white px-2 py-1.5 text-sm aria-[invalid=true]:border-alarm-600"
          placeholder="18'"
          value={text}
          aria-invalid={error ? true : undefined}
          aria-describedby={error ? "add-length-error" : undefined}
          onChange={(e) => (setText(e.target.value), setError(null))}
        />
        {error && (
          <p id="add-length-error" role="alert" className="mt-0.5 max-w-64 text-xs font-medium text-alarm-700">
            ⚠ {error}
          </p>
        )}
      </div>
      <Button type="submit" look="secondary" className="px-2.5 py-1.5 text-xs">
        Add column
      </Button>
    </form>
  );
}
