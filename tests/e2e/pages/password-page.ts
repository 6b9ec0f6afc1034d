import type { Page } from "playwright-core";
import { baseUrl } from "../support/browser";

/** The signed-in person's own page for changing their password (/account/password). */
export class PasswordPage {
  constructor(private readonly page: Page) {}

  async open() {
    await this.page.goto(`${baseUrl}/account/password`);
    await this.page.getByRole("heading", { name: "Change password", level: 1 }).waitFor();
  }

  /** Opens the page the way a person finds it: the header's link. */
  async openFromHeader() {
    await this.page.getByRole("link", { name: "Change password" }).click();
    await this.page.getByRole("heading", { name: "Change password", level: 1 }).waitFor();
  }

  async change(current: string, next: string, again = next) {
    await this.page.getByLabel("Current password").fill(current);
    await this.page.getByLabel("New password", { exact: true }).fill(next);
    await this.page.getByLabel("New password again").fill(again);
    // The form answers through a server action (a POST with a Next-Action header); its state is
    // drawn once the button no longer reads "Saving…".
    const answered = this.page.waitForResponse(
      (r) => r.request().method() === "POST" && !!r.request().headers()["next-action"],
    );
    await this.page.getByRole("button", { name: "Save" }).click();
    await answered;
    await this.page.getByRole("button", { name: "Saving…" }).waitFor({ state: "detached" });
    await this.message().waitFor();
  }

  /** The form's answer: what worked, or what to fix. */
  message() {
    return this.page.getByTestId("form-message");
  }

  /** The error beside one field, found through the field's aria-describedby. */
  async fieldError(label: string): Promise<string> {
    const id = await this.page.getByLabel(label, { exact: true }).getAttribute("aria-describedby");
    return this.page.locator(`[id="${id}"]`).innerText();
  }

  signInLink() {
    return this.page.getByRole("link", { name: "Sign in with the new password" });
  }
}
