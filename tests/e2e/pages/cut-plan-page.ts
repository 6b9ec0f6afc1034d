import type { Page } from "playwright-core";
import { baseUrl } from "../support/browser";

/** The cut plan page of a design: its parts, the nest and the saved cut plan's files. */
export class CutPlanPage {
  constructor(private readonly page: Page) {}

  /** Opens the seeded design of a project from the project page, as a fabricator would. */
  async openFromProject(projectName: string, designName: string) {
    await this.page.goto(`${baseUrl}/projects`);
    await this.page.getByRole("link", { name: projectName }).click();
    const row = this.page.getByRole("row").filter({ hasText: designName });
    // The "Cut plan" column names the latest revision's saved plan ("Cut plan 1 of R1"), or offers to make one.
    await row.getByRole("link", { name: /cut plan/i }).click();
    await this.page.getByRole("heading", { name: `Cut plan: ${designName}` }).waitFor();
  }

  async choose(label: string, option: string) {
    await this.page.getByLabel(label, { exact: true }).selectOption({ label: option });
  }

  async fill(label: string, value: string) {
    await this.page.getByLabel(label, { exact: true }).fill(value);
  }

  runSummary() {
    return this.page.getByTestId("run-summary");
  }

  async waitForRunSummary(text: RegExp) {
    await this.page.waitForFunction(
      (source) => new RegExp(source).test(document.querySelector("[data-testid=run-summary]")?.textContent ?? ""),
      text.source,
    );
  }

  async nest(seconds: number) {
    await this.fill("Search time (s)", String(seconds));
    await this.page.getByRole("button", { name: /^Nest (parts|again)$/ }).click();
  }

  nestSummary() {
    return this.page.getByTestId("nest-summary");
  }

  /** The sentence on where the joints were put, shown when the nest chose them. */
  jointChoice() {
    return this.page.getByTestId("joint-choice");
  }

  /** The check box that lets the nest choose the joints (offered while no cut stations are typed). */
  async chooseJoints(on: boolean) {
    await this.page.getByLabel("Choose the joints to save sheets", { exact: true }).setChecked(on);
  }

  /** The cut stations field as it reads now. */
  cutStations() {
    return this.page.getByLabel("Cut stations along the run (mm)", { exact: true }).inputValue();
  }

  async save() {
    await this.page.getByRole("button", { name: "Save as this revision's cut plan" }).click();
    await this.page.getByTestId("save-message").waitFor();
    return this.page.getByTestId("save-message").innerText();
  }
}
