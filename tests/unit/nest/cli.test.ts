// `npm run nest`: JSON on stdout for a good instance; for a missing, oversize or malformed file a
// plain message on stderr and exit code 1.
import { execFile } from "node:child_process";
import { mkdtempSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { fileURLToPath } from "node:url";
import { afterAll, describe, expect, it } from "vitest";

const root = fileURLToPath(new URL("../../../", import.meta.url));
const tsx = join(root, "node_modules/tsx/dist/cli.mjs");

function nest(...args: string[]): Promise<{ code: number; stdout: string; stderr: string }> {
  return new Promise((resolve) => {
    execFile(
      process.execPath,
      [tsx, "scripts/nest.ts", ...args],
      { cwd: root, timeout: 60_000 },
      (error, stdout, stderr) =>
        resolve({ code: error ? ((error as { code?: number }).code ?? 1) : 0, stdout, stderr }),
    );
  });
}

describe("scripts/nest.ts", () => {
  const dir = mkdtempSync(join(tmpdir(), "nest-cli-"));
  afterAll(() => rmSync(dir, { recursive: true, force: true }));

  it("prints the layout as JSON", async () => {
    const r = await nest("tests/fixtures/nesting/fu.json", "--seconds", "1", "--seed", "2");
    expect(r.code).toBe(0);
    const out = JSON.parse(r.stdout);
    expect(out).toMatchObject({ name: "fu", placed: 12, cancelled: false });
    expect(out.utilisation).toBeGreaterThan(0);
    expect(out.length).toBeGreaterThan(0);
    expect(out.placements).toHaveLength(12);
    expect(Object.keys(out.placements[0]).sort()).toEqual(["copy", "id", "rotation", "x", "y"]);
    expect(r.stderr).toMatch(/nest: utilisation/);
  }, 30_000);

  it.each([
    ["a missing file", () => join(dir, "nope.json"), /does not exist/],
    [
      "a file over 5 MB",
      () => (writeFileSync(join(dir, "big.json"), " ".repeat(5 * 1024 * 1024 + 1)), join(dir, "big.json")),
      /limited to 5 MB/,
    ],
    [
      "a file that is not JSON",
      () => (writeFileSync(join(dir, "bad.json"), "{ items: "), join(dir, "bad.json")),
      /not valid JSON/,
    ],
    [
      "an instance without items",
      () => (writeFileSync(join(dir, "empty.json"), '{"strip_height": 4, "items": []}'), join(dir, "empty.json")),
      /no items/,
    ],
  ])(
    "refuses %s with exit code 1",
    async (_what, file, message) => {
      const r = await nest(file());
      expect(r.code).toBe(1);
      expect(r.stdout).toBe("");
      expect(r.stderr).toMatch(message);
    },
    30_000,
  );
});
