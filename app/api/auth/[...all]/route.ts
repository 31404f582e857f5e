// GET|POST /api/auth/* - better-auth's own endpoints (sign-in, sign-out, password reset, admin)
import { toNextJsHandler } from "better-auth/next-js";
import { auth } from "@/lib/auth/auth";

export const { GET, POST } = toNextJsHandler(auth);
