// Around better-auth's sign-in: refuse addresses and accounts over their failure limits, count only
// failures (a good sign-in never counts), and write every attempt to the audit log.
import "server-only";
import { NextResponse } from "next/server";
import { addFailure, clearCounter, readCounters } from "@/db/queries/sign-in-failures";
import { audit } from "./audit";
import { clientAddress } from "./client-address";
import { SIGN_IN_LIMITS, accountKey, accountLockedUntil, addressBlockedUntil, addressKey, minutesLeft } from "./sign-in-rules";

type Handler = (req: Request) => Promise<Response>;

async function emailOf(req: Request): Promise<string | null> {
  try {
    const body = (await req.clone().json()) as { email?: unknown };
    return typeof body.email === "string" && body.email.length <= 320 ? body.email.trim().toLowerCase() : null;
  } catch {
    return null;
  }
}

function refuse(code: string, message: string, until: Date) {
  const retry = Math.max(1, Math.ceil((until.getTime() - Date.now()) / 1000));
  return NextResponse.json({ code, message, error: message }, { status: 429, headers: { "retry-after": String(retry) } });
}

export function guardSignIn(handler: Handler): Handler {
  return async (req) => {
    if (!new URL(req.url).pathname.endsWith("/sign-in/email")) return handler(req);
    const address = clientAddress(req.headers);
    const email = await emailOf(req);
    const keys = [addressKey(address), ...(email ? [accountKey(email)] : [])];
    const counters = await readCounters(keys);
    const now = new Date();
    const locked = email ? accountLockedUntil(counters.get(accountKey(email)) ?? null, now) : null;
    if (locked) {
      await audit("sign-in-failed", null, { subject: email, headers: req.headers, detail: { reason: "account locked" } });
      return refuse(
        "account-locked",
        `This account is locked for ${minutesLeft(locked, now)} more minutes after ${SIGN_IN_LIMITS.accountFailures} failed sign-ins. An administrator can unlock it on the People page.`,
        locked,
      );
    }
    const blocked = addressBlockedUntil(counters.get(addressKey(address)) ?? null, now);
    if (blocked) {
      await audit("sign-in-failed", null, { subject: email, headers: req.headers, detail: { reason: "address limit" } });
      return refuse(
        "too-many-attempts",
        `Too many failed sign-ins from this address. Try again in ${minutesLeft(blocked, now)} minute${minutesLeft(blocked, now) === 1 ? "" : "s"}.`,
        blocked,
      );
    }

    const res = await handler(req);
    if (res.status === 200) {
      if (email) await clearCounter(accountKey(email));
      const who = (await res
        .clone()
        .json()
        .catch(() => null)) as { user?: { id?: string; email?: string } } | null;
      await audit("sign-in", who?.user?.id && who.user.email ? { id: who.user.id, email: who.user.email } : null, {
        subject: email,
        headers: req.headers,
      });
    } else if (res.status === 401) {
      // Only a wrong e-mail or password counts; a suspended account (403) gave the right one.
      await addFailure(addressKey(address), SIGN_IN_LIMITS.addressWindowSeconds, null, 0);
      if (email) {
        const c = await addFailure(
          accountKey(email),
          SIGN_IN_LIMITS.accountWindowSeconds,
          SIGN_IN_LIMITS.accountFailures,
          SIGN_IN_LIMITS.lockMinutes,
        );
        if (c.failures === SIGN_IN_LIMITS.accountFailures)
          await audit("account-locked", null, { subject: email, headers: req.headers, detail: { failures: c.failures } });
      }
      await audit("sign-in-failed", null, { subject: email, headers: req.headers, detail: { status: res.status } });
    }
    return res;
  };
}
