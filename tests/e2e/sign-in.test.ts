// Sign-in and sessions as a browser (and a plain HTTP client) meets them.
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

describe("the sign-in page", () => {
  it("refuses a wrong password with a clear message and keeps the e-mail", async () => {
    const page = await browser.newPage();
    const signIn = new SignInPage(page);
    await signIn.open();
    await signIn.signIn("fabricator@example.test", "not-the-password");
    await signIn.message().waitFor();
    expect(await signIn.message().innerText()).toBe("That e-mail and password do not match an active account.");
    expect(await page.getByLabel("E-mail").inputValue()).toBe("fabricator@example.test");
    expect(page.url()).toMatch(/\/login/);
    await page.screenshot({ path: screenshotPath("sign-in-wrong-password") });
    await page.close();
  });

  it("names a malformed e-mail beside the field", async () => {
    const page = await browser.newPage();
    const signIn = new SignInPage(page);
    await signIn.open();
    await signIn.signIn("fabricator-at-example", "whatever-password");
    await page.getByText("That is not an e-mail address.").waitFor();
    expect(await page.getByLabel("E-mail").getAttribute("aria-invalid")).toBe("true");
    await page.close();
  });

  it("sends a visitor without a session to sign in, and back where they were going", async () => {
    const context = await browser.newContext();
    const page = await context.newPage();
    await page.goto(`${baseUrl}/projects/1`);
    expect(page.url()).toMatch(/\/login\?callbackUrl=/);
    await new SignInPage(page).signIn("installer@example.test", (await import("./support/session")).DEMO_PASSWORD);
    await page.waitForURL(/\/projects\/1$/);
    await context.close();
  });

  it("signs out", async () => {
    const { context, page } = await signedIn(browser, "client@example.test");
    await page.getByRole("button", { name: "Sign out" }).click();
    await page.waitForURL(/\/login/);
    await page.goto(`${baseUrl}/projects`);
    expect(page.url()).toMatch(/\/login/);
    await context.close();
  });
});

describe("the JSON API without a valid session", () => {
  const cookieNames = ["authjs.session-token", "__Secure-authjs.session-token"];

  it("answers 401 with no cookie", async () => {
    const res = await fetch(`${baseUrl}/api/projects`);
    expect(res.status).toBe(401);
    expect(await res.json()).toEqual({ status: 401, message: "Please sign in." });
  });

  it.each(cookieNames)("answers 401 to a forged %s cookie", async (name) => {
    const forged = "eyJhbGciOiJkaXIiLCJlbmMiOiJBMjU2Q0JDLUhTNTEyIn0..forged.forged.forged";
    const res = await fetch(`${baseUrl}/api/projects/1`, { headers: { cookie: `${name}=${forged}` } });
    expect(res.status).toBe(401);
  });

  it("renews the session while in use, and a signed-out session stays out even with a kept copy", async () => {
    const { context, page } = await signedIn(browser, "fabricator@example.test");
    const sessionCookie = async () => (await context.cookies()).find((c) => c.name.endsWith("authjs.session-token"))!;
    const first = await sessionCookie();
    // Auth.js's renewal, as components/session-keeper.tsx asks for it while someone works.
    await new Promise((r) => setTimeout(r, 1100));
    const renewed = await page.request.get(`${baseUrl}/api/auth/session`);
    expect(renewed.status()).toBe(200);
    expect((await renewed.json()).user?.email).toBe("fabricator@example.test");
    const second = await sessionCookie();
    expect(second.value).not.toBe(first.value);
    expect(second.expires).toBeGreaterThan(first.expires);
    const kept = `${second.name}=${second.value}`;
    expect((await fetch(`${baseUrl}/api/projects`, { headers: { cookie: kept } })).status).toBe(200);

    await page.goto(`${baseUrl}/projects`);
    await page.getByRole("button", { name: "Sign out" }).click();
    await page.waitForURL(/\/login/);
    // The token kept from before the sign-out: refused, and never renewed.
    expect((await fetch(`${baseUrl}/api/projects`, { headers: { cookie: kept } })).status).toBe(401);
    const replay = await fetch(`${baseUrl}/api/auth/session`, { headers: { cookie: kept } });
    expect(await replay.json()).toBeNull();
    expect((await fetch(`${baseUrl}/api/projects`, { headers: { cookie: kept } })).status).toBe(401);
    await context.close();
  });

  it("answers 200 with the real cookie, and 401 once it is tampered with", async () => {
    const { context } = await signedIn(browser, "fabricator@example.test");
    const cookie = (await context.cookies()).find((c) => c.name.endsWith("authjs.session-token"));
    expect(cookie, "a session cookie was set").toBeDefined();
    const good = await fetch(`${baseUrl}/api/projects`, { headers: { cookie: `${cookie!.name}=${cookie!.value}` } });
    expect(good.status).toBe(200);
    const tampered = cookie!.value.slice(0, -4) + (cookie!.value.endsWith("AAAA") ? "BBBB" : "AAAA");
    const bad = await fetch(`${baseUrl}/api/projects`, { headers: { cookie: `${cookie!.name}=${tampered}` } });
    expect(bad.status).toBe(401);
    await context.close();
  });
});
