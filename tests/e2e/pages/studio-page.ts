import type { Page } from "playwright-core";
import type { StudioProbe } from "@/components/studio/view/studio-probe";
import { baseUrl } from "../support/browser";

export class StudioPage {
  constructor(private readonly page: Page) {}

  /** Creates a design from a preset in the project and waits for the studio. */
  async create(projectId: number, name: string, presetLabel: RegExp) {
    await this.page.goto(`${baseUrl}/projects/${projectId}/designs/new`);
    await this.page.getByLabel("Design name").fill(name);
    const preset = this.page.getByLabel("Start from");
    const value = await preset.locator("option").filter({ hasText: presetLabel }).first().getAttribute("value");
    await preset.selectOption(value!);
    await this.page.getByRole("button", { name: "Create design" }).click();
    await this.page.waitForURL(/\/designs\/\d+$/);
    await this.waitForResult();
  }

  async waitForResult() {
    await this.page.getByRole("heading", { name: "Parameters" }).or(this.page.getByText("No revision has been saved yet.")).first().waitFor();
    await this.page.waitForFunction(() => (window.__axlewrightStudio?.frames ?? 0) > 0, undefined, { timeout: 30_000 });
  }

  /** The value beside a readout label on the canvas ("period", "axle height", …). */
  async readout(label: string): Promise<string> {
    return this.page.locator("dl dt", { hasText: new RegExp(`^${label}$`) }).first().locator("xpath=following-sibling::dd[1]").innerText();
  }

  probe(): Promise<StudioProbe | undefined> {
    return this.page.evaluate(() => window.__axlewrightStudio && { ...window.__axlewrightStudio, axleTrace: [...window.__axlewrightStudio.axleTrace] });
  }

  play() {
    return this.page.getByRole("button", { name: /Play/ }).click();
  }

  pause() {
    return this.page.getByRole("button", { name: /Pause/ }).click();
  }

  async saveRevision(note: string) {
    await this.page.getByLabel("Note").fill(note);
    await this.page.getByRole("button", { name: "Save revision" }).click();
    await this.page.getByText(/Saved revision R\d+\./).waitFor();
  }
}
