/**
 * What an upload row says about progress. The SDK reports `loaded / size × 100`, which is NaN for an
 * empty file and can pass 100 when a retried chunk is counted twice; before the first byte moves (the
 * upload is being signed) there is no percentage to show at all, only that it is getting ready.
 */
export function uploadPercent(loaded: number, size: number): number | null {
  if (!Number.isFinite(loaded) || !Number.isFinite(size) || size <= 0) return null;
  return Math.min(100, Math.max(0, Math.floor((loaded / size) * 100)));
}

/** "1.4 MB of 12 MB": bytes as people read them, for the line beside the bar. */
export function bytesText(n: number): string {
  if (!Number.isFinite(n) || n < 0) return "";
  if (n < 1024) return `${n} B`;
  if (n < 1024 * 1024) return `${(n / 1024).toFixed(n < 10 * 1024 ? 1 : 0)} KB`;
  return `${(n / (1024 * 1024)).toFixed(n < 10 * 1024 * 1024 ? 1 : 0)} MB`;
}

/** SHA-256 of the file's bytes as hex, the same digest the server keeps for each plan set. Null where the browser offers no digest (an insecure origin). */
export async function fileDigest(file: Blob): Promise<string | null> {
  const subtle = globalThis.crypto?.subtle;
  if (!subtle) return null;
  const digest = await subtle.digest("SHA-256", await file.arrayBuffer());
  return [...new Uint8Array(digest)].map((b) => b.toString(16).padStart(2, "0")).join("");
}
