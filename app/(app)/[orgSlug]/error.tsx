"use client";

import { ErrorState } from "@/components/shell/error-state";

// Inside the organisation's layout: the header stays, so the way to every other page does too.
export default function OrgError({ error, reset }: { error: Error & { digest?: string }; reset: () => void }) {
  return (
    <div className="py-10">
      <ErrorState error={error} reset={reset} />
    </div>
  );
}
