// The one way server code learns who is asking: a per-request cached session plus guards.
import "server-only";
import { cache } from "react";
import { headers } from "next/headers";
import { redirect } from "next/navigation";
import { auth } from "./auth";
import { can, isRole, type Permission, type Role } from "./permissions";
import { HttpError } from "@/lib/http/errors";

export type CurrentUser = { id: string; name: string; email: string; role: Role; siteId: string | null };

export const getCurrentUser = cache(async (): Promise<CurrentUser | null> => {
  const session = await auth.api.getSession({ headers: await headers() });
  if (!session || session.user.banned) return null;
  const role = session.user.role;
  if (!isRole(role)) return null;
  const siteId = (session.user as { siteId?: string | null }).siteId ?? null;
  return { id: session.user.id, name: session.user.name, email: session.user.email, role, siteId };
});

/** For pages: sends anonymous visitors to sign-in and shows a refusal page for a missing permission. */
export async function requirePageUser(permission?: Permission): Promise<CurrentUser> {
  const user = await getCurrentUser();
  if (!user) redirect("/sign-in");
  if (permission && !can(user.role, permission)) redirect("/forbidden");
  return user;
}

/** For route handlers and server actions: throws 401/403 as typed errors. */
export async function requireApiUser(permission?: Permission): Promise<CurrentUser> {
  const user = await getCurrentUser();
  if (!user) throw new HttpError(401, "unauthorized", "Sign in first.");
  if (permission && !can(user.role, permission)) {
    throw new HttpError(403, "forbidden", "Your role does not allow this.");
  }
  return user;
}
