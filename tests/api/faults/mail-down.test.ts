// The mail server killed and started again under a running app: an action that sends a notice
// (here an invitation) succeeds at once while no mail server listens, its mail waits in the outbox
// with the error, and once the server is back it is delivered, once, with no one pressing anything.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { servicesRunning } from "../../support/env";
import { Stack, waitUntil } from "../../support/stack";
import type { ApiClient } from "../../support/api";

const stack = new Stack("mail-down");
let admin: ApiClient;

beforeAll(async () => {
  if (!servicesRunning) return;
  await stack.start(1);
  await stack.startMail();
  admin = await stack.client("admin");
}, 240_000);

afterAll(() => stack.stop(), 60_000);

const invite = (email: string) =>
  admin.json<{ invitation?: { id: string }; error?: string }>("POST", "/api/admin/invitations", {
    name: "Ines Varga",
    email,
    role: "inspector",
  });
const deliveredTo = async (email: string) => (await stack.mailMessages()).filter((m) => m.to.includes(email));
const outboxRow = async (email: string) =>
  (
    await stack.query<{ status: string; attempts: number; last_error: string | null }>(
      'select status, attempts, last_error from mail_outbox where $1 = any("to")',
      [email],
    )
  )[0];

describe.skipIf(!servicesRunning)("mail server down", () => {
  it("delivers while it runs; killed, the action still succeeds and the mail goes out once it is back", async () => {
    const before = "before.kill@mail-down.example";
    expect((await invite(before)).status).toBe(201);
    await waitUntil("the first invitation was delivered", async () => (await deliveredTo(before)).length === 1, 60);

    await stack.killMail();
    const during = "during.outage@mail-down.example";
    const started = Date.now();
    const res = await invite(during);
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    expect(Date.now() - started).toBeLessThan(10_000);
    // A send was tried and failed, and the mail waits for the next try.
    await waitUntil("a failed attempt was recorded", async () => ((await outboxRow(during))?.attempts ?? 0) >= 1, 60);
    const waiting = await outboxRow(during);
    expect(waiting.status).not.toBe("sent");
    expect(waiting.last_error).toBeTruthy();

    await stack.startMail();
    await waitUntil("the waiting invitation was delivered", async () => (await deliveredTo(during)).length >= 1, 90);
    expect((await outboxRow(during)).status).toBe("sent");
    // Once each, the one sent before the outage included.
    await new Promise((r) => setTimeout(r, 3000));
    expect((await deliveredTo(during)).length).toBe(1);
    expect((await deliveredTo(before)).length).toBe(1);
    expect(stack.appAlive()).toBe(true);
  }, 240_000);
});
