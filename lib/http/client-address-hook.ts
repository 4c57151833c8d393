import http from "node:http";
import { config } from "@/lib/config";
import { CLIENT_ADDRESS_HEADER, parseTrustedProxies, resolveClientAddress } from "./client-address";

/**
 * Installed once per server process from instrumentation.ts: every request an http.Server
 * emits gets CLIENT_ADDRESS_HEADER set from its socket (any value the caller sent is
 * replaced), before Next.js or our code sees it.
 */
export function installClientAddressHook(): void {
  const g = globalThis as unknown as { __loopwrightClientAddressHook?: boolean };
  if (g.__loopwrightClientAddressHook) return;
  const trusted = parseTrustedProxies(config.trustedProxies);
  const emit = http.Server.prototype.emit;
  http.Server.prototype.emit = function (this: http.Server, event: string | symbol, ...args: unknown[]) {
    if (event === "request") {
      const req = args[0] as http.IncomingMessage;
      const address = resolveClientAddress({ peer: req.socket?.remoteAddress, forwardedFor: req.headers["x-forwarded-for"], trusted });
      if (address) req.headers[CLIENT_ADDRESS_HEADER] = address;
      else delete req.headers[CLIENT_ADDRESS_HEADER];
    }
    return emit.apply(this, [event, ...args] as Parameters<typeof emit>);
  } as typeof emit;
  g.__loopwrightClientAddressHook = true;
}
