import type { Page } from "playwright-core";

export class ProjectsPage {
  constructor(private readonly page: Page) {}

  async waitUntilShown() {
    await this.page.getByRole("heading", { name: "Projects", level: 1 }).waitFor();
  }

  /** The project names in the table, in order. */
  async projectNames(): Promise<string[]> {
    return this.page.locator("table[aria-label], table").first().locator("tbody tr td:first-child a").allInnerTexts();
  }

  currentUser() {
    return this.page.getByTestId("current-user");
  }

  peopleLink() {
    return this.page.getByRole("navigation", { name: "Main" }).getByRole("link", { name: "People" });
  }

  newProjectPanel() {
    return this.page.getByRole("heading", { name: "New project" });
  }
}
