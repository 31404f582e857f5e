// A person of our own for account tests, so no test changes the demo people others rely on.
import { randomUUID } from "node:crypto";
import { hashPassword } from "better-auth/crypto";
import { eq } from "drizzle-orm";
import { ApiClient, type DemoRole } from "../../support/api";
import { db, t } from "../../support/db";

export type FreshPerson = { id: string; name: string; email: string; password: string; client: ApiClient };

export const uniqueEmail = (prefix: string) => `${prefix}-${randomUUID().slice(0, 8)}@sable-river.example`;

/** Creates a person with a password straight in the database, then signs them in over HTTP. */
export async function freshPerson(role: DemoRole, name = "Ines Varga"): Promise<FreshPerson> {
  const id = randomUUID();
  const email = uniqueEmail(role);
  const password = `pw-${randomUUID()}`;
  await db.insert(t.user).values({ id, name, email, emailVerified: true, role });
  await db
    .insert(t.account)
    .values({ id: randomUUID(), accountId: id, providerId: "credential", userId: id, password: await hashPassword(password) });
  const client = await new ApiClient(email).signIn(email, password);
  return { id, name, email, password, client };
}

export async function roleOf(id: string): Promise<string | undefined> {
  const [row] = await db.select({ role: t.user.role }).from(t.user).where(eq(t.user.id, id));
  return row?.role;
}
