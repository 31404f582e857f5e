// Forgotten password: the mailed link leads to a new password; the old one stops working.
import { describe, expect, it } from "vitest";
import { ApiClient } from "../../support/api";
import { linkIn, waitForMail } from "../../support/mail";
import { freshPerson } from "../admin/fresh-person";
import { loopback, signInFrom } from "../../support/from-address";

describe("password reset", () => {
  it("request → e-mail → link → new password → sign in; the old password and the link are refused after", async () => {
    const person = await freshPerson("analyst", "Petra Nowak");
    const anon = new ApiClient();
    const asked = await anon.request("POST", "/api/auth/request-password-reset", { email: person.email, redirectTo: "/reset-password" });
    expect(asked.status).toBe(200);

    const mail = await waitForMail((m) => m.to.includes(person.email) && /reset/i.test(m.subject));
    expect(mail.text).toContain("Petra Nowak");
    const link = new URL(linkIn(mail, "/reset-password/"));

    // The link checks the token and hands it to the page that asks for the new password.
    const hop = await anon.get(link.pathname + link.search);
    expect([302, 303, 307]).toContain(hop.status);
    const target = new URL(hop.headers.get("location")!, link);
    expect(target.pathname).toBe("/reset-password");
    const token = target.searchParams.get("token")!;
    expect(token).toBeTruthy();
    const page = await anon.get(target.pathname + target.search);
    expect(page.status).toBe(200);
    expect(await page.text()).toContain("Choose a new password");

    const newPassword = "a-fresh-long-password";
    expect((await anon.request("POST", "/api/auth/reset-password", { newPassword, token })).status).toBe(200);

    // Sessions from before the reset are closed.
    expect((await person.client.get("/api/me/notices")).status).toBe(401);
    // A failing sign-in on purpose: from its own address, so the shared one stays under the limit.
    const old = await signInFrom(loopback(210, 1), person.email, person.password);
    expect(old.status).toBe(401);
    const fresh = await new ApiClient().signIn(person.email, newPassword);
    expect((await fresh.get("/api/me/notices")).status).toBe(200);

    expect((await anon.request("POST", "/api/auth/reset-password", { newPassword: "yet-another-long-one", token })).status).toBe(400);
  });

  it("refuses a new password shorter than the minimum and keeps the token usable", async () => {
    const person = await freshPerson("manager");
    await new ApiClient().request("POST", "/api/auth/request-password-reset", { email: person.email, redirectTo: "/reset-password" });
    const mail = await waitForMail((m) => m.to.includes(person.email) && /reset/i.test(m.subject));
    const token = new URL(linkIn(mail, "/reset-password/")).pathname.split("/").pop()!;
    const short = await new ApiClient().json<{ message?: string }>("POST", "/api/auth/reset-password", { newPassword: "short", token });
    expect(short.status).toBe(400);
    expect(short.body.message).toMatch(/too short/i);
    await new ApiClient().signIn(person.email, person.password);
    expect((await new ApiClient().request("POST", "/api/auth/reset-password", { newPassword: "long-enough-password", token })).status).toBe(
      200,
    );
  });

  it("answers the same for an unknown address, and sends nothing", async () => {
    const res = await new ApiClient().json<{ status?: boolean }>("POST", "/api/auth/request-password-reset", {
      email: "no-one-here@sable-river.example",
      redirectTo: "/reset-password",
    });
    expect(res.status).toBe(200);
    await expect(waitForMail((m) => m.to.includes("no-one-here@sable-river.example"), 3000)).rejects.toThrow();
  });
});
