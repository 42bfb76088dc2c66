import type { ProjectStatus } from "@/db/schema";

// Each status has its own mark and word, so colour never carries the meaning alone.
const looks: Record<ProjectStatus, { mark: string; label: string; className: string }> = {
  draft: { mark: "✎", label: "Draft", className: "bg-maple-100 text-graphite-700 border-maple-300" },
  submitted: { mark: "➜", label: "Submitted", className: "bg-brass-300/40 text-brass-700 border-brass-400" },
  won: { mark: "✓", label: "Won", className: "bg-spruce-50 text-spruce-800 border-spruce-600" },
  lost: { mark: "✕", label: "Lost", className: "bg-white text-graphite-600 border-graphite-400" },
};

export function StatusBadge({ status }: { status: ProjectStatus }) {
  const l = looks[status];
  return (
    <span className={`inline-flex items-center gap-1 rounded-full border px-2 py-0.5 text-xs font-medium ${l.className}`}>
      <span aria-hidden>{l.mark}</span>
      {l.label}
    </span>
  );
}
