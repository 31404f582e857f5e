import "server-only";
import { and, eq, or, isNull } from "drizzle-orm";
import { db, type Tx } from "@/db";
import { session, user } from "@/db/schema";

export class LastAdminError extends Error {}

/**
 * Runs a change to a person's role or suspension with every active admin row locked, so two
 * admins demoting each other at once are settled one after the other and one admin always remains.
 */
export async function withAdminsLocked<T>(targetId: string, removesAdmin: boolean, change: (tx: Tx) => Promise<T>): Promise<T> {
  return db.transaction(async (tx) => {
    const admins = await tx
      .select({ id: user.id })
      .from(user)
      .where(and(eq(user.role, "admin"), or(isNull(user.banned), eq(user.banned, false))))
      .for("update");
    if (removesAdmin && admins.some((a) => a.id === targetId) && admins.length <= 1) throw new LastAdminError();
    return change(tx);
  });
}

export async function setRoleIn(tx: Tx, id: string, role: string) {
  await tx.update(user).set({ role, updatedAt: new Date() }).where(eq(user.id, id));
}

/** Suspends in the same transaction as the check, and ends every session of the account. */
export async function suspendIn(tx: Tx, id: string, reason: string) {
  await tx.update(user).set({ banned: true, banReason: reason, updatedAt: new Date() }).where(eq(user.id, id));
  await tx.delete(session).where(eq(session.userId, id));
}
