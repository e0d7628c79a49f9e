import { describe, expect, it } from "vitest";
import { normaliseAddress, pickClientAddress } from "@/lib/auth/client-address";

// The address the per-address sign-in throttle counts against. Forwarding
// header semantics: X-Forwarded-For lists the client first and each proxy
// appends the address it received the request from (common practice; the
// standardised form is RFC 7239 "Forwarded", §5.2 "for").

describe("pickClientAddress", () => {
  it("uses the connection's address and ignores X-Forwarded-For without TRUST_PROXY", () => {
    expect(pickClientAddress({ "x-forwarded-for": "203.0.113.9" }, { trustProxy: false, peer: "192.0.2.4" })).toBe("192.0.2.4");
  });

  it("falls back to the header Next.js fills from the socket when no stamped peer is known", () => {
    expect(pickClientAddress({ "x-forwarded-for": "192.0.2.4" }, { trustProxy: false, peer: undefined })).toBe("192.0.2.4");
  });

  it("takes the entry the one trusted proxy appended (the last) with TRUST_PROXY=1, not the client's own claim", () => {
    expect(pickClientAddress({ "x-forwarded-for": "10.1.1.1, 203.0.113.9" }, { trustProxy: true, peer: "192.0.2.1" })).toBe("203.0.113.9");
  });

  it("uses the connection with TRUST_PROXY=1 when no proxy header came", () => {
    expect(pickClientAddress({}, { trustProxy: true, peer: "192.0.2.1" })).toBe("192.0.2.1");
  });

  it("names the address unknown rather than inventing one", () => {
    expect(pickClientAddress({}, { trustProxy: false, peer: undefined })).toBe("unknown");
    expect(pickClientAddress({ "x-forwarded-for": "not-an-address" }, { trustProxy: true, peer: undefined })).toBe("unknown");
  });
});

describe("normaliseAddress", () => {
  it("reads an IPv4-mapped IPv6 socket address as the IPv4 address", () => {
    expect(normaliseAddress("::ffff:127.0.0.1")).toBe("127.0.0.1");
  });

  it("keys IPv6 by its /64, so one host cannot rotate through its own block", () => {
    expect(normaliseAddress("2001:db8:85a3:8d3:1319:8a2e:370:7348")).toBe("2001:db8:85a3:8d3::/64");
    expect(normaliseAddress("2001:db8::1")).toBe("2001:db8:0:0::/64");
    expect(normaliseAddress("2001:db8::ffff")).toBe(normaliseAddress("2001:0db8:0000:0000:0000:0000:0000:0001"));
  });

  it("drops brackets and a zone index", () => {
    expect(normaliseAddress("[fe80::1%eth0]")).toBe("fe80:0:0:0::/64");
  });
});
