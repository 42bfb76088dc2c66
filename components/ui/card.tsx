import type { ReactNode } from "react";

export function Card({ title, actions, children }: { title?: ReactNode; actions?: ReactNode; children: ReactNode }) {
  return (
    <section className="rounded-lg border border-maple-200 bg-white p-5 shadow-sm">
      {(title || actions) && (
        <header className="mb-4 flex flex-wrap items-center justify-between gap-3">
          {title && <h2 className="text-base font-semibold text-graphite-900">{title}</h2>}
          {actions}
        </header>
      )}
      {children}
    </section>
  );
}

export function Notice({ tone = "info", children }: { tone?: "info" | "error"; children: ReactNode }) {
  const look = tone === "error" ? "border-alarm-600 bg-alarm-50 text-alarm-700" : "border-brass-400 bg-maple-100 text-graphite-900";
  return (
    <div role={tone === "error" ? "alert" : "status"} className={`rounded-md border px-3 py-2 text-sm ${look}`}>
      {tone === "error" ? "⚠ " : ""}
      {children}
    </div>
  );
}
