// People with accounts as admins keep them: the list (with sign-in lockouts), role and home-site
// changes, suspension and restoration, and lifting a lockout. A change that would leave no
// administrator is refused inside the transaction that makes it.
import "server-only";
import { LastAdminError, setRoleIn, suspendIn, withAdminsLocked } from "@/db/queries/admin-guard";
import { clearCounter, lockedAccountKeys } from "@/db/queries/sign-in-failures";
import { getUserById, listUsers, setUserSite } from "@/db/queries/users";
import { auth } from "@/lib/auth/auth";
import type { Role } from "@/lib/auth/permissions";
import type { CurrentUser } from "@/lib/auth/session";
import { badRequest, HttpError, notFound } from "@/lib/http/errors";
import { audit } from "@/lib/security/audit";
import { accountKey } from "@/lib/security/sign-in-rules";

const LAST_ADMIN = "This is the last administrator; make someone else an administrator first.";

/** Everyone with an account, each marked locked while repeated failed sign-ins hold it. */
export async function listPeople() {
  const [people, lockedKeys] = await Promise.all([listUsers(), lockedAccountKeys()]);
  const locked = new Set(lockedKeys);
  return people.map((p) => ({ ...p, locked: locked.has(accountKey(p.email)) }));
}

async function target(id: string) {
  const row = await getUserById(id);
  if (!row) throw notFound("That user");
  return row;
}

export async function changePerson(id: string, body: { role?: Role; siteId?: string | null }, user: CurrentUser, headers: Headers) {
  const person = await target(id);
  if (person.id === user.id && body.role && body.role !== "admin") {
    throw badRequest("You cannot take away your own admin role; ask another admin.");
  }
  if (body.role && body.role !== person.role) {
    const role = body.role;
    try {
      await withAdminsLocked(person.id, role !== "admin", async (tx) => {
        await setRoleIn(tx, person.id, role);
        await audit("role-change", user, { subject: person.email, headers, detail: { from: person.role, to: role }, tx });
      });
    } catch (err) {
      if (err instanceof LastAdminError) throw new HttpError(409, "last-admin", LAST_ADMIN);
      throw err;
    }
  }
  if (body.siteId !== undefined && body.siteId !== person.siteId) {
    await setUserSite(person.id, body.siteId);
    await audit("site-change", user, { subject: person.email, headers, detail: { from: person.siteId, to: body.siteId } });
  }
  return getUserById(person.id);
}

/** Marked banned and signed out in the same transaction that checks another admin remains. */
export async function suspendPerson(id: string, reason: string | undefined, user: CurrentUser, headers: Headers) {
  const person = await target(id);
  if (person.id === user.id) throw badRequest("You cannot suspend your own account; ask another admin.");
  try {
    await withAdminsLocked(person.id, true, async (tx) => {
      await suspendIn(tx, person.id, reason || "Suspended by an administrator");
      await audit("suspension", user, { subject: person.email, headers, detail: reason ? { reason } : {}, tx });
    });
  } catch (err) {
    if (err instanceof LastAdminError) throw new HttpError(409, "last-admin", LAST_ADMIN);
    throw err;
  }
  return person;
}

export async function restorePerson(id: string, user: CurrentUser, headers: Headers) {
  const person = await target(id);
  await auth.api.unbanUser({ body: { userId: person.id }, headers });
  await audit("restoration", user, { subject: person.email, headers });
  return person;
}

/** Lifts a sign-in lockout after repeated failures. */
export async function unlockPerson(id: string, user: CurrentUser, headers: Headers) {
  const person = await target(id);
  await clearCounter(accountKey(person.email));
  await audit("account-unlocked", user, { subject: person.email, headers });
  return person;
}
