import { isIP } from "node:net";
import { readEnv } from "@/lib/env/env";

/** The bucket of every request whose address cannot be trusted: they share one limit. */
export const UNKNOWN_CLIENT = "0.0.0.0";

/** The header the sign-in service reads the client address from; the auth route always overwrites it. */
export const CLIENT_ADDRESS_HEADER = "x-sidewise-client-address";

/**
 * TRUSTED_PROXY_HOPS: how many reverse proxies stand in front of the app, each appending the address
 * it saw to X-Forwarded-For (default 1). A bad value fails loudly rather than trusting the wrong entry.
 */
export function trustedProxyHops(source: Record<string, string | undefined> = process.env): number {
  return readEnv(source).TRUSTED_PROXY_HOPS;
}

function withoutPort(entry: string): string {
  const bracketed = /^\[([^\]]+)\](?::\d+)?$/.exec(entry);
  if (bracketed) return bracketed[1]!;
  const ipv4WithPort = /^(\d{1,3}(?:\.\d{1,3}){3}):\d+$/.exec(entry);
  return ipv4WithPort ? ipv4WithPort[1]! : entry;
}

function ipv6Groups(address: string): number[] {
  const [head = "", tail = ""] = address.includes("::") ? address.split("::") : [address, ""];
  const parse = (part: string) =>
    part === ""
      ? []
      : part.split(":").flatMap((group) => {
          if (!group.includes(".")) return [parseInt(group, 16)];
          const [a = 0, b = 0, c = 0, d = 0] = group.split(".").map(Number);
          return [(a << 8) | b, (c << 8) | d];
        });
  const front = parse(head);
  const back = parse(tail);
  return [...front, ...Array<number>(8 - front.length - back.length).fill(0), ...back];
}

/**
 * One bucket per client: an IPv4 address as it is, an IPv4-mapped IPv6 address as its IPv4
 * address, and any other IPv6 address as its /64 network, which one subscriber usually holds whole
 * (RFC 6177), so that rotating through it never makes a new client.
 */
function clientBucket(address: string): string {
  const version = isIP(address);
  if (version === 4) return address;
  if (version !== 6) return UNKNOWN_CLIENT;
  const groups = ipv6Groups(address.split("%")[0]!);
  if (groups.slice(0, 5).every((group) => group === 0) && groups[5] === 0xffff) {
    return [groups[6]! >> 8, groups[6]! & 255, groups[7]! >> 8, groups[7]! & 255].join(".");
  }
  return `${groups
    .slice(0, 4)
    .map((group) => group.toString(16))
    .join(":")}::`;
}

/**
 * The client's address, read the way reverse proxies are trusted: each of the `hops` proxies in
 * front appends the address it saw to X-Forwarded-For, so the entry `hops` places from the right is
 * the one the outermost proxy saw; everything left of it was written by the client and is ignored.
 * With no proxy (0), or fewer entries than proxies, nothing in the header can be told apart from
 * what a client wrote (Next.js only fills the header in when a request has none), so every such
 * request shares the one UNKNOWN_CLIENT bucket: a client can never choose its own.
 */
export function clientAddress(headers: Headers, hops = trustedProxyHops()): string {
  if (hops === 0) return UNKNOWN_CLIENT;
  const entries = (headers.get("x-forwarded-for") ?? "")
    .split(",")
    .map((entry) => entry.trim())
    .filter(Boolean);
  if (entries.length < hops) return UNKNOWN_CLIENT;
  return clientBucket(withoutPort(entries[entries.length - hops]!));
}
