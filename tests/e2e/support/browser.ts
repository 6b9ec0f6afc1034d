// Debian's Chromium driven by playwright-core (no browser download). Flags keep it off the closed
// network and let it run as root in CI.
import { mkdirSync } from "node:fs";
import path from "node:path";
import { chromium, type Browser } from "playwright-core";

export const baseUrl = process.env.APP_URL ?? "http://127.0.0.1:3101";
export const outputDir = path.join(process.env.AXLEWRIGHT_TEST_OUTPUT ?? "test-results", "e2e");

export async function launchBrowser(): Promise<Browser> {
  mkdirSync(outputDir, { recursive: true });
  return chromium.launch({
    executablePath: process.env.CHROMIUM_PATH ?? "/usr/bin/chromium",
    args: [
      "--no-sandbox",
      "--disable-gpu",
      "--disable-quic",
      "--no-first-run",
      "--disable-background-networking",
      "--disable-component-update",
      "--disable-sync",
    ],
  });
}

export function screenshotPath(name: string): string {
  return path.join(outputDir, `${name}.png`);
}
