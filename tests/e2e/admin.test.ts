// An admin adds a person (after a mistake the form keeps what was typed), changes their role,
// adds them to a project and deactivates them; the person then cannot sign in.
import type { Browser } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { SignInPage } from "./pages/sign-in-page";
import { baseUrl, launchBrowser, screenshotPath } from "./support/browser";
import { signedIn } from "./support/session";

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
});

describe("people and members, as the admin", () => {
  it("adds, promotes, assigns and deactivates a person", async () => {
    const tag = Date.now().toString(36);
    const email = `crew.${tag}@example.test`;
    const name = `Rowan Tamsin ${tag}`;
    const password = "first-password-2026";
    const { context, page } = await signedIn(browser, "admin@example.test");
    await page.goto(`${baseUrl}/admin/users`);

    const form = page.locator("form", { has: page.getByRole("button", { name: "Add person" }) });
    await form.getByLabel("Name").fill(name);
    await form.getByLabel("E-mail").fill("crew-at-example");
    await form.getByLabel("Role").selectOption("client");
    await form.getByLabel("First password").fill(password);
    await form.getByRole("button", { name: "Add person" }).click();
    await page.getByText("That is not an e-mail address.").waitFor();
    expect(await form.getByLabel("Name").inputValue(), "the form keeps what was typed").toBe(name);
    expect(await form.getByLabel("Role").inputValue()).toBe("client");
    await page.screenshot({ path: screenshotPath("admin-add-person-error"), fullPage: true });

    await form.getByLabel("E-mail").fill(email);
    await form.getByLabel("First password").fill(password);
    await form.getByRole("button", { name: "Add person" }).click();
    await page.getByText(`Added ${name}.`).waitFor();

    const row = page.getByTestId(`user-${email}`);
    await row.waitFor();
    await row.getByLabel(`Role of ${name}`, { exact: true }).selectOption("installer");
    await row.getByRole("button", { name: `Save role of ${name}` }).click();
    await row.getByText("Role changed.").waitFor();

    // Add them to the trike project as an installer.
    await page.goto(`${baseUrl}/projects/1`);
    const add = page.locator("form", { has: page.getByRole("button", { name: "Add member" }) });
    await add.getByLabel("Person").selectOption({ label: `${name} (installer, ${email})` });
    await add.getByLabel("Role in this project").selectOption("installer");
    await add.getByRole("button", { name: "Add member" }).click();
    await page.getByRole("cell", { name, exact: true }).waitFor();
    await page.screenshot({ path: screenshotPath("admin-project-members"), fullPage: true });

    // Deactivate; their sign-in is then refused.
    await page.goto(`${baseUrl}/admin/users`);
    await page
      .getByTestId(`user-${email}`)
      .getByRole("button", { name: `Deactivate ${name}` })
      .click();
    await page.getByTestId(`user-${email}`).getByText("deactivated").waitFor();
    await page.screenshot({ path: screenshotPath("admin-people"), fullPage: true });
    await context.close();

    const other = await browser.newPage();
    const signIn = new SignInPage(other);
    await signIn.open();
    await signIn.signIn(email, password);
    await signIn.message().waitFor();
    expect(await signIn.message().innerText()).toBe("That e-mail and password do not match an active account.");
    await other.close();
  });

  it("mails the new person through the local mail sink", async () => {
    const res = await fetch(`http://127.0.0.1:${process.env.MAIL_SINK_HTTP_PORT}/messages`);
    const messages = (await res.json()) as { to: string[]; subject: string }[];
    expect(
      messages.some((m) => m.subject === "Your Axlewright account" && m.to.some((t) => t.startsWith("crew."))),
    ).toBe(true);
  });
});
