// One case's page (and its report and photos pages), reached by case number.
import type { Page } from "playwright-core";

export const CASE_URL = /\/cases\/TL-\d{2}-\d{5}$/;

export class CasePage {
  constructor(readonly page: Page) {}

  async goto(number: string, sub: "" | "report" | "photos" = "", hash = "") {
    await this.page.goto(`/cases/${number}${sub ? `/${sub}` : ""}${hash ? `#${hash}` : ""}`);
    return this;
  }

  readonly heading = () => this.page.textContent("h1");

  /** Waits for the app to land on a case page and answers its number. */
  async waitForCase(): Promise<string> {
    await this.page.waitForURL(CASE_URL);
    return this.page.url().split("/").pop()!;
  }
}
