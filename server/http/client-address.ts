import "server-only";
import { env } from "@/server/env";
import { PEER_HEADER } from "./front-door";

/** "::ffff:127.0.0.1" (an IPv4 peer of a dual-stack socket) is 127.0.0.1. */
function normalise(address: string | null | undefined): string {
  return (address ?? "").trim().replace(/^::ffff:(?=\d+\.\d+\.\d+\.\d+$)/i, "");
}

/**
 * Who sent the request: the socket's peer, unless that peer is a configured trusted proxy,
 * in which case the proxy's X-Forwarded-For says who its client was. Proxies append, so the
 * right-most entry that is not one of our proxies is the first address nobody could forge.
 */
export function resolveClientAddress({ peer, forwardedFor, trusted }: { peer: string | null; forwardedFor: string | null; trusted: readonly string[] }): string {
  const socket = normalise(peer);
  if (!socket) return "unknown";
  if (!trusted.includes(socket)) return socket;
  const hops = (forwardedFor ?? "").split(",").map(normalise).filter(Boolean);
  for (let i = hops.length - 1; i >= 0; i -= 1) {
    const hop = hops[i];
    if (hop && !trusted.includes(hop)) return hop;
  }
  return socket;
}

/** True when the request came through a proxy we were told to trust (TRUSTED_PROXY). */
export function fromTrustedProxy(request: Request): boolean {
  const peer = normalise(request.headers.get(PEER_HEADER));
  return peer !== "" && env().TRUSTED_PROXY.includes(peer);
}

export function clientAddress(request: Request): string {
  return resolveClientAddress({
    peer: request.headers.get(PEER_HEADER),
    forwardedFor: request.headers.get("x-forwarded-for"),
    trusted: env().TRUSTED_PROXY,
  });
}
