// Signs in to the running production server as a demo person and keeps the session cookie.
import { DEMO_PASSWORD, DEMO_USERS } from "../../seed/demo-people";

export const APP_URL = process.env.APP_URL ?? "http://127.0.0.1:3200";

export async function signedInCookie(role: (typeof DEMO_USERS)[number]["role"] = "manager"): Promise<string> {
  const email = DEMO_USERS.find((u) => u.role === role)!.email;
  const res = await fetch(`${APP_URL}/api/auth/sign-in/email`, {
    method: "POST",
    redirect: "manual",
    headers: { origin: APP_URL, "content-type": "application/json" },
    body: JSON.stringify({ email, password: DEMO_PASSWORD }),
  });
  if (res.status !== 200) throw new Error(`sign-in as ${email} failed: ${res.status} ${await res.text()}`);
  return res.headers
    .getSetCookie()
    .map((c) => c.split(";")[0])
    .join("; ");
}
