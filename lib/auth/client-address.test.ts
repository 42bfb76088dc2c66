import { describe, expect, it } from "vitest";
import { clientAddress, PEER_HEADER } from "./client-address";

const token = "per-process-token";
const peer = (address: string, extra: Record<string, string> = {}) => new Headers({ [PEER_HEADER]: `${token} ${address}`, ...extra });

describe("client address", () => {
  it("is the socket's peer when no proxy is trusted, whatever X-Forwarded-For says", () => {
    expect(clientAddress(peer("203.0.113.9", { "x-forwarded-for": "1.2.3.4" }), { peerToken: token, trustedProxies: 0 })).toBe("203.0.113.9");
    expect(clientAddress(peer("::ffff:203.0.113.9"), { peerToken: token, trustedProxies: 0 })).toBe("203.0.113.9");
  });

  it("with N trusted proxies, is the N-th entry from the right of X-Forwarded-For", () => {
    const h = peer("10.0.0.2", { "x-forwarded-for": "6.6.6.6, 198.51.100.4, 10.0.0.1" });
    expect(clientAddress(h, { peerToken: token, trustedProxies: 1 })).toBe("10.0.0.1");
    expect(clientAddress(h, { peerToken: token, trustedProxies: 2 })).toBe("198.51.100.4");
    // Fewer entries than proxies: the request went round them; fall back to the socket.
    expect(clientAddress(peer("10.0.0.2", { "x-forwarded-for": "6.6.6.6" }), { peerToken: token, trustedProxies: 2 })).toBe("10.0.0.2");
  });

  it("is unknown without our server's token, or with junk", () => {
    expect(clientAddress(new Headers({ "x-forwarded-for": "1.2.3.4" }), { peerToken: token, trustedProxies: 0 })).toBe("unknown");
    expect(clientAddress(new Headers({ [PEER_HEADER]: "wrong 1.2.3.4" }), { peerToken: token, trustedProxies: 0 })).toBe("unknown");
    expect(clientAddress(peer("1.2.3.4"), { peerToken: undefined, trustedProxies: 0 })).toBe("unknown");
    expect(clientAddress(peer("<script>"), { peerToken: token, trustedProxies: 0 })).toBe("unknown");
    expect(clientAddress(peer("10.0.0.2", { "x-forwarded-for": "not an address" }), { peerToken: token, trustedProxies: 1 })).toBe("unknown");
  });
});
