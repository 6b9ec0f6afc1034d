import type { Browser, BrowserContext, Page } from "playwright-core";
import demo from "@/db/demo-data.json";
import { SignInPage } from "../pages/sign-in-page";

export const DEMO_PASSWORD = demo.password;

/** A fresh browser context signed in as this demo account, on the projects page. */
export async function signedIn(browser: Browser, email: string): Promise<{ context: BrowserContext; page: Page }> {
  const context = await browser.newContext({ viewport: { width: 1280, height: 860 } });
  const page = await context.newPage();
  const signIn = new SignInPage(page);
  await signIn.open();
  await signIn.signIn(email, DEMO_PASSWORD);
  await page.waitForURL(/\/projects$/);
  return { context, page };
}
