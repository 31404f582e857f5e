// Tallies and its sub-pages (life, yield): chart cards found by their heading.
import type { Page } from "playwright-core";

export class TalliesPage {
  constructor(readonly page: Page) {}

  async goto(path: "" | "life" | "yield" = "", query = "") {
    await this.page.goto(`/tallies${path ? `/${path}` : ""}${query ? `?${query}` : ""}`);
    return this;
  }

  readonly heading = () => this.page.getByRole("heading", { level: 1 }).textContent();
  /** The chart card whose heading is exactly `title`. */
  readonly card = (title: string) =>
    this.page.locator("section[data-chart-card]", { has: this.page.getByRole("heading", { name: title, exact: true }) });
}
