// Command line: `npm run loads -- input.json` (or "-" for stdin) prints the load-path check as JSON
// (exit 0): { wheelLoadN, grip, contact, deflection, cautions, … } as lib/loads/check.ts describes,
// with the helper's suggestions. Bad input exits 1 with one line on stderr naming the field.
import { readFileSync } from "node:fs";
import { checkLoads, suggestFixes } from "../lib/loads";
import { EngineError, solve } from "../lib/track";
import { firstLoadsIssue, loadsInputSchema } from "../lib/validation/loads";

/** JSON has no infinity: an unbounded figure is written as null. */
const finite = (_key: string, v: unknown) => (typeof v === "number" && !Number.isFinite(v) ? null : v);

function main(argv: string[]): number {
  const path = argv[2];
  if (!path) {
    process.stderr.write("usage: npm run loads -- <input.json | ->\n");
    return 1;
  }
  let raw: unknown;
  try {
    raw = JSON.parse(readFileSync(path === "-" ? 0 : path, "utf8"));
  } catch (e) {
    process.stderr.write(`input: cannot read JSON from ${path}: ${(e as Error).message}\n`);
    return 1;
  }
  const parsed = loadsInputSchema.safeParse(raw);
  if (!parsed.success) {
    process.stderr.write(`${firstLoadsIssue(parsed.error)}\n`);
    return 1;
  }
  try {
    const result = solve(parsed.data.spec);
    const report = checkLoads(parsed.data, result);
    const suggestions = suggestFixes(parsed.data, report).map(({ after, ...s }) => ({
      ...s,
      after: { cautions: after.cautions.length },
    }));
    process.stdout.write(`${JSON.stringify({ ...report, suggestions }, finite)}\n`);
    return 0;
  } catch (e) {
    if (e instanceof EngineError) {
      process.stderr.write(`spec${e.where ? `.${e.where}` : ""}: ${e.message.replace(/\s+/g, " ")}\n`);
      return 1;
    }
    throw e;
  }
}

process.exitCode = main(process.argv);
