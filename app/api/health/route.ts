// GET /api/health - ok or not ok: are the database, the object store and the mail server reachable
import { NextResponse } from "next/server";
import { healthReport } from "@/lib/health/health-service";

export const dynamic = "force-dynamic";

export async function GET() {
  const { ok, database, objectStore, mail } = await healthReport();
  // The public sees only ok or not ok; which part failed and why goes to the server log.
  if (!ok) console.error("health check failed", { database, objectStore, mail });
  return NextResponse.json({ ok }, { status: ok ? 200 : 503 });
}
