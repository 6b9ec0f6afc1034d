// Names of the program's insides that must never reach a screen or an e-mail (issue 12, "Words
// people see"): spec keys and paths, raw enum values, library wording, our own file names.
// Each pattern is anchored on word boundaries or on a shape ordinary prose does not have
// (camelCase, snake_case, a hyphenated enum, a path with an index), so it cannot match a sentence
// the app means to show.
import type { Page } from "playwright-core";

export interface InternalName {
  /** What kind of leak this is, for the report. */
  what: string;
  pattern: RegExp;
}

export const INTERNAL_NAMES: InternalName[] = [
  // Spec keys as the engine's schema spells them (lib/track/spec.ts), and any other camelCase key:
  // two lower-case letters then a capital, which no English word or unit symbol (kPa, kN, mW) has.
  {
    what: "a spec key",
    pattern:
      /\b(?:periodsPerTurn|semiMajor|semiMinor|cornerRadius|axleOffset|runLength|speedMps|riderMassKg|endTreatment)\b/,
  },
  { what: "a camelCase key", pattern: /\b[a-z]{2,}[A-Z][A-Za-z]*\b/ },
  { what: "a snake_case key", pattern: /\b[a-z]+_[a-z][a-z_]*\b/ },
  // Paths into the spec ("wheel.points[3]", "track.amplitude"), file extensions excepted.
  {
    what: "a spec path",
    pattern: /\b(?:wheel|track|load|partner)\.(?!(?:dxf|svg|png|csv|zip|pdf|json|txt|md)\b)[a-z][A-Za-z]*\b/,
  },
  { what: "an indexed path", pattern: /\b[A-Za-z]+\[\d+\]/ },
  // The design modes and other hyphenated enum values, raw (labels: lib/track/spec.ts MODE_NAMES, lib/labels.ts).
  { what: "a raw mode", pattern: /\b(?:track-for-wheel|wheel-for-track|partner-wheel|twin-wheels)\b/ },
  { what: "a raw enum value", pattern: /\b(?:common-practice|request-changes|on-approval)\b/ },
  // The formula parser's and the numeric solvers' own wording, and JavaScript's.
  { what: "a library message", pattern: /\bUnexpected (?:end|token|character)\b/ },
  { what: "a library message", pattern: /\bnot bracketed\b/i },
  { what: "a library message", pattern: /\bintegrand\b/i },
  { what: "a library message", pattern: /\bInvalid input\b|\bexpected \w+, received\b/ },
  { what: "a JavaScript value", pattern: /\bNaN\b|\bundefined\b|\bInfinity\b|\[object Object\]/ },
  // Our design notes, which the shop never receives (cite the published source instead).
  { what: "a design-note file", pattern: /\b(?:MATH|SAFETY|FAB|BRIEF)\.md\b/ },
  { what: "the job README's old wording", pattern: /\brotations free\b/ },
];

/**
 * Enum values that must show as their label (lib/labels.ts, MODE_NAMES): an element whose whole
 * visible text is exactly one of these, in its raw lower-case form, is a raw value where a label
 * belongs. (In a sentence the same words are ordinary prose, so only whole texts count.)
 */
export const RAW_ENUM_VALUES = ["admin", "fabricator", "client", "installer", "router", "laser", "waterjet", "plasma"];

export interface NameFinding {
  what: string;
  found: string;
  context: string;
}

/** Every internal name in a text, each with a little of the text around it. */
export function internalNamesIn(text: string): NameFinding[] {
  const findings: NameFinding[] = [];
  const seen = new Set<number>(); // one finding per place, the most specific pattern first
  for (const { what, pattern } of INTERNAL_NAMES) {
    const global = new RegExp(pattern.source, pattern.flags.includes("g") ? pattern.flags : pattern.flags + "g");
    for (const m of text.matchAll(global)) {
      const at = m.index ?? 0;
      if (seen.has(at)) continue;
      seen.add(at);
      findings.push({
        what,
        found: m[0],
        context: text
          .slice(Math.max(0, at - 40), at + m[0].length + 40)
          .replace(/\s+/g, " ")
          .trim(),
      });
    }
  }
  return findings;
}

/** The page's visible text checked for internal names, and its elements for raw enum values. */
export async function internalNamesOnPage(page: Page): Promise<NameFinding[]> {
  const { text, whole } = await page.evaluate((raw) => {
    const wanted = new Set(raw);
    const whole: string[] = [];
    for (const el of document.body.querySelectorAll<HTMLElement>("*")) {
      if (el.children.length > 0 || el.getClientRects().length === 0) continue;
      const t = el.innerText?.trim();
      if (t && wanted.has(t)) whole.push(`<${el.tagName.toLowerCase()}>${t}`);
    }
    return { text: document.body.innerText, whole };
  }, RAW_ENUM_VALUES);
  return [
    ...internalNamesIn(text),
    ...whole.map((w) => ({ what: "a raw enum value as a whole text", found: w, context: w })),
  ];
}

export function describeNames(where: string, findings: NameFinding[]): string[] {
  return findings.map((f) => `${where}: ${f.what} "${f.found}" in "…${f.context}…"`);
}
