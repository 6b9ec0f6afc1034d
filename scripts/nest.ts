// Command line: `npm run nest -- instance.json [--seconds N] [--seed S]` nests a strip-packing
// instance (ESICUP JSON, PascalCase or snake_case keys) and prints the layout as JSON on stdout:
// { name, height, utilisation, length, placed, seconds, placements: [{ id, copy, rotation, x, y }] }.
// Progress goes to stderr. A missing, unreadable, oversize (> 5 MB) or malformed file: the reason on
// stderr and exit code 1.
import { readFileSync, statSync } from "node:fs";
import { loadInstance, nestStrip } from "../lib/nest";

const MAX_BYTES = 5 * 1024 * 1024;
const USAGE = "usage: npm run nest -- <instance.json> [--seconds N] [--seed S]\n";

function fail(message: string): number {
  process.stderr.write(`nest: ${message}\n`);
  return 1;
}

/** Removes `--name value` from args; undefined when absent. */
function option(args: string[], name: string): string | undefined {
  const i = args.indexOf(name);
  if (i < 0) return undefined;
  const value = args[i + 1];
  args.splice(i, 2);
  return value ?? "";
}

async function main(argv: string[]): Promise<number> {
  const args = argv.slice(2);
  const secondsArg = option(args, "--seconds");
  const seedArg = option(args, "--seed");
  const seconds = secondsArg === undefined ? 30 : Number(secondsArg);
  const seed = seedArg === undefined ? 1 : Number(seedArg);
  if (!(seconds > 0 && seconds <= 86_400))
    return fail(`--seconds must be a number of seconds between 0 and 86400, not ${JSON.stringify(secondsArg)}`);
  if (!Number.isInteger(seed)) return fail(`--seed must be a whole number, not ${JSON.stringify(seedArg)}`);
  if (args.length !== 1 || args[0].startsWith("--")) {
    process.stderr.write(USAGE);
    return 1;
  }
  const path = args[0];

  let text: string;
  try {
    const size = statSync(path).size;
    if (size > MAX_BYTES)
      return fail(`${path} is ${(size / 1024 / 1024).toFixed(1)} MB; instance files are limited to 5 MB`);
    text = readFileSync(path, "utf8");
  } catch (e) {
    const code = (e as NodeJS.ErrnoException).code;
    return fail(code === "ENOENT" ? `${path} does not exist` : `cannot read ${path}: ${(e as Error).message}`);
  }
  let instance: ReturnType<typeof loadInstance>;
  try {
    instance = loadInstance(JSON.parse(text));
  } catch (e) {
    return fail(
      e instanceof SyntaxError ? `${path} is not valid JSON: ${e.message}` : `${path}: ${(e as Error).message}`,
    );
  }

  const total = instance.items.reduce((s, it) => s + it.quantity, 0);
  process.stderr.write(
    `nest: ${instance.name}, ${total} copies of ${instance.items.length} items, strip height ${instance.height}, ${seconds} s\n`,
  );
  let lastLine = -Infinity;
  const result = await nestStrip({
    items: instance.items,
    height: instance.height,
    seconds,
    seed,
    onProgress: (p) => {
      const now = performance.now();
      if (now - lastLine < 2000) return;
      lastLine = now;
      process.stderr.write(
        `  ${(p.fraction * 100).toFixed(0).padStart(3)} %  utilisation ${(p.bestUtilisation * 100).toFixed(2)} %  ${p.message ?? ""}\n`,
      );
    },
  });
  process.stderr.write(
    `nest: utilisation ${(result.utilisation * 100).toFixed(2)} %, length ${result.length}, ${result.seconds.toFixed(1)} s\n`,
  );
  process.stdout.write(`${JSON.stringify({ name: instance.name, height: instance.height, ...result })}\n`);
  return 0;
}

main(process.argv).then(
  (code) => (process.exitCode = code),
  (e: unknown) => {
    process.exitCode = fail((e as Error).message ?? String(e));
  },
);
