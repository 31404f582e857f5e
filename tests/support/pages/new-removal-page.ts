// The new-removal form an inspector files from the track side.
import type { Page } from "playwright-core";

export class NewRemovalPage {
  constructor(readonly page: Page) {}

  /** Opens the form; `fresh` drops any draft this browser kept, so each test starts empty. */
  async goto({ fresh = true } = {}) {
    await this.page.goto("/cases/new");
    if (fresh) {
      await this.page.evaluate(() => localStorage.clear());
      await this.page.reload();
    }
    return this;
  }

  readonly reading = (trial: number) => this.page.locator(`[aria-label="Trial ${trial} reading"]`);
  readonly callValue = () => this.page.getAttribute("[data-call]", "data-call");
  readonly endPlayResult = () => this.page.textContent('[data-testid="end-play-result"]');

  async chooseUnits(units: "mm" | "inches") {
    await this.page.click(`role=radiogroup[name="Units"] >> role=radio[name="${units}"]`);
  }

  /** Marks every hand-roll cell smooth (three positions, pull and push). */
  async handRollAllSmooth() {
    for (const pos of ["0", "120", "240"]) {
      for (const dir of ["pull", "push"]) await this.page.locator(`[data-cell="${pos}-${dir}"] >> role=radio[name="Smooth"]`).click();
    }
  }

  async file() {
    await this.page.click("text=File removal report");
  }
}
