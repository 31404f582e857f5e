// Reads the mail fake's mailbox back, so tests see exactly what a person would receive.
import { MAIL_FAKE_URL } from "./env";

export type FakeMail = { id: string; receivedAt: string; from: string; to: string[]; subject: string; text: string; html: string };

export async function mailbox(): Promise<FakeMail[]> {
  const res = await fetch(`${MAIL_FAKE_URL}/messages`);
  return (await res.json()) as FakeMail[];
}

export async function refuseMail(refuse: boolean) {
  await fetch(`${MAIL_FAKE_URL}/control`, { method: "POST", body: JSON.stringify({ refuse }) });
}

/** Waits until a message matching the filter arrives (mail is sent after the action returns). */
export async function waitForMail(match: (m: FakeMail) => boolean, timeoutMs = 15_000): Promise<FakeMail> {
  const until = Date.now() + timeoutMs;
  while (Date.now() < until) {
    const hit = (await mailbox()).find(match);
    if (hit) return hit;
    await new Promise((r) => setTimeout(r, 200));
  }
  throw new Error("expected e-mail did not arrive at the mail fake");
}

export function linkIn(mail: FakeMail, pathPart: string): string {
  const m = mail.text.match(new RegExp(`https?://\\S*${pathPart.replace(/[/]/g, "\\/")}\\S*`));
  if (!m) throw new Error(`no link containing ${pathPart} in "${mail.subject}"`);
  return m[0];
}
