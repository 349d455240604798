import "server-only";
import { randomBytes } from "node:crypto";
import { subscribe } from "node:diagnostics_channel";
import type { IncomingMessage } from "node:http";
import type { Socket } from "node:net";
import { CLIENT_ADDRESS_HEADER, parseTrustedProxyHeader, resolveClientAddress } from "./client-address";

// Under `next start` a route handler sees only headers: Next copies the socket's address into
// x-forwarded-for only when the request has none (`??=` in next/dist/server/base-server.js), so a
// client that sends the header hides its own address, and the handler cannot tell which it got.
// Node announces every request on the "http.server.request.start" channel, with its socket,
// before the server's request listener (Next) runs; here we write the resolved address into a
// header of our own, replacing whatever the client sent under that name.

const PROOF_HEADER = `${CLIENT_ADDRESS_HEADER}-proof`;
const globalForProof = globalThis as unknown as { trimrailClientAddressProof?: string };

interface RequestStart {
  request: IncomingMessage;
  socket: Socket;
}

/** Starts resolving every request's client address; once per server process (instrumentation.ts). */
export function startClientAddressHook(): void {
  if (globalForProof.trimrailClientAddressProof) return;
  const trustedHeader = parseTrustedProxyHeader(process.env.TRIMRAIL_TRUSTED_PROXY_HEADER);
  // A per-process secret: a request that reached the handlers without passing the hook (one that
  // arrived while the server was still starting) cannot carry it, so its header is not believed.
  const proof = randomBytes(16).toString("hex");
  subscribe("http.server.request.start", (message) => {
    const { request, socket } = message as RequestStart;
    const address = resolveClientAddress({ trustedHeader, headers: request.headers, socketAddress: socket.remoteAddress });
    if (address) request.headers[CLIENT_ADDRESS_HEADER] = address;
    else delete request.headers[CLIENT_ADDRESS_HEADER];
    request.headers[PROOF_HEADER] = proof;
  });
  globalForProof.trimrailClientAddressProof = proof;
}

/** The client address the hook resolved for this request; null if the hook did not see it. */
export function clientAddressOf(headers: Headers): string | null {
  const proof = globalForProof.trimrailClientAddressProof;
  if (!proof || headers.get(PROOF_HEADER) !== proof) return null;
  return headers.get(CLIENT_ADDRESS_HEADER);
}
