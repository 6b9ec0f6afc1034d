import type { Locator, Page } from "playwright-core";

/** The studio's "Loads and cautions" panel (components/studio/loads/loads-panel.tsx). */
export class LoadsPanel {
  constructor(private readonly page: Page) {}

  root(): Locator {
    return this.page.getByTestId("loads-panel");
  }

  /** Waits for the worker's load check to come in (the figures replace "Checking the loads…"). */
  async waitForCheck() {
    await this.page.getByTestId("loads-figures").waitFor({ timeout: 60_000 });
  }

  async setUse(label: RegExp) {
    const select = this.page.getByTestId("loads-use");
    const value = await select.locator("option").filter({ hasText: label }).first().getAttribute("value");
    await select.selectOption(value!);
  }

  async chooseTread(label: RegExp) {
    const select = this.page.getByTestId("loads-tread");
    const value = await select.locator("option").filter({ hasText: label }).first().getAttribute("value");
    await select.selectOption(value!);
  }

  /** The cautions as shown: signal word and which check raised them. */
  async cautions(): Promise<Array<{ signal: string; check: string; text: string }>> {
    return this.page.getByTestId("loads-caution").evaluateAll((items) =>
      items.map((li) => ({
        signal: li.getAttribute("data-signal") ?? "",
        check: li.getAttribute("data-check") ?? "",
        text: li.textContent ?? "",
      })),
    );
  }

  /** Waits until a caution from the check `has` is shown, or until none from `lacks` is (the worker answers each change). */
  async waitForCautions(want: { has?: string; lacks?: string }, timeoutMs = 60_000) {
    await this.page.waitForFunction(
      ({ has, lacks }) => {
        const checks = [...document.querySelectorAll("[data-testid=loads-caution]")].map((li) =>
          li.getAttribute("data-check"),
        );
        if (checks.length === 0) return false;
        return (has === undefined || checks.includes(has)) && (lacks === undefined || !checks.includes(lacks));
      },
      want,
      { timeout: timeoutMs },
    );
  }

  suggestion(change: RegExp): Locator {
    return this.page.getByRole("button", { name: new RegExp(`^Use this: ${change.source}`) });
  }
}
