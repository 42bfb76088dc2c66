import { createHmac } from "node:crypto";
import { safeEqual } from "@/lib/safe-equal";

/**
 * HMAC-SHA256 signing exactly as the SDK does it (`@uploadthing/shared` crypto): hex digest keyed by the api key,
 * written as `hmac-sha256=<hex>`. The app checks the service's callback bodies with it; the local upload
 * stand-in (scripts/stand-ins/upload) signs them and its URLs the same way.
 */
const PREFIX = "hmac-sha256=";

export function signPayload(payload: string, apiKey: string): string {
  return PREFIX + createHmac("sha256", apiKey).update(payload, "utf8").digest("hex");
}

export function verifyPayload(payload: string, signature: string | null | undefined, apiKey: string): boolean {
  if (!signature?.startsWith(PREFIX)) return false;
  return safeEqual(signature, signPayload(payload, apiKey));
}
