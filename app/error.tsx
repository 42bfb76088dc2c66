"use client";

import { ErrorState } from "@/components/shell/error-state";

export default function RootError({ error, reset }: { error: Error & { digest?: string }; reset: () => void }) {
  return (
    <main className="px-4 py-16">
      <ErrorState error={error} reset={reset} />
    </main>
  );
}
