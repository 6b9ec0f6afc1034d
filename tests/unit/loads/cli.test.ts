// `npm run loads -- input.json`: the JSON contract on stdout, and one line naming the field on bad input.
import { execFile } from "node:child_process";
import { mkdtempSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { fileURLToPath } from "node:url";
import { afterAll, describe, expect, it } from "vitest";

const root = fileURLToPath(new URL("../../../", import.meta.url));
const tsx = join(root, "node_modules/tsx/dist/cli.mjs");
const dir = mkdtempSync(join(tmpdir(), "loads-cli-"));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

function loads(body: unknown): Promise<{ code: number; stdout: string; stderr: string }> {
  const file = join(dir, `${Math.random().toString(36).slice(2)}.json`);
  writeFileSync(file, typeof body === "string" ? body : JSON.stringify(body));
  return new Promise((resolve) => {
    execFile(
      process.execPath,
      [tsx, "scripts/loads.ts", file],
      { cwd: root, timeout: 60_000 },
      (error, stdout, stderr) =>
        resolve({ code: error ? ((error as { code?: number }).code ?? 1) : 0, stdout, stderr }),
    );
  });
}

const good = {
  spec: { mode: "track-for-wheel", wheel: { kind: "polygon", sides: 4, side: 400 } },
  use: "ride-on",
  load: { riderMassKg: 110, dynamicFactor: 2, wheels: 2 },
  traction: 0.2,
  mu: 0.6,
  wheel: { modulusGpa: 6.86, poisson: 0.3, treadWidthMm: 36, allowableMpa: 4 },
  track: {
    modulusGpa: 6.86,
    poisson: 0.3,
    widthMm: 300,
    depthMm: 18,
    supportSpanMm: 600,
    densityKgM3: 680,
    allowableMpa: 4,
  },
  clearancesMm: { "wheel to frame": 12 },
};

describe("scripts/loads.ts", () => {
  it("prints the contract's fields", async () => {
    const r = await loads(good);
    expect(r.stderr).toBe("");
    expect(r.code).toBe(0);
    const out = JSON.parse(r.stdout);
    expect(out.wheelLoadN).toBeCloseTo((110 * 9.80665 * 2) / 2, 9); // standard gravity (NIST SP 811)
    expect(Object.keys(out.grip)).toEqual(expect.arrayContaining(["needed", "available", "at"]));
    expect(out.grip.needed).toBeCloseTo(1.5, 9); // T7: (1 + 0.2)/(1 − 0.2)
    expect(out.grip.margin).toBeCloseTo(0.6 / 1.5, 9);
    expect(Object.keys(out.contact)).toEqual(
      expect.arrayContaining(["radiusMm", "halfWidthMm", "pMaxMpa", "tauMaxMpa", "depthMm", "at"]),
    );
    expect(out.contact.radiusMm).toBe(0); // a sharp square
    expect(Object.keys(out.deflection)).toEqual(
      expect.arrayContaining(["pointLoadMm", "selfWeightMm", "limitMm", "maxSpanMm"]),
    );
    expect(out.cautions.length).toBeGreaterThan(3);
    for (const c of out.cautions) {
      expect(["DANGER", "WARNING", "CAUTION", "NOTICE"]).toContain(c.signal);
      for (const k of ["hazard", "consequence", "avoid", "figure", "limit", "source"])
        expect(typeof c[k]).toBe("string");
    }
    expect(out.cautions.map((c: { check: string }) => c.check)).toEqual(
      expect.arrayContaining(["nip", "grip", "contact", "deflection", "gap"]),
    );
  }, 60_000);

  it.each([
    ["a Poisson's ratio over 0.49", { ...good, wheel: { ...good.wheel, poisson: 0.7 } }, /^wheel\.poisson: /],
    ["a misspelt field", { ...good, track: { ...good.track, spanMm: 3 } }, /^track: .*spanMm/],
    ["a use it does not know", { ...good, use: "ride" }, /^use: /],
    ["a negative rider mass", { ...good, load: { riderMassKg: -5 } }, /^load\.riderMassKg: /],
    [
      "a bad design",
      { ...good, spec: { mode: "track-for-wheel", wheel: { kind: "polygon", sides: 2, side: 4 } } },
      /^spec\.wheel\.sides: /,
    ],
    ["text that is not JSON", "{ spec: ", /^input: cannot read JSON/],
  ])(
    "%s: exit 1 and one line naming the field",
    async (_what, body, line) => {
      const r = await loads(body);
      expect(r.code).toBe(1);
      expect(r.stdout).toBe("");
      expect(r.stderr.trimEnd().split("\n")).toHaveLength(1);
      expect(r.stderr).toMatch(line);
    },
    60_000,
  );
});
