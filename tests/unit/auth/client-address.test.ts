import { describe, expect, it } from "vitest";
import { addressFromTrustedHeader, normaliseAddress, parseTrustedProxyHeader, resolveClientAddress } from "@/lib/auth/client-address";

// Addresses from the documentation ranges of RFC 5737 (IPv4) and RFC 3849 (IPv6).

describe("normaliseAddress", () => {
  it("keeps IPv4, unwraps IPv4-mapped IPv6 and drops ports", () => {
    expect(normaliseAddress("192.0.2.7")).toBe("192.0.2.7");
    expect(normaliseAddress("::ffff:192.0.2.7")).toBe("192.0.2.7");
    expect(normaliseAddress("::FFFF:c000:0207")).toBe("192.0.2.7");
    expect(normaliseAddress("192.0.2.7:5123")).toBe("192.0.2.7");
    expect(normaliseAddress(" [2001:db8::1]:443 ")).toBe("2001:db8:0:0::");
  });

  it("keys IPv6 by its /64, so one host cannot take a new key per attempt", () => {
    expect(normaliseAddress("2001:db8:aa:bb::1")).toBe("2001:db8:aa:bb::");
    expect(normaliseAddress("2001:db8:aa:bb:ffff:1:2:3")).toBe("2001:db8:aa:bb::");
    expect(normaliseAddress("2001:db8:aa:bc::1")).not.toBe(normaliseAddress("2001:db8:aa:bb::1"));
    expect(normaliseAddress("::1")).toBe("0:0:0:0::");
  });

  it("refuses what is not one address", () => {
    for (const raw of ["", "unknown", "192.0.2.7, 198.51.100.2", "999.0.0.1", "2001:db8::/64", "example.test"]) {
      expect(normaliseAddress(raw), raw).toBeNull();
    }
  });
});

describe("addressFromTrustedHeader", () => {
  it("takes the right-most x-forwarded-for entry: the one the trusted proxy appended", () => {
    expect(addressFromTrustedHeader("x-forwarded-for", "203.0.113.9")).toBe("203.0.113.9");
    // What a client wrote before the proxy's entry proves nothing and does not matter.
    expect(addressFromTrustedHeader("x-forwarded-for", "198.51.100.1, 203.0.113.9")).toBe("203.0.113.9");
    expect(addressFromTrustedHeader("x-forwarded-for", "not-an-ip, 203.0.113.9")).toBe("203.0.113.9");
    expect(addressFromTrustedHeader("x-forwarded-for", "203.0.113.9, garbage")).toBeNull();
    expect(addressFromTrustedHeader("x-forwarded-for", undefined)).toBeNull();
  });

  it("wants exactly one address in any other header", () => {
    expect(addressFromTrustedHeader("x-real-ip", "203.0.113.9")).toBe("203.0.113.9");
    expect(addressFromTrustedHeader("x-real-ip", "198.51.100.1, 203.0.113.9")).toBeNull();
  });
});

describe("resolveClientAddress", () => {
  const socketAddress = "::ffff:10.0.0.2";

  it("without a trusted header uses the connection, whatever the client wrote", () => {
    const headers = { "x-forwarded-for": "198.51.100.77", "x-real-ip": "198.51.100.78" };
    expect(resolveClientAddress({ trustedHeader: null, headers, socketAddress })).toBe("10.0.0.2");
  });

  it("with a trusted header tells two clients apart even when both send two entries", () => {
    const a = resolveClientAddress({
      trustedHeader: "x-forwarded-for",
      headers: { "x-forwarded-for": "1.1.1.1, 203.0.113.10" },
      socketAddress,
    });
    const b = resolveClientAddress({
      trustedHeader: "x-forwarded-for",
      headers: { "x-forwarded-for": "1.1.1.1, 203.0.113.11" },
      socketAddress,
    });
    expect(a).toBe("203.0.113.10");
    expect(b).toBe("203.0.113.11");
  });

  it("with a trusted header, falls back to the connection when the header is missing or unusable", () => {
    expect(resolveClientAddress({ trustedHeader: "x-real-ip", headers: {}, socketAddress })).toBe("10.0.0.2");
    expect(resolveClientAddress({ trustedHeader: "x-real-ip", headers: { "x-real-ip": "nonsense" }, socketAddress })).toBe("10.0.0.2");
    expect(resolveClientAddress({ trustedHeader: "x-real-ip", headers: {}, socketAddress: undefined })).toBeNull();
  });

  it("joins a header sent twice, as Node hands it over", () => {
    const headers = { "x-forwarded-for": ["198.51.100.1", "203.0.113.12"] };
    expect(resolveClientAddress({ trustedHeader: "x-forwarded-for", headers, socketAddress })).toBe("203.0.113.12");
  });
});

describe("parseTrustedProxyHeader", () => {
  it("reads a header name and refuses anything else", () => {
    expect(parseTrustedProxyHeader(undefined)).toBeNull();
    expect(parseTrustedProxyHeader("  ")).toBeNull();
    expect(parseTrustedProxyHeader(" X-Forwarded-For ")).toBe("x-forwarded-for");
    expect(() => parseTrustedProxyHeader("x-forwarded-for: 1.2.3.4")).toThrow(/not a header name/);
  });
});
