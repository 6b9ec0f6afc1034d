// The accessibility audit of a page: axe-core (Deque, MPL-2.0) injected into the page and run with
// the rules tagged for WCAG 2.0 and 2.1, levels A and AA (W3C, Web Content Accessibility
// Guidelines 2.1, 2018). Only findings axe rates serious or critical fail a test.
import { createRequire } from "node:module";
import type { Page } from "playwright-core";
import type { AxeResults, ImpactValue } from "axe-core";

const axeSource = createRequire(import.meta.url).resolve("axe-core/axe.min.js");

export const WCAG_TAGS = ["wcag2a", "wcag2aa", "wcag21a", "wcag21aa"];
const FAILING: ImpactValue[] = ["serious", "critical"];

/** One failing node of one rule, in words a person can act on. */
export interface AxeFinding {
  rule: string;
  impact: string;
  target: string;
  summary: string;
}

/** Runs axe over the whole document and returns the serious and critical findings, one per node. */
export async function auditPage(page: Page): Promise<AxeFinding[]> {
  if (!(await page.evaluate(() => "axe" in window))) await page.addScriptTag({ path: axeSource });
  const results = await page.evaluate(
    (tags) =>
      (window as unknown as { axe: { run: (c: Document, o: object) => Promise<AxeResults> } }).axe.run(document, {
        runOnly: { type: "tag", values: tags },
        resultTypes: ["violations"],
      }),
    WCAG_TAGS,
  );
  return results.violations
    .filter((v) => v.impact && FAILING.includes(v.impact))
    .flatMap((v) =>
      v.nodes.map((n) => ({
        rule: v.id,
        impact: v.impact!,
        target: n.target.map(String).join(" "),
        // The node's own summary carries the figures (e.g. the contrast ratio found and needed).
        summary: (n.failureSummary ?? v.help).replace(/\s+/g, " ").trim(),
      })),
    );
}

export function describeFindings(where: string, findings: AxeFinding[]): string[] {
  return findings.map((f) => `${where}: [${f.impact}] ${f.rule} at ${f.target}: ${f.summary}`);
}
