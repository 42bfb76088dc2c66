"use client";

import "./globals.css";
import { ErrorState } from "@/components/shell/error-state";

// Replaces the root layout when that itself fails, so it brings its own <html> and <body>.
export default function GlobalError({ error, reset }: { error: Error & { digest?: string }; reset: () => void }) {
  return (
    <html lang="en">
      <body>
        <main className="px-4 py-16">
          <ErrorState error={error} reset={reset} />
        </main>
      </body>
    </html>
  );
}
