import type { Page } from "playwright-core";
import { baseUrl } from "../support/browser";

/** The installer's assembly sheet of a saved cut plan, and the project's build log. */
export class AssemblyPage {
  constructor(private readonly page: Page) {}

  /** Opens the first assembly sheet listed on the project page, as an installer would. */
  async openFromProject(projectName: string) {
    await this.page.goto(`${baseUrl}/projects`);
    await this.page.getByRole("link", { name: projectName }).click();
    await this.page.getByTestId("assembly-sheets").getByRole("link").first().click();
    await this.page.getByTestId("assembly-sheet").waitFor();
  }

  async choosePaper(name: "A4" | "US Letter") {
    await this.page.getByRole("link", { name, exact: true }).click();
    await this.page.waitForURL(new RegExp(`paper=${name === "A4" ? "a4" : "letter"}`));
    await this.page.getByTestId("assembly-sheet").waitFor();
  }

  installedCount() {
    return this.page.getByTestId("install-count").innerText();
  }

  /** Ticks an item and waits until the server has recorded it (the log entry's answer re-enables the boxes). */
  async tick(item: string) {
    const recorded = this.page.waitForResponse((r) => r.url().includes("/ticks") && r.request().method() === "POST");
    await this.page.getByTestId(`tick-${item}`).check();
    const res = await recorded;
    if (res.status() !== 201) throw new Error(`the tick of ${item} was refused: ${res.status()}`);
  }

  async openLog() {
    const projectLink = await this.page.getByRole("link", { name: "← Project" }).getAttribute("href");
    await this.page.goto(`${baseUrl}${projectLink}/log`);
    await this.page.getByTestId("log-list").waitFor();
  }
}
