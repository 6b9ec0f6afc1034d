// The command line (scripts/export.ts): its flags parsed in-process, then two real runs as a child
// process — an unreadable spec (exit code 1 with a clear message) and a nested DXF from a spec file.
import { spawnSync } from "node:child_process";
import { existsSync, mkdtempSync, readFileSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import DxfParser from "dxf-parser";
import { revisionBaseName } from "@/lib/cut";
import { parseArgs, projectFor, UsageError } from "@/scripts/export";
import { SQUARE_SPEC } from "./support/fixtures";

const TSX = join(process.cwd(), "node_modules", ".bin", "tsx");
const run = (args: string[]) => spawnSync(TSX, ["scripts/export.ts", ...args], { encoding: "utf8", timeout: 60_000 });

function usage(argv: string[]): string {
  try {
    parseArgs(argv);
  } catch (e) {
    if (e instanceof UsageError) return e.message;
    throw e;
  }
  throw new Error("expected a usage error");
}

describe("npm run export", () => {
  const dir = mkdtempSync(join(tmpdir(), "axlewright-cli-"));
  const spec = join(dir, "square.json");
  writeFileSync(spec, JSON.stringify(SQUARE_SPEC));

  it("parses its flags, and names the bad ones", () => {
    for (const sheet of ["2440x1220", "2440X1220", "2440×1220", "2440 x 1220"])
      expect(parseArgs(["s.json", "--format", "zip", "--out", "o.zip", "--sheet", sheet]).sheet).toEqual({
        length: 2440,
        width: 1220,
      });
    expect(parseArgs(["s.json", "--format=dxf", "--out=o.dxf", "--length", "6000"])).toMatchObject({
      format: "dxf",
      out: "o.dxf",
      length: 6000,
    });
    expect(usage(["s.json", "--format", "pdf", "--out", "x"])).toBe('--format must be dxf, svg or zip, not "pdf".');
    expect(usage(["s.json", "--format", "dxf", "--out", "x", "--sheet", "big"])).toMatch(
      /--sheet must look like 2440x1220/,
    );
    expect(usage(["s.json", "--format", "dxf", "--out", "x", "--length", "-5"])).toMatch(
      /--length needs a positive number/,
    );
    expect(usage(["s.json", "--format", "dxf"])).toBe("Give --out FILE.");
    expect(usage(["--format", "dxf", "--out", "x"])).toBe("Give a spec file.");
    expect(usage(["s.json", "--format", "dxf", "--out", "x", "--colour", "red"])).toBe("Unknown flag --colour.");
  });

  it("engraves the design's own name without --project, never the product's", () => {
    expect(projectFor({ spec: "/jobs/trike-run.json" })).toBe("trike-run");
    expect(projectFor({ spec: "/jobs/trike-run.json", project: "Motion Hall" })).toBe("Motion Hall");
  });

  it("keeps the revision in file names however long the project and design names are", () => {
    const long = "Northfold Discovery Centre square-wheel trike run for the motion hall";
    const [r1, r2] = [1, 2].map((n) => revisionBaseName(n, long, "Trike run track with rounded corners, second try"));
    expect(r1).not.toBe(r2);
    expect(r1.startsWith("r1-")).toBe(true);
    expect(r2.startsWith("r2-")).toBe(true);
    expect(r1.length).toBeLessThanOrEqual(60);
    expect(revisionBaseName(12, "")).toBe("r12");
  });

  it("exits with 1 and a clear message for an unreadable spec", () => {
    const missing = run([join(dir, "nope.json"), "--format", "dxf", "--out", join(dir, "x.dxf")]);
    expect(missing.status).toBe(1);
    expect(missing.stderr).toMatch(/error: cannot read a JSON spec from .*nope\.json/);
  });

  it("writes a nested DXF in mm for a 1.5 m run on 2440 × 1220 sheets", () => {
    const out = join(dir, "run.dxf");
    const r = run([
      spec,
      "--format",
      "dxf",
      "--out",
      out,
      "--length",
      "1500",
      "--sheet",
      "2440×1220",
      "--seconds",
      "1",
    ]);
    expect(r.status, r.stderr).toBe(0);
    expect(existsSync(out)).toBe(true);
    const dxf = new DxfParser().parseSync(readFileSync(out, "utf8"))!;
    expect(dxf.header.$INSUNITS).toBe(4);
    expect(dxf.entities.filter((e) => e.layer === "REFERENCE").length).toBeGreaterThanOrEqual(1); // a sheet outline per sheet
    expect(r.stderr).toMatch(/wrote .*run\.dxf: 2 parts \(4 pieces\)/); // one track segment × 2 lines, the wheel × 2
  });
});
