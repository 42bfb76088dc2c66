"use client";

import { useQueryClient } from "@tanstack/react-query";
import { generateReactHelpers } from "@uploadthing/react";
import { useRef, useState, type DragEvent } from "react";
import type { PlanRouter } from "@/app/api/uploadthing/core";
import { planSetsQuery } from "@/lib/client/plan-sets";
import type { PlanSetView, PlanUploadResult } from "@/lib/plans/api-types";
import { fileDigest } from "@/lib/plans/upload-progress";
import { UploadRow, type UploadItem } from "./upload-row";

const { uploadFiles } = generateReactHelpers<PlanRouter>();

/**
 * Plan-set upload: each file goes up on its own, so each has its own progress bar and its own Cancel.
 * The server reads every PDF back before it becomes sheets; a refusal comes back as a message here.
 */
export function PlanUpload({ orgSlug, projectId, onUploaded }: { orgSlug: string; projectId: string; onUploaded: () => void }) {
  const [items, setItems] = useState<UploadItem[]>([]);
  const [dragging, setDragging] = useState(false);
  const inputRef = useRef<HTMLInputElement>(null);
  const queryClient = useQueryClient();
  const patch = (id: string, change: Partial<UploadItem>) => setItems((all) => all.map((i) => (i.id === id ? { ...i, ...change } : i)));

  /** The project's plan sets with the same bytes, or none (also when the browser cannot hash or the list cannot be read). */
  async function sameFile(file: File): Promise<PlanSetView | undefined> {
    try {
      const digest = await fileDigest(file);
      if (!digest) return undefined;
      // Always asked afresh: a set uploaded a moment ago must be found.
      const planSets = await queryClient.fetchQuery({ ...planSetsQuery({ orgSlug, projectId }), staleTime: 0 });
      return planSets.find((p) => p.contentHash === digest);
    } catch {
      return undefined;
    }
  }

  async function upload(file: File) {
    const id = `${file.name}-${file.size}-${Date.now()}-${Math.random()}`;
    const controller = new AbortController();
    const base = { id, name: file.name, size: file.size, loaded: 0, abort: () => controller.abort() };
    if (file.size === 0) {
      setItems((all) => [...all, { ...base, status: "refused", message: `${file.name} is empty (0 bytes): there is nothing to upload.` }]);
      return;
    }
    setItems((all) => [...all, { ...base, status: "comparing" }]);
    const twin = await sameFile(file);
    if (twin) {
      // Ask before sending: a second copy of a set doubles its sheets, and whoever tags them doubles the count.
      patch(id, {
        status: "duplicate",
        duplicateOf: { name: twin.name, uploadedAt: twin.createdAt, pageCount: twin.pageCount },
        skip: () => patch(id, { status: "skipped", message: `Skipped: ${twin.name} already holds this file. Nothing was added.` }),
        keepBoth: () => void send(file, id, controller),
      });
      return;
    }
    await send(file, id, controller);
  }

  async function send(file: File, id: string, controller: AbortController) {
    patch(id, { status: "starting", loaded: 0 });
    try {
      const [done] = await uploadFiles("planSet", {
        files: [file],
        input: { orgSlug, projectId },
        signal: controller.signal,
        onUploadBegin: () => patch(id, { status: "uploading" }),
        onUploadProgress: ({ loaded }) => patch(id, { loaded, status: loaded >= file.size ? "checking" : "uploading" }),
      });
      const result = done?.serverData as PlanUploadResult | null | undefined;
      if (result?.ok) {
        patch(id, { status: "done", loaded: file.size, message: `${result.pageCount} sheet${result.pageCount === 1 ? "" : "s"} added.` });
        onUploaded();
      } else {
        patch(id, { status: "refused", message: result?.error ?? "The server did not confirm this upload. Reload to see whether it arrived." });
      }
    } catch (error) {
      if (controller.signal.aborted) patch(id, { status: "cancelled", message: "Cancelled. Nothing was saved." });
      else patch(id, { status: "refused", message: (error as Error).message || "Upload failed." });
    }
  }

  function pick(files: FileList | null) {
    for (const file of Array.from(files ?? [])) void upload(file);
    if (inputRef.current) inputRef.current.value = "";
  }

  function drop(e: DragEvent) {
    e.preventDefault();
    setDragging(false);
    pick(e.dataTransfer.files);
  }

  return (
    <div className="space-y-3">
      <div
        onDragOver={(e) => {
          e.preventDefault();
          setDragging(true);
        }}
        onDragLeave={() => setDragging(false)}
        onDrop={drop}
        className={`flex flex-wrap items-center gap-3 rounded-lg border-2 border-dashed px-4 py-4 text-sm ${
          dragging ? "border-spruce-600 bg-spruce-50" : "border-maple-300 bg-white"
        }`}
      >
        <label className="cursor-pointer rounded-md bg-spruce-700 px-3.5 py-2 font-semibold text-maple-50 hover:bg-spruce-800">
          Upload plan PDFs
          <input ref={inputRef} type="file" accept="application/pdf,.pdf" multiple className="sr-only" onChange={(e) => pick(e.target.files)} />
        </label>
        <span className="text-graphite-600">or drop them here · PDF, up to 200 MB and 500 pages each</span>
      </div>
      {items.length > 0 && (
        <ul className="space-y-2" aria-label="Uploads">
          {items.map((item) => (
            <UploadRow key={item.id} item={item} onDismiss={() => setItems((all) => all.filter((i) => i.id !== item.id))} />
          ))}
        </ul>
      )}
    </div>
  );
}
