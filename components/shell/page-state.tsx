import Link from "next/link";
import type { ReactNode } from "react";
import { LoaderCircle } from "lucide-react";
import { Logo } from "@/components/logo";

/** The app's own words for "not here" and "went wrong": a heading, what to do, and a way on. */
export function PageState({ title, children, actions, code }: { title: string; children: ReactNode; actions: ReactNode; code?: string }) {
  return (
    <section aria-labelledby="page-state-title" className="mx-auto max-w-lg rounded-lg border border-maple-200 bg-white p-6 shadow-sm">
      <div className="flex items-center gap-3">
        <Logo className="h-8 w-8" />
        {code && <p className="num text-sm font-semibold text-brass-700">{code}</p>}
      </div>
      <h1 id="page-state-title" className="mt-4 text-xl font-bold text-graphite-900">
        {title}
      </h1>
      <div className="mt-2 space-y-2 text-sm text-graphite-700">{children}</div>
      <div className="mt-5 flex flex-wrap items-center gap-3">{actions}</div>
    </section>
  );
}

export const primaryLink = "inline-flex items-center rounded-md bg-spruce-700 px-3.5 py-2 text-sm font-semibold text-maple-50 hover:bg-spruce-800";

/** Nothing at this address, or nothing the caller may see (the same thing, on purpose). */
export function NotFoundState() {
  return (
    <PageState
      code="404"
      title="Nothing here"
      actions={
        <Link href="/orgs" className={primaryLink}>
          Go to your projects
        </Link>
      }
    >
      <p>There is no page at this address, or it belongs to an organisation you are not a member of.</p>
      <p>If someone sent you the link, ask them to check it, or to invite you to their organisation.</p>
    </PageState>
  );
}

/** Shown while a page's data is on its way, so a click never leaves a blank screen. */
export function LoadingState({ label = "Loading…" }: { label?: string }) {
  return (
    <div role="status" aria-live="polite" className="flex items-center gap-2 py-10 text-sm text-graphite-700">
      <LoaderCircle aria-hidden className="size-4 animate-spin text-spruce-700" />
      {label}
    </div>
  );
}
