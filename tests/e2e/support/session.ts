import type { Browser, BrowserContext, Page } from "playwright-core";
import demo from "@/db/demo-data.json";
import { SignInPage } from "../pages/sign-in-page";

export const DEMO_PASSWORD = demo.password;

/** Screen sizes the people who use Axlewright have: a desk, a tablet, a phone on site. */
export const VIEWPORTS = {
  desktop: { width: 1280, height: 860 },
  tablet: { width: 820, height: 1180 },
  phone: { width: 390, height: 844 },
} as const;

/** A fresh browser context signed in as this demo account, on the projects page. */
export async function signedIn(
  browser: Browser,
  email: string,
  viewport: { width: number; height: number } = VIEWPORTS.desktop,
): Promise<{ context: BrowserContext; page: Page }> {
  const context = await browser.newContext({
    viewport,
    hasTouch: viewport.width < 600,
    isMobile: viewport.width < 600,
  });
  const page = await context.newPage();
  const signIn = new SignInPage(page);
  await signIn.open();
  await signIn.signIn(email, DEMO_PASSWORD);
  await page.waitForURL(/\/projects$/);
  return { context, page };
}
