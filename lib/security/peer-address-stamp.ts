// Stamps each incoming HTTP request with the socket's address before Next.js sees it. Route handlers
// cannot reach the socket, and Next keeps a client's own X-Forwarded-For, so this is the one trustworthy source.
import http from "node:http";

const PEER_HEADER = "x-tearline-peer";
const marker = Symbol.for("tearline.peer-stamp");

export function stampPeerAddresses() {
  const proto = http.Server.prototype as unknown as Record<symbol, boolean> & { emit: (...a: unknown[]) => boolean };
  if (proto[marker]) return;
  proto[marker] = true;
  const emit = proto.emit;
  proto.emit = function (this: unknown, event: unknown, ...args: unknown[]) {
    if (event === "request") {
      const req = args[0] as http.IncomingMessage;
      req.headers[PEER_HEADER] = req.socket?.remoteAddress ?? "unknown";
    }
    return emit.call(this, event, ...args);
  };
}
