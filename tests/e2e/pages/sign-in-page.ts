import type { Page } from "playwright-core";
import { baseUrl } from "../support/browser";

export class SignInPage {
  constructor(private readonly page: Page) {}

  async open() {
    await this.page.goto(`${baseUrl}/login`);
  }

  async signIn(email: string, password: string) {
    await this.page.getByLabel("E-mail").fill(email);
    await this.page.getByLabel("Password").fill(password);
    await this.page.getByRole("button", { name: "Sign in" }).click();
  }

  message() {
    return this.page.getByTestId("form-message");
  }
}
