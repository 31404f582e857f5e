// Asking the worker to send mail now or later. A lost nudge costs at most a minute: the mail is
// already in the outbox, and the once-a-minute schedule sends whatever is due.
import "server-only";
import { getBoss } from "./boss";
import { QUEUES, retryKey } from "./queues";

const quietly = (what: string) => (err: unknown) => console.error(`could not queue ${what}: ${err instanceof Error ? err.message : err}`);

export function nudgeMail(): void {
  void getBoss()
    .then((b) => b.send(QUEUES.mailSend, {}))
    .catch(quietly("a mail send"));
}

export function retryMailAt(at: Date): void {
  const startAfter = at.getTime() <= Date.now() ? new Date(Date.now() + 1000) : at;
  void getBoss()
    .then((b) => b.send(QUEUES.mailRetry, {}, { startAfter, singletonKey: retryKey(startAfter) }))
    .catch(quietly("a mail retry"));
}
