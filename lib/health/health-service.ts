// Are the database, the object store and the mail server reachable, each within 3 s.
import "server-only";
import net from "node:net";
import { selectOne } from "@/db/queries/health";
import { env } from "@/lib/env";
import { storageReachable } from "@/lib/storage/s3";

type Check = { ok: boolean; ms: number; error?: string };

async function check(fn: () => Promise<unknown>): Promise<Check> {
  const started = Date.now();
  try {
    await Promise.race([fn(), new Promise((_, reject) => setTimeout(() => reject(new Error("timed out after 3 s")), 3000))]);
    return { ok: true, ms: Date.now() - started };
  } catch (err) {
    return { ok: false, ms: Date.now() - started, error: err instanceof Error ? err.message : String(err) };
  }
}

function smtpGreets(host: string, port: number) {
  return new Promise<void>((resolve, reject) => {
    const socket = net.connect(port, host);
    socket.once("data", (d) => {
      socket.end("QUIT\r\n");
      if (d.toString().startsWith("220")) resolve();
      else reject(new Error("unexpected SMTP greeting"));
    });
    socket.once("error", reject);
  });
}

export async function healthReport(): Promise<{ ok: boolean; database: Check; objectStore: Check; mail: Check }> {
  const e = env();
  const [database, objectStore, mail] = await Promise.all([
    check(() => selectOne()),
    check(() => storageReachable()),
    check(() => smtpGreets(e.SMTP_HOST, e.SMTP_PORT)),
  ]);
  return { ok: database.ok && objectStore.ok && mail.ok, database, objectStore, mail };
}
