"use client";

import { useSyncExternalStore } from "react";

const never = () => () => {};

/**
 * A moment in the reader's own time zone. The server cannot know that zone, so it prints the UTC date and the
 * browser replaces it with local date and time once hydrated, without a mismatch warning.
 */
export function LocalTime({ iso, dateOnly = false }: { iso: string; dateOnly?: boolean }) {
  const inBrowser = useSyncExternalStore(never, () => true, () => false);
  const d = new Date(iso);
  const text = inBrowser
    ? d.toLocaleString("en-US", dateOnly ? { dateStyle: "medium" } : { dateStyle: "medium", timeStyle: "short" })
    : d.toLocaleDateString("en-US", { dateStyle: "medium", timeZone: "UTC" });
  return <time dateTime={iso}>{text}</time>;
}
