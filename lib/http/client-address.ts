import { BlockList, isIP } from "node:net";

// Who is calling, for per-address limits and the audit log. Next.js passes a client's own
// X-Forwarded-For through untouched (it only fills the header in when absent), so that header
// is whatever the caller chose to write. Instead, ./client-address-hook.ts stamps every
// incoming request with CLIENT_ADDRESS_HEADER, worked out here from the connection's peer
// address: the peer itself, unless the peer is a configured proxy (TRUSTED_PROXIES), in which
// case X-Forwarded-For is walked from the right past trusted proxies to the first address
// that is not one (the usual rule: only hops we trust may add to the chain).

export const CLIENT_ADDRESS_HEADER = "x-loopwright-client-address";

const MAX_HOPS = 20;

/** "10.0.0.0/8, 192.168.1.5, ::1" → a BlockList; throws naming the entry it cannot read. */
export function parseTrustedProxies(text: string): BlockList {
  const list = new BlockList();
  for (const entry of text.split(/[\s,]+/).filter(Boolean)) {
    const [addr = "", bits] = entry.split("/");
    const family = isIP(addr);
    const prefix = bits === undefined ? null : Number(bits);
    const max = family === 6 ? 128 : 32;
    if (!family || (prefix !== null && !(Number.isInteger(prefix) && prefix >= 0 && prefix <= max))) {
      throw new Error(`TRUSTED_PROXIES: "${entry}" is not an IP address or CIDR range (e.g. 10.0.0.2 or 10.0.0.0/8).`);
    }
    const type = family === 6 ? "ipv6" : "ipv4";
    if (prefix === null) list.addAddress(addr, type);
    else list.addSubnet(addr, prefix, type);
  }
  return list;
}

/** "::ffff:10.1.2.3" → "10.1.2.3"; null when not an IP address. */
export function normaliseAddress(raw: string | null | undefined): string | null {
  const a = (raw ?? "").trim().replace(/^::ffff:(?=\d+\.\d+\.\d+\.\d+$)/i, "");
  return isIP(a) ? a : null;
}

function trusted(list: BlockList, addr: string): boolean {
  return list.check(addr, isIP(addr) === 6 ? "ipv6" : "ipv4");
}

export function resolveClientAddress(o: { peer: string | null | undefined; forwardedFor: string | string[] | null | undefined; trusted: BlockList }): string | null {
  let current = normaliseAddress(o.peer);
  if (!current) return null;
  const xff = Array.isArray(o.forwardedFor) ? o.forwardedFor.join(",") : o.forwardedFor ?? "";
  const hops = xff.split(",").map((s) => s.trim()).filter(Boolean).slice(-MAX_HOPS).reverse();
  for (const hop of hops) {
    if (!trusted(o.trusted, current)) return current;
    const next = normaliseAddress(hop);
    if (!next) return current; // a trusted proxy wrote something that is not an address: stop at it
    current = next;
  }
  return current;
}

/** The stamped client address of a request (null outside a server, or when unknown). */
export function clientAddressFrom(headers: Headers): string | null {
  return normaliseAddress(headers.get(CLIENT_ADDRESS_HEADER));
}
