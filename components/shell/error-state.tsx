"use client";

import Link from "next/link";
import { PageState, primaryLink } from "./page-state";

/** What an error boundary shows: nothing was lost, try again, or go somewhere that works. */
export function ErrorState({ error, reset }: { error: Error & { digest?: string }; reset: () => void }) {
  return (
    <PageState
      title="This page stopped working"
      actions={
        <>
          <button type="button" onClick={reset} className={primaryLink}>
            Try again
          </button>
          <Link href="/orgs" className="text-sm font-semibold text-spruce-700 underline">
            Go to your projects
          </Link>
        </>
      }
    >
      <p>Something in this page failed while showing it. Anything you saved before is kept; an edit that was still being typed may be lost.</p>
      <p>Try again, or reload the page. If it keeps happening, tell us the reference below.</p>
      {error.digest && (
        <p className="text-xs text-graphite-600">
          Reference: <code className="num">{error.digest}</code>
        </p>
      )}
    </PageState>
  );
}
