// Requests from a chosen loopback address (127.0.0.0/8 all reach the app), so a test can be
// "another client" by its socket address rather than by a header the server should ignore.
import http from "node:http";
import { APP_URL } from "./env";

export type RawAnswer = { status: number; headers: http.IncomingHttpHeaders; body: string; json: Record<string, unknown> };

export function requestFrom(
  localAddress: string,
  method: string,
  path: string,
  body?: unknown,
  headers: Record<string, string> = {},
): Promise<RawAnswer> {
  const url = new URL(path, APP_URL);
  const payload = body === undefined ? undefined : JSON.stringify(body);
  return new Promise((resolve, reject) => {
    const req = http.request(
      {
        host: url.hostname,
        port: url.port,
        path: url.pathname + url.search,
        method,
        localAddress,
        headers: {
          origin: APP_URL,
          ...(payload ? { "content-type": "application/json", "content-length": Buffer.byteLength(payload) } : {}),
          ...headers,
        },
      },
      (res) => {
        const parts: Buffer[] = [];
        res.on("data", (c: Buffer) => parts.push(c));
        res.on("end", () => {
          const text = Buffer.concat(parts).toString("utf8");
          let json: Record<string, unknown> = {};
          try {
            json = JSON.parse(text);
          } catch {
            /* not JSON */
          }
          resolve({ status: res.statusCode ?? 0, headers: res.headers, body: text, json });
        });
      },
    );
    req.on("error", reject);
    if (payload) req.write(payload);
    req.end();
  });
}

/** A loopback address no other test uses (127.0.<block>.<n>). */
export function loopback(block: number, n: number) {
  return `127.0.${block}.${n}`;
}

export const signInFrom = (address: string, email: string, password: string, headers: Record<string, string> = {}) =>
  requestFrom(address, "POST", "/api/auth/sign-in/email", { email, password }, headers);
