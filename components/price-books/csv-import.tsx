"use client";

import { useId, useState, type ChangeEvent } from "react";
import { Button } from "@/components/ui/button";
import { Card, Notice } from "@/components/ui/card";
import { ClientError, refusal, request } from "@/lib/client/fetch";
import { useFormMutation } from "@/lib/client/use-form-mutation";
import { BASE_COLUMNS } from "@/lib/price-books/csv";
import { decodeCsvBytes, type CsvEncoding } from "@/lib/price-books/csv-encoding";
import type { ImportMode, ImportPlan } from "@/lib/price-books/import-plan";
import { ImportPreview } from "./import-preview";

type Preview = ImportPlan & { previewToken: string };
type Answer = { applied: boolean; preview: Preview };
const MAX_BYTES = 2 * 1024 * 1024;

/**
 * Import in two steps: the file is previewed (nothing written), then applied as a whole. Any bad row
 * blocks the whole file, and applying refuses if the book changed since the preview was made.
 */
export function CsvImport({ base, onApplied }: { base: string; onApplied: () => void }) {
  const id = useId();
  const [csv, setCsv] = useState("");
  const [fileName, setFileName] = useState<string | null>(null);
  const [encoding, setEncoding] = useState<CsvEncoding | null>(null);
  const [mode, setMode] = useState<ImportMode>("merge");
  const [preview, setPreview] = useState<Preview | null>(null);
  const [showUnchanged, setShowUnchanged] = useState(false);
  const [note, setNote] = useState<{ tone: "info" | "error"; text: string } | null>(null);
  const send = useFormMutation({
    mutationFn: (body: { csv: string; mode: ImportMode; apply: boolean; previewToken?: string }) => request<Answer>(`${base}/csv`, { method: "POST", body }),
    onSuccess: (answer, { apply }) => {
      if (!apply) return setPreview(answer.preview);
      const c = answer.preview.counts;
      setNote({ tone: "info", text: `Imported: ${c.create} added, ${c.update} changed, ${c.delete} removed, ${c.unchanged} unchanged.` });
      setPreview(null);
      onApplied();
    },
    onError: (error) => {
      if (!(error instanceof ClientError)) return setNote({ tone: "error", text: "Could not reach the server; nothing was imported." });
      // A refused file, or a book changed since the preview: the server sends the preview as it is now.
      const again = (refusal(error, "import_refused") ?? refusal(error, "preview_changed"))?.preview as Preview | undefined;
      if (again) setPreview(again);
      const fields = Object.values(error.fields);
      setNote({ tone: "error", text: again || fields.length === 0 ? error.message : `${error.message} ${fields.join(" ")}` });
    },
  });

  const changed = () => {
    setPreview(null);
    setNote(null);
  };
  async function pick(e: ChangeEvent<HTMLInputElement>) {
    const file = e.target.files?.[0];
    changed();
    if (!file) return;
    if (file.size > MAX_BYTES) return setNote({ tone: "error", text: "That file is over 2 MB; split it and import the parts." });
    // Decoded here, not with file.text(): that reads every file as UTF-8 and turns "Érable" into "�rable".
    const decoded = decodeCsvBytes(new Uint8Array(await file.arrayBuffer()));
    if (!decoded.ok) return setNote({ tone: "error", text: decoded.message });
    setFileName(file.name);
    setEncoding(decoded.encoding);
    setCsv(decoded.text);
  }

  function run(apply: boolean) {
    setNote(null);
    send.submit({ csv, mode, apply, previewToken: apply ? preview?.previewToken : undefined });
  }

  const work = preview && preview.counts.create + preview.counts.update + preview.counts.delete;
  return (
    <Card title="Import from CSV">
      <div className="space-y-4">
        <p className="text-sm text-graphite-700">
          Columns: <code className="text-xs">{BASE_COLUMNS.join(", ")}</code>, then one <code className="text-xs">price 8&apos;</code> column per stock length (empty
          where an item is not sold in that length). Commas or tabs separate values; sizes in millimetres are rounded to the nearest 1/16&quot;. Export first to get a file to edit. Rows are matched to items by supplier code, or else by name and kind.
        </p>
        <div className="flex flex-wrap items-center gap-3 text-sm">
          <label htmlFor={`${id}-file`} className="font-medium text-graphite-700">
            CSV file
          </label>
          <input id={`${id}-file`} type="file" accept=".csv,.tsv,.txt,text/csv,text/tab-separated-values,text/plain" onChange={pick} className="text-sm" />
          {fileName && <span className="text-graphite-600">{fileName}</span>}
          {fileName && encoding && encoding !== "UTF-8" && (
            <span className="text-graphite-900" role="note">
              Read as {encoding === "Windows-1252" ? "Windows-1252 (Western European)" : encoding} text: check accented names in the preview.
            </span>
          )}
        </div>
        <details>
          <summary className="cursor-pointer text-sm font-medium text-spruce-700">…or paste the CSV</summary>
          <textarea
            aria-label="CSV to import"
            className="mt-2 h-32 w-full rounded-md border border-graphite-400 bg-white p-2 font-mono text-xs"
            value={csv}
            onChange={(e) => (setCsv(e.target.value), setFileName(null), setEncoding(null), changed())}
          />
        </details>
        <fieldset className="space-y-1 text-sm">
          <legend className="font-semibold text-graphite-900">Items the file leaves out</legend>
          <label className="flex items-center gap-2">
            <input type="radio" name={`${id}-mode`} checked={mode === "merge"} onChange={() => (setMode("merge"), changed())} />
            Keep them (merge)
          </label>
          <label className="flex items-center gap-2">
            <input type="radio" name={`${id}-mode`} checked={mode === "replace"} onChange={() => (setMode("replace"), changed())} />
            Remove them: replace the whole list with the file
          </label>
        </fieldset>
        {note && <Notice tone={note.tone}>{note.text}</Notice>}
        <div className="flex flex-wrap gap-3">
          <Button type="button" look="secondary" disabled={csv.trim() === "" || send.pending} onClick={() => run(false)}>
            {send.pending && !preview ? "Reading…" : "Preview changes"}
          </Button>
          {preview && (
            <Button type="button" disabled={!preview.ok || !work || send.pending} onClick={() => run(true)}>
              {send.pending ? "Importing…" : preview.ok ? (work ? "Apply import" : "Nothing to apply") : "Fix the errors to apply"}
            </Button>
          )}
        </div>
        {preview && (
          <div className="space-y-2">
            <label className="flex items-center gap-2 text-sm text-graphite-700">
              <input type="checkbox" checked={showUnchanged} onChange={(e) => setShowUnchanged(e.target.checked)} />
              Show unchanged rows
            </label>
            <ImportPreview plan={preview} showUnchanged={showUnchanged} />
          </div>
        )}
      </div>
    </Card>
  );
}
