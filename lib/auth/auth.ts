// better-auth: e-mail and password, no self sign-up (admins invite), roles through the admin plugin.
import { betterAuth } from "better-auth";
import { drizzleAdapter } from "better-auth/adapters/drizzle";
import { nextCookies } from "better-auth/next-js";
import { admin } from "better-auth/plugins";
import { db } from "@/db";
import * as schema from "@/db/schema";
import { enqueueMail } from "@/lib/mail/outbox";
import { passwordResetMail } from "@/lib/mail/templates/account";
import { ac, authRoles } from "./access-control";

const appUrl = process.env.APP_URL ?? process.env.BETTER_AUTH_URL ?? "http://127.0.0.1:3000";

export const PASSWORD_MIN = 10;

export const auth = betterAuth({
  baseURL: appUrl,
  trustedOrigins: [appUrl, appUrl.replace("127.0.0.1", "localhost")],
  database: drizzleAdapter(db, {
    provider: "pg",
    schema: { user: schema.user, session: schema.session, account: schema.account, verification: schema.verification },
  }),
  emailAndPassword: {
    enabled: true,
    disableSignUp: true,
    minPasswordLength: PASSWORD_MIN,
    maxPasswordLength: 128,
    resetPasswordTokenExpiresIn: 3600,
    revokeSessionsOnPasswordReset: true,
    sendResetPassword: async ({ user, url }) => {
      await enqueueMail("password-reset", [user.email], passwordResetMail({ name: user.name, url }));
    },
  },
  user: {
    additionalFields: {
      siteId: { type: "string", required: false, input: false },
    },
  },
  session: { expiresIn: 60 * 60 * 24 * 14, updateAge: 60 * 60 * 24 },
  // Sign-in has its own limiter (lib/security/sign-in-guard.ts: failures only, counted in PostgreSQL);
  // the library's in-memory one would count good sign-ins and trust X-Forwarded-For.
  rateLimit: { enabled: process.env.TEARLINE_TEST !== "1", window: 60, max: 100, customRules: { "/sign-in/email": false } },
  // The library's own account endpoints would skip Tearline's rules (password length, invitations,
  // no self-demotion, history kept); the app's routes do that work, so these are switched off over HTTP.
  disabledPaths: [
    "/admin/create-user",
    "/admin/set-user-password",
    "/admin/set-role",
    "/admin/remove-user",
    "/admin/impersonate-user",
    "/admin/update-user",
  ],
  plugins: [admin({ ac, roles: authRoles, defaultRole: "inspector", adminRoles: ["admin"] }), nextCookies()],
});

export type AuthSession = typeof auth.$Infer.Session;
