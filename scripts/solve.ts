// Command line: `npm run solve -- path/to/spec.json [--deadline ms]` prints the result as JSON on
// stdout (exit 0), or the error on stderr (exit 1). Use "-" to read the spec from stdin.
import { readFileSync } from "node:fs";
import { EngineError, solve } from "../lib/track";

function main(argv: string[]): number {
  const args = argv.slice(2);
  const di = args.indexOf("--deadline");
  const deadlineMs = di >= 0 ? Number(args[di + 1]) : undefined;
  if (di >= 0) args.splice(di, 2);
  const path = args[0];
  if (!path) {
    process.stderr.write("usage: npm run solve -- <spec.json | -> [--deadline ms]\n");
    return 1;
  }
  let spec: unknown;
  try {
    spec = JSON.parse(readFileSync(path === "-" ? 0 : path, "utf8"));
  } catch (e) {
    process.stderr.write(`Cannot read a JSON spec from ${path}: ${(e as Error).message}\n`);
    return 1;
  }
  try {
    process.stdout.write(`${JSON.stringify(solve(spec, { deadlineMs }))}\n`);
    return 0;
  } catch (e) {
    if (e instanceof EngineError) {
      process.stderr.write(`error (${e.code})${e.where ? ` at ${e.where}` : ""}: ${e.message}\n`);
      return 1;
    }
    throw e;
  }
}

process.exitCode = main(process.argv);
