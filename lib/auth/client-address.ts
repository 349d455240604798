import { isIPv4, isIPv6 } from "node:net";

// Which address a request comes from, for the sign-in limit and better-auth's limiter. Pure: the
// server's hook (client-address-hook.ts) feeds it the request's headers and its socket's address.

/** The request header that carries the resolved address from the hook to the route handlers. */
export const CLIENT_ADDRESS_HEADER = "x-trimrail-client-address";

const HEADER_NAME = /^[a-z0-9-]+$/;

/**
 * The header a trusted reverse proxy sets, from `TRIMRAIL_TRUSTED_PROXY_HEADER`; null when unset.
 * Only set it when every request reaches the app through that proxy: a client that can reach the
 * app directly could write the header itself.
 */
export function parseTrustedProxyHeader(value: string | undefined): string | null {
  const name = (value ?? "").trim().toLowerCase();
  if (!name) return null;
  if (!HEADER_NAME.test(name)) throw new Error(`TRIMRAIL_TRUSTED_PROXY_HEADER is not a header name: ${JSON.stringify(value)}`);
  return name;
}

/** "[2001:db8::1]:443" and "192.0.2.7:5123" (a port some proxies add) lose the port. */
function withoutPort(entry: string): string {
  const bracketed = /^\[([^\]]+)\](?::\d+)?$/.exec(entry);
  if (bracketed) return bracketed[1];
  const v4WithPort = /^(\d{1,3}(?:\.\d{1,3}){3}):\d+$/.exec(entry);
  return v4WithPort ? v4WithPort[1] : entry;
}

function expandIPv6(address: string): number[] {
  const [head, tail] = address.includes("::") ? address.split("::") : [address, undefined];
  const groups = (part: string | undefined) => (part ? part.split(":") : []);
  const left = groups(head);
  const right = groups(tail);
  // An embedded IPv4 tail (::ffff:192.0.2.1) is two groups.
  const toGroups = (list: string[]) =>
    list.flatMap((g) =>
      g.includes(".") ? ((o) => [(o[0] << 8) | o[1], (o[2] << 8) | o[3]])(g.split(".").map(Number)) : [parseInt(g, 16)],
    );
  const l = toGroups(left);
  const r = toGroups(right);
  return tail === undefined ? l : [...l, ...new Array<number>(8 - l.length - r.length).fill(0), ...r];
}

/**
 * One key per client: IPv4 as written, an IPv4-mapped IPv6 address as its IPv4, and any other IPv6
 * address as its /64 network (written as that network's first address, "2001:db8:1:2::"), since
 * one host is usually handed a whole /64 and could otherwise take a new address per attempt
 * (RFC 4291 §2.5.4, RFC 7421). Null when `raw` is not an address.
 */
export function normaliseAddress(raw: string): string | null {
  const entry = withoutPort(raw.trim());
  if (isIPv4(entry)) return entry;
  if (!isIPv6(entry)) return null;
  const groups = expandIPv6(entry.split("%")[0].toLowerCase());
  const mapped = groups.slice(0, 5).every((g) => g === 0) && groups[5] === 0xffff;
  if (mapped) return [groups[6] >> 8, groups[6] & 255, groups[7] >> 8, groups[7] & 255].join(".");
  return `${groups
    .slice(0, 4)
    .map((g) => g.toString(16))
    .join(":")}::`;
}

/**
 * The client's address as the trusted proxy reported it. In `x-forwarded-for` each proxy appends
 * the address it received the request from, so only the right-most entry is our proxy's word;
 * everything left of it came from the client and proves nothing. Any other header (`x-real-ip`)
 * must hold exactly one address. Null when the header is missing or holds no usable address.
 */
export function addressFromTrustedHeader(headerName: string, value: string | undefined): string | null {
  const entries = (value ?? "")
    .split(",")
    .map((e) => e.trim())
    .filter(Boolean);
  const entry = headerName === "x-forwarded-for" ? entries.at(-1) : entries.length === 1 ? entries[0] : undefined;
  return entry ? normaliseAddress(entry) : null;
}

type RawHeaders = Record<string, string | string[] | undefined>;

/**
 * The client's address: from the trusted proxy's header when one is configured and present,
 * otherwise the address of the connection itself (then the direct peer is the client). Null only
 * when neither is known.
 */
export function resolveClientAddress({
  trustedHeader,
  headers,
  socketAddress,
}: {
  trustedHeader: string | null;
  headers: RawHeaders;
  socketAddress: string | undefined;
}): string | null {
  if (trustedHeader) {
    const raw = headers[trustedHeader];
    const fromProxy = addressFromTrustedHeader(trustedHeader, Array.isArray(raw) ? raw.join(",") : raw);
    if (fromProxy) return fromProxy;
  }
  return socketAddress ? normaliseAddress(socketAddress) : null;
}
