import { randomBytes } from "node:crypto";
import http from "node:http";
import { PEER_HEADER } from "./client-address";

// Next.js gives route handlers no access to the TCP socket: the only address
// it passes on is X-Forwarded-For, which it fills from the socket only when
// the client did not send one (so a client can choose it). The per-address
// sign-in throttle needs the real one, so every incoming request is stamped
// with its socket's address before Next.js sees it. The stamp carries a random
// value made at start-up, so a header of the same name sent by a client (or
// arriving before the stamp was installed) is never taken for it.
// Installed from instrumentation.ts, which Next runs before serving, and again
// (a no-op then) when lib/auth/options.ts loads.

interface StampState {
  nonce: string;
}
const globalForStamp = globalThis as unknown as { __taulinePeerStamp?: StampState };

export function installPeerStamp(): void {
  if (globalForStamp.__taulinePeerStamp) return;
  const state: StampState = { nonce: randomBytes(16).toString("hex") };
  globalForStamp.__taulinePeerStamp = state;
  const proto = http.Server.prototype;
  const emit = proto.emit;
  proto.emit = function stampThenEmit(this: http.Server, event: string | symbol, ...args: unknown[]) {
    if (event === "request") {
      const request = args[0] as http.IncomingMessage;
      request.headers[PEER_HEADER] = `${state.nonce} ${request.socket?.remoteAddress ?? ""}`;
    }
    return Reflect.apply(emit, this, [event, ...args]) as boolean;
  } as typeof proto.emit;
}

/** The socket address stamped on this request, or undefined when the header is missing or not ours. */
export function readStampedPeer(value: string | undefined): string | undefined {
  const state = globalForStamp.__taulinePeerStamp;
  if (!state || !value) return undefined;
  const [nonce, address] = value.split(" ");
  return nonce === state.nonce && address ? address : undefined;
}
