import { safeEqual } from "@/lib/safe-equal";

/**
 * Route handlers never see the socket, and `next start` keeps whatever X-Forwarded-For the client sent. So
 * our own server (scripts/serve.mjs) writes the socket's peer address into this header, overwriting any copy
 * the client sent, prefixed with a random token only that process knows (MITERWISE_PEER_TOKEN).
 */
export const PEER_HEADER = "x-miterwise-peer";

/** Used when the request did not come through our server; every such request shares one throttling bucket. */
export const UNKNOWN_ADDRESS = "unknown";

type HeaderSource = Headers | Record<string, unknown> | undefined;

function read(headers: HeaderSource, name: string): string | null {
  if (!headers) return null;
  if (headers instanceof Headers) return headers.get(name);
  const value = headers[name];
  if (Array.isArray(value)) return value.join(",");
  return typeof value === "string" ? value : null;
}

const plausible = (address: string | undefined) =>
  address !== undefined && address.length > 0 && address.length <= 64 && /^[0-9A-Fa-f:.]+$/.test(address);

/**
 * The client's address, after OWASP's advice: the socket's peer, unless `trustedProxies` of our own reverse
 * proxies stand in front, in which case it is the entry the outermost of them appended to X-Forwarded-For
 * (the N-th from the right). Entries further left were written by the client and are never trusted.
 */
export function clientAddress(
  headers: HeaderSource,
  opts: { peerToken: string | undefined; trustedProxies: number },
): string {
  const peer = read(headers, PEER_HEADER);
  const space = peer?.indexOf(" ") ?? -1;
  if (!peer || !opts.peerToken || space < 0 || !safeEqual(peer.slice(0, space), opts.peerToken)) return UNKNOWN_ADDRESS;
  const socketAddress = normalise(peer.slice(space + 1).trim());
  if (!plausible(socketAddress)) return UNKNOWN_ADDRESS;
  if (opts.trustedProxies === 0) return socketAddress;
  const hops = (read(headers, "x-forwarded-for") ?? "")
    .split(",")
    .map((h) => h.trim())
    .filter(Boolean);
  // Fewer hops than proxies: the request skipped a proxy, so what it says is no better than the socket.
  if (hops.length < opts.trustedProxies) return socketAddress;
  const client = normalise(hops[hops.length - opts.trustedProxies]!);
  return plausible(client) ? client : UNKNOWN_ADDRESS;
}

/** `::ffff:203.0.113.5` and `203.0.113.5` are one client. */
const normalise = (address: string) => address.replace(/^::ffff:(\d+\.\d+\.\d+\.\d+)$/i, "$1").toLowerCase();
