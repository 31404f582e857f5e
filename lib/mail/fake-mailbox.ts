// Reads what the local mail fake received, for the outbox page in development. Absent elsewhere.
import "server-only";
import { env } from "@/lib/env";

export type FakeMessage = { id: string; receivedAt: string; from: string; to: string[]; subject: string; text: string; html: string };

/** null when no mail fake is configured; an error text when it is configured but cannot be read. */
export async function readFakeMailbox(limit = 25): Promise<{ messages: FakeMessage[]; refusing: boolean } | { error: string } | null> {
  const base = env().MAIL_FAKE_URL;
  if (!base) return null;
  try {
    const res = await fetch(`${base}/messages`, { cache: "no-store", signal: AbortSignal.timeout(3_000) });
    if (!res.ok) return { error: `the mail fake answered HTTP ${res.status}` };
    const all = (await res.json()) as FakeMessage[];
    // The fake can be told to refuse mail (to exercise retries); say so, or the outbox looks broken.
    const health = await fetch(`${base}/health`, { cache: "no-store", signal: AbortSignal.timeout(3_000) })
      .then((r) => r.json() as Promise<{ refuse?: boolean }>)
      .catch(() => ({}) as { refuse?: boolean });
    return { messages: all.slice(-limit).reverse(), refusing: health.refuse === true };
  } catch (err) {
    return { error: `the mail fake at ${base} cannot be reached (${err instanceof Error ? err.message : String(err)})` };
  }
}
