// Invitation and password-reset e-mails, read back from the mail fake and followed like a person would.
import { describe, expect, it } from "vitest";
import { ApiClient } from "../../support/api";
import { linkIn, waitForMail } from "../../support/mail";
import { acceptAndSignIn, invitedPerson, inviteByMail, mailTo } from "./people";
import { loopback, signInFrom } from "../../support/from-address";

describe("invitation e-mail", () => {
  it("reaches the invited address with a link that sets the password once", async () => {
    const invite = await inviteByMail("analyst", "Mirela Sandu");
    expect(invite.mail.to).toEqual([invite.email]);
    expect(invite.mail.subject).toBe("You are invited to Tearline");
    expect(invite.mail.html).toContain(`href="${invite.link}"`);
    expect(invite.mail.text).toContain("Set my password");

    // The link opens the invitation page for whoever holds it.
    const page = await new ApiClient().get(new URL(invite.link).pathname);
    expect(page.status).toBe(200);
    // React separates the two text parts with an empty comment.
    expect(await page.text()).toMatch(/Welcome, (<!-- -->)?Mirela Sandu/);

    const { client } = await acceptAndSignIn(invite);
    const session = await client.json("GET", "/api/auth/get-session");
    expect((session.body as { user?: { email?: string; role?: string } }).user).toMatchObject({ email: invite.email, role: "analyst" });
    // The link works once.
    expect((await new ApiClient().post("/api/invitations/accept", { token: invite.token, password: "another-long-password" })).status).toBe(
      410,
    );
    expect(await (await new ApiClient().get(new URL(invite.link).pathname)).text()).toContain("Invitation not valid");
  });
});

describe("password reset e-mail", () => {
  it("sends a one-hour link that leads to the reset page and changes the password", async () => {
    const person = await invitedPerson("inspector", "Tove Lindqvist");
    const asked = await new ApiClient().post("/api/auth/request-password-reset", { email: person.email, redirectTo: "/reset-password" });
    expect(asked.status).toBe(200);
    const mail = await waitForMail(mailTo(person.email, "Reset your Tearline password"));
    expect(mail.to).toEqual([person.email]);
    const link = linkIn(mail, "/reset-password/");

    // The link checks the token and forwards to our page with it.
    const anonymous = new ApiClient();
    const hop = await anonymous.get(new URL(link).pathname + new URL(link).search);
    expect(hop.status).toBe(302);
    const target = new URL(hop.headers.get("location")!, link);
    expect(target.pathname).toBe("/reset-password");
    const token = target.searchParams.get("token")!;
    expect(token).toBeTruthy();
    const page = await anonymous.get(target.pathname + target.search);
    expect(page.status).toBe(200);
    expect(await page.text()).toContain("Choose a new password");

    const newPassword = "a-new-password-for-tove";
    expect((await anonymous.post("/api/auth/reset-password", { newPassword, token })).status).toBe(200);
    await expect(new ApiClient().signIn(person.email, newPassword)).resolves.toBeInstanceOf(ApiClient);
    // A failing sign-in on purpose: from its own address, so the shared one stays under the limit.
    const old = await signInFrom(loopback(211, 1), person.email, person.password);
    expect(old.status).toBe(401);
  });
});
