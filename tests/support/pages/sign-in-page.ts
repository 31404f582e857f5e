// The sign-in screen: the form, its messages, and signing in as anyone.
import type { Page } from "playwright-core";

export class SignInPage {
  constructor(readonly page: Page) {}

  readonly form = () => this.page.getByRole("form", { name: "Sign in" });
  /** Every message the form shows (under fields and for the whole form). */
  readonly alerts = () => this.form().getByRole("alert");

  async goto() {
    await this.page.goto("/sign-in");
    return this;
  }

  async fill(email: string, password: string) {
    await this.page.fill("#email", email);
    await this.page.fill("#password", password);
  }

  async submit() {
    await this.page.click("button[type=submit]");
  }

  /** Signs in and waits until the app has left the sign-in page (for `to`, or anywhere else). */
  async signIn(email: string, password: string, to?: string, timeout = 30_000) {
    await this.fill(email, password);
    await Promise.all([
      this.page.waitForURL((u) => (to ? u.pathname === to : !u.pathname.startsWith("/sign-in")), { timeout }),
      this.submit(),
    ]);
  }
}
