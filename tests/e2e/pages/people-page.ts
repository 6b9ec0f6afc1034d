import type { Page } from "playwright-core";
import { baseUrl } from "../support/browser";

/** The admin's People page: accounts and the form that adds one. */
export class PeoplePage {
  constructor(private readonly page: Page) {}

  async open() {
    await this.page.goto(`${baseUrl}/admin/users`);
    await this.page.getByRole("heading", { name: "People", level: 1 }).waitFor();
  }

  /** Adds an account (the app mails the person their welcome) and waits for the form's answer. */
  async addPerson(o: {
    name: string;
    email: string;
    role: "admin" | "fabricator" | "client" | "installer";
    password: string;
  }) {
    const form = this.page.locator("form", { has: this.page.getByRole("button", { name: "Add person" }) });
    await form.getByLabel("Name").fill(o.name);
    await form.getByLabel("E-mail").fill(o.email);
    await form.getByLabel("Role").selectOption(o.role);
    await form.getByLabel("First password").fill(o.password);
    await form.getByRole("button", { name: "Add person" }).click();
    await this.page.getByText(`Added ${o.name}.`).waitFor();
  }
}
