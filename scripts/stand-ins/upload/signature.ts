import { safeEqual } from "@/lib/safe-equal";
import { signPayload, verifyPayload } from "@/lib/uploads/payload-signature";

// The payload HMAC is the product's (it checks callbacks with it); the stand-in signs URLs and callbacks with it.
export { safeEqual, signPayload, verifyPayload };

/** What a verified upload URL promises about the file; every field came through the app's signature. */
export type SignedUpload = {
  key: string;
  appId: string;
  name: string;
  size: number;
  type: string;
  slug: string | null;
  customId: string | null;
  contentDisposition: string;
  acl: string | null;
};

export type UrlCheck = { ok: true; query: URLSearchParams } | { ok: false; reason: string };

/**
 * Checks a signed URL as the SDK built it: the HMAC covers the whole URL up to `&signature=`, and `expires` is
 * a millisecond timestamp. `candidates` are the full URLs the request may have been signed as (the Host the
 * client used and the stand-in's own address), because the signer saw the URL, not the socket.
 */
export function verifySignedUrl(candidates: string[], apiKey: string, now = Date.now()): UrlCheck {
  for (const full of candidates) {
    const at = full.lastIndexOf("&signature=");
    if (at < 0) return { ok: false, reason: "The URL is not signed" };
    const signed = full.slice(0, at);
    let signature: string;
    try {
      signature = decodeURIComponent(full.slice(at + "&signature=".length));
    } catch {
      return { ok: false, reason: "Malformed signature" };
    }
    if (!verifyPayload(signed, signature, apiKey)) continue;
    const query = new URL(signed).searchParams;
    const expires = Number(query.get("expires"));
    if (!Number.isFinite(expires) || expires < now) return { ok: false, reason: "The URL has expired" };
    return { ok: true, query };
  }
  return { ok: false, reason: "Invalid signature" };
}

/**
 * The SDK encodes each `x-ut-*` value with encodeURIComponent before URLSearchParams encodes it again, so after
 * URLSearchParams has decoded once, one more decode gives the value back.
 */
export function readSignedUpload(key: string, query: URLSearchParams): SignedUpload | null {
  const get = (name: string): string | null => {
    const raw = query.get(name);
    if (raw === null) return null;
    try {
      return decodeURIComponent(raw);
    } catch {
      return null;
    }
  };
  const appId = get("x-ut-identifier");
  const name = get("x-ut-file-name");
  const size = Number(get("x-ut-file-size"));
  if (!appId || !name || !Number.isSafeInteger(size) || size < 0) return null;
  return {
    key,
    appId,
    name,
    size,
    type: get("x-ut-file-type") ?? "",
    slug: get("x-ut-slug"),
    customId: get("x-ut-custom-id"),
    contentDisposition: get("x-ut-content-disposition") === "attachment" ? "attachment" : "inline",
    acl: get("x-ut-acl"),
  };
}

/** Signs a URL the way the SDK's `generateSignedURL` does (used for file-access links the stand-in hands out). */
export function signUrl(url: string, apiKey: string, ttlSeconds: number, now = Date.now()): string {
  const parsed = new URL(url);
  parsed.searchParams.append("expires", String(now + ttlSeconds * 1000));
  const signature = signPayload(parsed.toString(), apiKey);
  parsed.searchParams.append("signature", signature);
  return parsed.href;
}
