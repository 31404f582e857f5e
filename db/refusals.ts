// What a write in db/ refuses inside its transaction (throwing rolls it back): the row it needs is
// gone, or the data changed under it. Plain errors with no HTTP in them; the route layer says them
// as 404 and 409 (lib/http/handler.ts, errorResponse).

/** The row a write needs does not exist (or no longer does). */
export class RowMissing extends Error {
  constructor(public what: string) {
    super(`${what} was not found.`);
    this.name = "RowMissing";
  }
}

/** The write would contradict the data as it now stands: a newer version, a signed case, a duplicate. */
export class WriteRefused extends Error {
  constructor(
    message: string,
    public details?: unknown,
  ) {
    super(message);
    this.name = "WriteRefused";
  }
}
