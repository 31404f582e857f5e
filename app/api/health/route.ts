// GET /api/health - ok or not ok: are the database, the object store and the mail server reachable
import { NextResponse } from "next/server";
import { sql } from "drizzle-orm";
import net from "node:net";
import { db } from "@/db";
import { env } from "@/lib/env";
import { storageReachable } from "@/lib/storage/s3";

export const dynamic = "force-dynamic";

async function check(fn: () => Promise<unknown>): Promise<{ ok: boolean; ms: number; error?: string }> {
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

export async function GET() {
  const e = env();
  const [database, objectStore, mail] = await Promise.all([
    check(() => db.execute(sql`select 1`)),
    check(() => storageReachable()),
    check(() => smtpGreets(e.SMTP_HOST, e.SMTP_PORT)),
  ]);
  const ok = database.ok && objectStore.ok && mail.ok;
  // The public sees only ok or not ok; which part failed and why goes to the server log.
  if (!ok) console.error("health check failed", { database, objectStore, mail });
  return NextResponse.json({ ok }, { status: ok ? 200 : 503 });
}
