/** A file name safe in a Content-Disposition header: "Base bid" → "base-bid-order.csv". */
export function downloadName(takeoffName: string, what: string, ext: string): string {
  const base = takeoffName
    .normalize("NFKD")
    .replace(/[^\w\s-]/g, "")
    .trim()
    .toLowerCase()
    .replace(/[\s_-]+/g, "-")
    .slice(0, 60);
  return `${base || "takeoff"}-${what}.${ext}`;
}
