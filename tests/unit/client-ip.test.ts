// The client address from X-Forwarded-For. Each proxy appends the address it saw to the right of the
// list (the header's de-facto rule, as MDN's X-Forwarded-For page describes it: "the right-most IP
// address is the IP address of the most recent proxy"), and scripts/serve.mjs appends the connected
// peer last. With TRUSTED_PROXY_HOPS = n, the address n places from the right is the one the first
// trusted hop saw; anything to its left was written by the client and is never believed.
import { describe, expect, it } from "vitest";
import { clientIpFrom, trustedProxyHops } from "@/lib/client-ip";

describe("client address", () => {
  it("with no proxy (0 hops) is the connected peer, whatever the client wrote", () => {
    expect(clientIpFrom("203.0.113.9", 0)).toBe("203.0.113.9");
    expect(clientIpFrom("1.2.3.4, 5.6.7.8, 198.51.100.20", 0)).toBe("198.51.100.20");
  });

  it("behind one trusted proxy is the address that proxy saw, not the forged ones further left", () => {
    // client forged "1.2.3.4"; the proxy appended the client's real 203.0.113.9; serve.mjs appended the proxy 10.0.0.2
    expect(clientIpFrom("1.2.3.4, 203.0.113.9, 10.0.0.2", 1)).toBe("203.0.113.9");
    expect(clientIpFrom("203.0.113.9, 10.0.0.2", 1)).toBe("203.0.113.9");
    expect(clientIpFrom("9.9.9.9, 8.8.8.8, 203.0.113.9, 10.0.0.3, 10.0.0.2", 2)).toBe("203.0.113.9");
  });

  it("normalizes IPv4-mapped IPv6 and ports, and refuses junk as unknown", () => {
    expect(clientIpFrom("::ffff:192.0.2.7", 0)).toBe("192.0.2.7");
    expect(clientIpFrom("192.0.2.7:51234", 0)).toBe("192.0.2.7");
    expect(clientIpFrom("[2001:db8::1]:443", 0)).toBe("2001:db8::1");
    expect(clientIpFrom("<script>", 0)).toBe("unknown");
    expect(clientIpFrom("", 0)).toBe("unknown");
  });

  it("reads TRUSTED_PROXY_HOPS as a whole number from 0 to 10, else 0", () => {
    expect(trustedProxyHops(undefined)).toBe(0);
    expect(trustedProxyHops("2")).toBe(2);
    for (const bad of ["-1", "1.5", "11", "two"]) expect(trustedProxyHops(bad), bad).toBe(0);
  });
});
