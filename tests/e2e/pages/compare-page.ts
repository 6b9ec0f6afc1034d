import type { Locator, Page } from "playwright-core";

/** The compare page of two revisions: figures side by side, wheel outlines overlaid. */
export class ComparePage {
  constructor(private readonly page: Page) {}

  async waitUntilShown() {
    await this.page.getByRole("heading", { name: /: R\d+ and R\d+$/, level: 1 }).waitFor();
  }

  /** The two cells beside a figure's label ("Period", "Centre distance", …). */
  async figure(label: string): Promise<[string, string]> {
    const escaped = label.replace(/[.*+?^${}()|[\]\\]/g, "\\$&");
    const row = this.page.getByRole("row", { name: new RegExp(`^${escaped} `) });
    const cells = await row.getByRole("cell").allInnerTexts();
    if (cells.length !== 3)
      throw new Error(`the figure "${label}" has ${cells.length} cells, not a label and two values`);
    return [cells[1], cells[2]];
  }

  overlay(): Locator {
    return this.page.getByRole("img", { name: /^Wheel of R\d+ in solid ink, R\d+ dashed$/ });
  }
}
