import { timingSafeEqual } from "node:crypto";

/** Constant-time comparison, so neither signatures nor secrets can be guessed byte by byte from timings. */
export function safeEqual(a: string, b: string): boolean {
  const x = Buffer.from(a, "utf8");
  const y = Buffer.from(b, "utf8");
  return x.length === y.length && timingSafeEqual(x, y);
}
