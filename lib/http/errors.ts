// Typed errors that route handlers turn into JSON responses with the right status.
export class HttpError extends Error {
  constructor(
    public status: number,
    public code: string,
    message: string,
    public details?: unknown,
  ) {
    super(message);
  }
}

export const badRequest = (message: string, details?: unknown) => new HttpError(400, "bad-request", message, details);
export const notFound = (what = "That record") => new HttpError(404, "not-found", `${what} was not found.`);
export const conflict = (message: string, details?: unknown) => new HttpError(409, "conflict", message, details);
export const forbidden = (message = "Your role does not allow this.") => new HttpError(403, "forbidden", message);
