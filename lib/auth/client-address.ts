import { isIP } from "node:net";

// Which address a sign-in attempt comes from, for the per-address throttle.
// Pure (headers and the connection's address in, key out) so the rules are
// unit-tested; lib/auth/peer-stamp.ts supplies the connection's address.

/** Set on every request from the TCP socket (with a per-process secret); a client's value is overwritten. */
export const PEER_HEADER = "x-tauline-peer";

type HeaderBag = Record<string, string | string[] | undefined>;

function headerValue(headers: HeaderBag, name: string): string | undefined {
  const value = headers[name];
  return Array.isArray(value) ? value.join(",") : value;
}

/**
 * The throttle key for the caller's address. Without a trusted proxy it is the
 * connection's address: X-Forwarded-For is written by whoever sends the
 * request, so trusting it would let an attacker pick a fresh address for every
 * guess. With TRUST_PROXY=1 (exactly one reverse proxy in front, which appends
 * the address it saw) it is the last X-Forwarded-For entry. IPv6 addresses are
 * keyed by their /64, the block one host usually gets (common practice).
 * `peer` is the connection's address as stamped, undefined when unknown.
 */
export function pickClientAddress(headers: HeaderBag, { trustProxy, peer }: { trustProxy: boolean; peer: string | undefined }): string {
  const forwarded = (headerValue(headers, "x-forwarded-for") ?? "")
    .split(",")
    .map((part) => part.trim())
    .filter(Boolean);
  // Without the peer (the stamp is installed at start-up) Next.js itself fills
  // X-Forwarded-For with the socket address, unless the client sent one.
  const raw = trustProxy ? (forwarded.at(-1) ?? peer) : (peer ?? forwarded[0]);
  return normaliseAddress(raw);
}

export function normaliseAddress(raw: string | undefined): string {
  if (!raw) return "unknown";
  const bare = raw.replace(/^\[|\]$/g, "").replace(/%.*$/, "");
  const mapped = /^::ffff:(\d+\.\d+\.\d+\.\d+)$/i.exec(bare);
  if (mapped) return mapped[1];
  const family = isIP(bare);
  if (family === 4) return bare;
  if (family === 6) return `${expandIpv6(bare).slice(0, 4).join(":")}::/64`;
  return "unknown";
}

/** The eight 16-bit groups of a valid IPv6 address, "::" filled in. */
function expandIpv6(address: string): string[] {
  const [head, tail] = address.includes("::") ? address.split("::") : [address, undefined];
  const left = head ? head.split(":") : [];
  const right = tail ? tail.split(":") : [];
  const fill = tail === undefined ? [] : Array<string>(8 - left.length - right.length).fill("0");
  return [...left, ...fill, ...right].map((group) => group.toLowerCase().replace(/^0+(?=.)/, ""));
}
