// POST /api/admin/outbox/retry - send every unsent mail now, ignoring the back-off
import { NextResponse } from "next/server";
import { withRole } from "@/lib/http/handler";
import { deliverDue } from "@/lib/mail/outbox";

export const POST = withRole("admin:outbox", async () => NextResponse.json(await deliverDue(true)));
