"use client";

import { useState, type FormEvent } from "react";
import { parseLength } from "@/takeoff";

/** One length typed the way carpenters write it, checked by the engine's parser before anything is sent. */
export function LengthForm({ id, label, submit, busy, onSubmit, onCancel }: { id: string; label: string; submit: string; busy?: boolean; onSubmit: (text: string, inches: number) => void; onCancel: () => void }) {
  const [text, setText] = useState("");
  const [error, setError] = useState<string | null>(null);
  function go(e: FormEvent) {
    e.preventDefault();
    let inches: number;
    try {
      inches = parseLength(text);
    } catch {
      setError(`Write a length such as 12'-7 1/2", 151.5 or 3.85 m.`);
      return;
    }
    if (!(inches > 0)) return setError("The length must be more than zero.");
    setError(null);
    onSubmit(text.trim(), inches);
  }
  return (
    <form onSubmit={go} className="space-y-1.5" noValidate>
      <label htmlFor={id} className="block text-xs font-medium text-graphite-700">
        {label}
      </label>
      <div className="flex gap-1.5">
        <input
          id={id}
          autoFocus
          value={text}
          onChange={(e) => setText(e.target.value)}
          placeholder={`12'-7 1/2"`}
          aria-invalid={error ? true : undefined}
          aria-describedby={error ? `${id}-error` : undefined}
          className="w-full min-w-0 rounded-md border border-graphite-400 bg-white px-2 py-1 text-sm aria-[invalid=true]:border-alarm-600"
        />
        <button type="submit" disabled={busy} className="rounded-md bg-spruce-700 px-2.5 text-sm font-semibold text-maple-50 hover:bg-spruce-800 disabled:bg-graphite-400">
          {submit}
        </button>
        <button type="button" onClick={onCancel} className="rounded-md px-2 text-sm text-spruce-700 hover:bg-maple-200">
          Cancel
        </button>
      </div>
      {error && (
        <p id={`${id}-error`} role="alert" className="text-xs font-medium text-alarm-700">
          ⚠ {error}
        </p>
      )}
    </form>
  );
}
