// The case list: its rows, search box, stage toggles, sortable headers, filters and export link.
import type { Page } from "playwright-core";

export class CaseListPage {
  constructor(readonly page: Page) {}

  async goto(query = "") {
    await this.page.goto(`/cases${query ? `?${query.replace(/^\?/, "")}` : ""}`);
    return this;
  }

  readonly rows = () => this.page.locator("[data-testid=case-row]");
  /** The case numbers shown, in the order shown. */
  readonly rowNumbers = () => this.page.locator("[data-testid=case-row] td:first-child").allTextContents();
  readonly searchBox = () => this.page.locator("[data-testid=case-search]");
  readonly countText = () => this.page.textContent("[data-testid=case-count]");
  readonly stage = (stage: string) => this.page.locator(`[data-testid=stage-${stage}]`);
  /** The column header whose button reads `name` (its aria-sort tells the order). */
  readonly header = (name: string) => this.page.locator(`th:has(button:has-text("${name}"))`);
  readonly exportHref = () => this.page.getAttribute("[data-testid=export-csv]", "href");

  async sortBy(name: string) {
    await this.header(name).locator("button").click();
  }

  async openFilters() {
    await this.page.click("[data-testid=filter-trigger]");
  }
}
