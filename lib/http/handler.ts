// Wraps a route handler so none can forget the role check, input validation or error shape.
import "server-only";
import { NextResponse, type NextRequest } from "next/server";
import { z, type ZodType } from "@/lib/validation/zod";
import { requireApiUser, type CurrentUser } from "@/lib/auth/session";
import type { Permission } from "@/lib/auth/permissions";
import { JSON_MAX_BYTES, readTextLimited } from "./body";
import { RowMissing, WriteRefused } from "@/db/refusals";
import { HttpError } from "./errors";
import { UNAVAILABLE_MESSAGES, unavailableService } from "./unavailable";
import { checkBodyType, requestHasBody } from "@/lib/security/request-rules";

type Ctx<P> = { req: NextRequest; user: CurrentUser; params: P };

export function zodMessage(error: z.ZodError): { message: string; fields: Record<string, string> } {
  const fields: Record<string, string> = {};
  for (const issue of error.issues) {
    const key = issue.path.join(".") || "_";
    fields[key] ??= issue.message;
  }
  // The words of the form only: internal field names stay in `fields` for the screen to place the message.
  const first = error.issues[0]?.message ?? "Some of what was entered is not valid.";
  const more = Object.keys(fields).length - 1;
  return { message: more > 0 ? `${first} (and ${more} more to fix)` : first, fields };
}

export function errorResponse(err: unknown): NextResponse {
  if (err instanceof HttpError) {
    return NextResponse.json({ error: err.message, code: err.code, details: err.details }, { status: err.status });
  }
  if (err instanceof RowMissing) return NextResponse.json({ error: err.message, code: "not-found" }, { status: 404 });
  if (err instanceof WriteRefused)
    return NextResponse.json({ error: err.message, code: "conflict", details: err.details }, { status: 409 });
  if (err instanceof z.ZodError) {
    const { message, fields } = zodMessage(err);
    return NextResponse.json({ error: message, code: "bad-request", fields }, { status: 400 });
  }
  const service = unavailableService(err);
  if (service) {
    // Expected during an outage or restart: one line in the log, a plain 503 to the caller.
    console.error(`${service} unavailable: ${err instanceof Error ? err.message : String(err)}`);
    return NextResponse.json(
      { error: UNAVAILABLE_MESSAGES[service], code: "unavailable", service },
      { status: 503, headers: { "retry-after": "30" } },
    );
  }
  console.error(err);
  return NextResponse.json({ error: "Something went wrong on the server; nothing was changed.", code: "internal" }, { status: 500 });
}

export async function parseJson<T>(req: NextRequest, schema: ZodType<T>): Promise<T> {
  const text = await readTextLimited(req, JSON_MAX_BYTES);
  let body: unknown;
  try {
    body = JSON.parse(text);
  } catch {
    throw new HttpError(400, "bad-request", "The request body must be JSON.");
  }
  return schema.parse(body);
}

export function parseQuery<T>(req: NextRequest, schema: ZodType<T>): T {
  return schema.parse(Object.fromEntries(req.nextUrl.searchParams.entries()));
}

export function withRole<P = Record<string, string>>(permission: Permission | null, handler: (ctx: Ctx<P>) => Promise<Response>) {
  return async (req: NextRequest, route: { params: Promise<P> }): Promise<Response> => {
    try {
      const user = await requireApiUser(permission ?? undefined);
      const refusal = checkBodyType(req.method, req.nextUrl.pathname, req.headers.get("content-type"), requestHasBody(req.headers));
      if (refusal) throw new HttpError(refusal.status, refusal.code, refusal.message);
      const params = route?.params ? await route.params : ({} as P);
      return await handler({ req, user, params });
    } catch (err) {
      return errorResponse(err);
    }
  };
}
