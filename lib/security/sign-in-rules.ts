// Sign-in limits as plain rules: failures count, good sign-ins never do.
export const SIGN_IN_LIMITS = {
  /** Failed sign-ins from one address before that address must wait (per window). */
  addressFailures: Number(process.env.TEARLINE_SIGNIN_ADDRESS_FAILURES ?? 5),
  addressWindowSeconds: 60,
  /** Failed sign-ins on one account (from anywhere) before it is locked. */
  accountFailures: Number(process.env.TEARLINE_SIGNIN_ACCOUNT_FAILURES ?? 5),
  accountWindowSeconds: 15 * 60,
  lockMinutes: 15,
};

export type Counter = { failures: number; windowStart: Date; lockedUntil: Date | null };

export function minutesLeft(until: Date, now: Date): number {
  return Math.max(1, Math.ceil((until.getTime() - now.getTime()) / 60_000));
}

/** When the address may try again, or null if it may now. */
export function addressBlockedUntil(c: Counter | null, now: Date): Date | null {
  if (!c) return null;
  const end = new Date(c.windowStart.getTime() + SIGN_IN_LIMITS.addressWindowSeconds * 1000);
  return end > now && c.failures >= SIGN_IN_LIMITS.addressFailures ? end : null;
}

export function accountLockedUntil(c: Counter | null, now: Date): Date | null {
  return c?.lockedUntil && c.lockedUntil > now ? c.lockedUntil : null;
}

export function addressKey(address: string) {
  return `address:${address}`;
}
export function accountKey(email: string) {
  return `account:${email.trim().toLowerCase()}`;
}
