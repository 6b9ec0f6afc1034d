// Changing one's own password at /account/password, as a person meets it: a wrong current password
// is refused in plain words, the new one twice must agree, and once it is changed every earlier
// session ends (another browser signed in before is sent to sign in on its next page), the old
// password no longer signs in and the new one does. The account is made here, so the demo accounts
// keep the password the other tests use.
import type { Browser } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { PasswordPage } from "./pages/password-page";
import { PeoplePage } from "./pages/people-page";
import { SignInPage } from "./pages/sign-in-page";
import { baseUrl, launchBrowser, screenshotPath } from "./support/browser";
import { internalNamesIn } from "./support/internal-names";
import { signedIn } from "./support/session";

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
});

async function signInAs(email: string, password: string) {
  const context = await browser.newContext();
  const page = await context.newPage();
  const signIn = new SignInPage(page);
  await signIn.open();
  await signIn.signIn(email, password);
  await page.waitForURL(/\/projects$/);
  return { context, page, signedInAt: Date.now() };
}

describe("changing one's own password", () => {
  const tag = Date.now().toString(36);
  const person = {
    name: `Wren Alder ${tag}`,
    email: `wren.${tag}@example.test`,
    role: "client" as const,
    password: "welcome-password-2026",
  };
  const next = "a-new-password-of-mine";

  it("refuses a wrong current password, then changes it, ends the other sessions and signs in with the new one", async () => {
    const admin = await signedIn(browser, "admin@example.test");
    const people = new PeoplePage(admin.page);
    await people.open();
    await people.addPerson(person);
    await admin.context.close();

    // Signed in elsewhere first (another browser), then here.
    const elsewhere = await signInAs(person.email, person.password);
    const here = await signInAs(person.email, person.password);
    const form = new PasswordPage(here.page);
    await form.openFromHeader();

    await form.change("not-my-password", next);
    expect(await form.message().innerText()).toBe("That is not your current password.");
    expect(await form.fieldError("Current password")).toBe("That is not your current password.");
    expect(
      await here.page.getByLabel("Current password").inputValue(),
      "a password is never put back in the form",
    ).toBe("");
    await here.page.screenshot({ path: screenshotPath("password-wrong-current"), fullPage: true });

    await form.change(person.password, next, `${next}-typo`);
    expect(await form.fieldError("New password again")).toBe("The two new passwords are not the same.");

    // Sessions end from the whole second of the change (lib/server/sign-in.ts); a session begun in
    // that same second would count as new, so the change waits for the next second.
    const wait = 1100 - (Date.now() - elsewhere.signedInAt);
    if (wait > 0) await new Promise((r) => setTimeout(r, wait));
    await form.change(person.password, next);
    const said = await form.message().innerText();
    expect(said).toMatch(/^Password changed\./);
    expect(internalNamesIn(said)).toEqual([]);
    await form.signInLink().waitFor();
    await here.page.screenshot({ path: screenshotPath("password-changed"), fullPage: true });

    // The other browser's session has ended: its next page load asks it to sign in.
    await elsewhere.page.goto(`${baseUrl}/projects`);
    expect(elsewhere.page.url()).toMatch(/\/login/);
    await elsewhere.page.getByRole("button", { name: "Sign in" }).waitFor();
    await elsewhere.context.close();
    // And so has this one.
    await here.page.goto(`${baseUrl}/projects`);
    expect(here.page.url()).toMatch(/\/login/);
    await here.context.close();

    // The old password is refused; the new one signs in.
    const old = await browser.newPage();
    const signIn = new SignInPage(old);
    await signIn.open();
    await signIn.signIn(person.email, person.password);
    await signIn.message().waitFor();
    expect(await signIn.message().innerText()).toBe("That e-mail and password do not match an active account.");
    await old.close();
    const fresh = await signInAs(person.email, next);
    expect(await fresh.page.getByTestId("current-user").innerText()).toContain(person.name);
    await fresh.context.close();
  });
});
