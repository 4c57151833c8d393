import { describe, expect, it } from "vitest";
import { normaliseAddress, parseTrustedProxies, resolveClientAddress } from "./client-address";

// The usual rule for forwarded addresses (as in the "trust proxy" settings of common Node
// servers): believe X-Forwarded-For only from configured proxies, reading it from the right.
describe("client address", () => {
  const none = parseTrustedProxies("");
  const lb = parseTrustedProxies("10.0.0.0/8, 192.0.2.7");

  it("with no trusted proxies, is the connection's peer whatever X-Forwarded-For says", () => {
    expect(resolveClientAddress({ peer: "203.0.113.9", forwardedFor: "1.2.3.4", trusted: none })).toBe("203.0.113.9");
    expect(resolveClientAddress({ peer: "::ffff:127.0.0.1", forwardedFor: "a".repeat(300), trusted: none })).toBe("127.0.0.1");
  });

  it("behind trusted proxies, is the first address from the right that is not one of them", () => {
    expect(resolveClientAddress({ peer: "10.1.1.1", forwardedFor: "6.6.6.6, 203.0.113.9, 192.0.2.7", trusted: lb })).toBe("203.0.113.9");
    expect(resolveClientAddress({ peer: "10.1.1.1", forwardedFor: ["203.0.113.9", "10.2.2.2"], trusted: lb })).toBe("203.0.113.9");
    expect(resolveClientAddress({ peer: "10.1.1.1", forwardedFor: null, trusted: lb })).toBe("10.1.1.1");
    // a peer that is not a trusted proxy cannot vouch for anyone
    expect(resolveClientAddress({ peer: "198.51.100.1", forwardedFor: "203.0.113.9", trusted: lb })).toBe("198.51.100.1");
    // garbage a client put further left is never reached; garbage next to a proxy stops at the proxy
    expect(resolveClientAddress({ peer: "10.1.1.1", forwardedFor: "x".repeat(300), trusted: lb })).toBe("10.1.1.1");
  });

  it("reads TRUSTED_PROXIES, and names an entry it cannot read", () => {
    expect(parseTrustedProxies("::1, fd00::/8").check("fd12::1", "ipv6")).toBe(true);
    expect(() => parseTrustedProxies("10.0.0.0/40")).toThrow(/TRUSTED_PROXIES: "10.0.0.0\/40" is not an IP address or CIDR range/);
    expect(() => parseTrustedProxies("proxy.internal")).toThrow(/"proxy.internal"/);
    expect(normaliseAddress(" 10.0.0.1 ")).toBe("10.0.0.1");
    expect(normaliseAddress("10.0.0.1:443")).toBeNull();
  });
});
