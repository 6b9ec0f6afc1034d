import type { Locator, Page } from "playwright-core";
import type { StudioProbe } from "@/components/studio/view/studio-probe";
import type { DesignSpecInput } from "@/lib/track";
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
    await this.page
      .getByRole("heading", { name: "Parameters" })
      .or(this.page.getByText("No revision has been saved yet."))
      .first()
      .waitFor();
    await this.page.waitForFunction(() => (window.__axlewrightStudio?.frames ?? 0) > 0, undefined, { timeout: 30_000 });
  }

  /** The rolling check has come in (the panel lists its figures instead of "Checking…"). */
  async waitForCheck() {
    await this.page.getByTestId("check-figures").waitFor({ timeout: 30_000 });
  }

  /** The canvas readout: each label ("period", "axle height", …) with the value beside it. */
  private readoutList(): Locator {
    return this.page.locator("[data-studio-canvas] dl");
  }

  /** The value beside a readout label on the canvas ("period", "axle height", …). */
  async readout(label: string): Promise<string> {
    return this.readoutList()
      .locator("dt", { hasText: new RegExp(`^${label}$`) })
      .first()
      .locator("xpath=following-sibling::dd[1]")
      .innerText();
  }

  async readoutText(): Promise<string> {
    return (await this.readoutList().textContent()) ?? "";
  }

  /** Waits until the canvas readout no longer reads `before` (a new result has been drawn). */
  async waitForReadoutChange(before: string) {
    await this.page.waitForFunction(
      (text) => {
        const now = document.querySelector("[data-studio-canvas] dl")?.textContent;
        return now !== undefined && now !== text;
      },
      before,
      { timeout: 30_000 },
    );
  }

  probe(): Promise<StudioProbe | undefined> {
    return this.page.evaluate(
      () =>
        window.__axlewrightStudio && {
          ...window.__axlewrightStudio,
          axleTrace: [...window.__axlewrightStudio.axleTrace],
          lowerAxleTrace: window.__axlewrightStudio.lowerAxleTrace && [...window.__axlewrightStudio.lowerAxleTrace],
        },
    );
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

  /** Opens a saved revision from the list, read-only. */
  async openRevision(n: number) {
    await this.page.getByRole("link", { name: `R${n}`, exact: true }).click();
    await this.page
      .getByTestId("read-only-badge")
      .filter({ hasText: `R${n}` })
      .waitFor();
    await this.waitForResult();
  }

  designId(): number {
    return Number(new URL(this.page.url()).pathname.split("/").pop());
  }

  /** The working spec as the studio keeps it in this browser (lib/studio/local-draft.ts). */
  workingSpec(): Promise<DesignSpecInput | null> {
    return this.page.evaluate((id) => {
      const raw = localStorage.getItem(`axlewright:draft:${id}`);
      return raw ? JSON.parse(raw) : null;
    }, this.designId());
  }

  axleHandle(): Locator {
    return this.page.getByTestId("axle-handle");
  }

  axleRefusal(): Locator {
    return this.page.getByTestId("axle-refusal");
  }

  /** The middle of the axle handle, in page pixels. */
  async axleHandleCentre(): Promise<[number, number]> {
    const box = await this.axleHandle().boundingBox();
    if (!box) throw new Error("the axle handle is not on the canvas");
    return [box.x + box.width / 2, box.y + box.height / 2];
  }
}
