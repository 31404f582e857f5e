// Search: hits with marked words, what the search understood, facets and active filters.
import type { Page } from "playwright-core";

export class SearchPage {
  constructor(readonly page: Page) {}

  async goto(query: string) {
    await this.page.goto(query.startsWith("/") ? query : `/search?q=${query}`);
    return this;
  }

  readonly hits = () => this.page.locator('[data-testid="search-hit"]');
  readonly input = () => this.page.locator('[data-testid="search-input"]');
  readonly facetPanel = () => this.page.locator('[data-testid="facet-panel"]');
  readonly activeFilters = () => this.page.locator('[data-testid="active-filters"]');

  async waitForHits() {
    await this.page.waitForSelector('[data-testid="search-hit"]');
  }

  async markedWords(): Promise<string[]> {
    return (await this.page.locator('[data-testid="hit-snippet"] mark').allTextContents()).map((m) => m.toLowerCase());
  }
}
