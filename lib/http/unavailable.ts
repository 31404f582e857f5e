// Which backing service an error says is out of reach: the database or the object store. Such a
// failure is not the caller's fault nor a bug, so it answers 503 with a plain message, not 500.
// Pure (no framework imports): errors are recognised by their codes and names alone.

export type UnavailableService = "database" | "object-store";

// Network errors a socket raises when the other side is down, restarting or too slow.
const NETWORK_CODES = new Set([
  "ECONNREFUSED",
  "ECONNRESET",
  "ETIMEDOUT",
  "EPIPE",
  "EHOSTUNREACH",
  "ENETUNREACH",
  "EAI_AGAIN",
  "ENOTFOUND",
]);
// PostgreSQL SQLSTATEs: class 08 connection exceptions; 57P01-57P03 shutdown / starting up;
// 53300 too many connections; 57014 cancelled by the statement timeout.
const PG_CODES = /^(08...|57P0[123]|53300|57014)$/;
// What node-postgres throws when the server goes away or the pool waits too long.
const PG_MESSAGES =
  /Connection terminated|timeout exceeded when trying to connect|Client has encountered a connection error|Connection terminated due to connection timeout|Query read timeout/i;
// The AWS SDK's names for a request that never got an answer.
const S3_NAMES = new Set([
  "TimeoutError",
  "RequestTimeout",
  "RequestTimeoutException",
  "NetworkingError",
  "ServiceUnavailable",
  "SlowDown",
]);

type ErrorLike = {
  name?: unknown;
  code?: unknown;
  message?: unknown;
  cause?: unknown;
  errors?: unknown;
  $metadata?: unknown;
  $service?: unknown;
};

/** The error itself, then what it wraps (cause, AggregateError members), a few levels deep. */
function* chain(err: unknown, depth = 0): Generator<ErrorLike> {
  if (!err || typeof err !== "object" || depth > 5) return;
  const e = err as ErrorLike;
  yield e;
  yield* chain(e.cause, depth + 1);
  if (Array.isArray(e.errors)) for (const inner of e.errors) yield* chain(inner, depth + 1);
}

function isNetwork(e: ErrorLike): boolean {
  return typeof e.code === "string" && NETWORK_CODES.has(e.code);
}

/** Marks an object-store call, so a refused connection to the bucket is told apart from one to the database. */
export class ObjectStoreUnavailable extends Error {
  constructor(cause: unknown) {
    super("the object store did not answer", { cause });
    this.name = "ObjectStoreUnavailable";
  }
}

export function unavailableService(err: unknown): UnavailableService | null {
  for (const e of chain(err)) {
    if (e instanceof ObjectStoreUnavailable || e.name === "ObjectStoreUnavailable") return "object-store";
    if (typeof e.code === "string" && PG_CODES.test(e.code)) return "database";
    if (typeof e.message === "string" && PG_MESSAGES.test(e.message)) return "database";
  }
  // A bare socket error outside an object-store call comes from the database (the only other peer).
  for (const e of chain(err)) if (isNetwork(e)) return "database";
  return null;
}

/** Whether an error from the S3 client means the store is down or too slow (not a refusal by it). */
export function isObjectStoreOutage(err: unknown): boolean {
  for (const e of chain(err)) {
    if (isNetwork(e)) return true;
    if (typeof e.name === "string" && S3_NAMES.has(e.name)) return true;
    const status = (e.$metadata as { httpStatusCode?: number } | undefined)?.httpStatusCode;
    if (status === 502 || status === 503 || status === 504) return true;
  }
  return false;
}

export const UNAVAILABLE_MESSAGES: Record<UnavailableService, string> = {
  database:
    "Tearline cannot reach its database right now, so nothing was saved or changed. Try again in a minute; if it keeps happening, tell your administrator.",
  "object-store":
    "Tearline cannot reach its photo store right now, so the photo was not added and nothing was changed. Try again in a minute; if it keeps happening, tell your administrator.",
};
