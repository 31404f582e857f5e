// GET|POST /api/auth/* - better-auth's own endpoints (sign-in, sign-out, password reset, admin)
import { toNextJsHandler } from "better-auth/next-js";
import { auth } from "@/lib/auth/auth";
import { auditSignOut } from "@/lib/security/sign-out-audit";
import { guardSignIn } from "@/lib/security/sign-in-guard";

const handlers = toNextJsHandler(auth);

export const GET = handlers.GET;
export const POST = guardSignIn(auditSignOut(handlers.POST));
