// The bill of materials (RFC 4180 CSV), the job README and the ZIP bundle read back with Info-ZIP's
// unzip (/usr/bin/unzip), the PNG previews with sharp's own metadata reader.
import { execFileSync } from "node:child_process";
import { mkdtempSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { beforeAll, describe, expect, it } from "vitest";
import sharp from "sharp";
import { buildCutParts, type CutPlanResult } from "@/lib/cut/plan";
import { kerfParts, type ToolPath } from "@/lib/cut/kerf";
import { bomCsv, csvField } from "@/lib/cut/export/bom-csv";
import { jobTextFiles, slug, type JobInput } from "@/lib/cut/export/job";
import { jobZip } from "@/lib/cut/export/zip";
import { DEMO_SETTINGS, font, rowNest, SQUARE_SPEC, squareResult } from "./support/fixtures";

/** A small RFC 4180 reader of our own: quoted fields, doubled quotes, CRLF records. */
function parseCsv(text: string): string[][] {
  const rows: string[][] = [];
  let row: string[] = [];
  let field = "";
  let quoted = false;
  for (let i = 0; i < text.length; i++) {
    const ch = text[i];
    if (quoted) {
      if (ch === '"' && text[i + 1] === '"') {
        field += '"';
        i++;
      } else if (ch === '"') quoted = false;
      else field += ch;
    } else if (ch === '"') quoted = true;
    else if (ch === ",") {
      row.push(field);
      field = "";
    } else if (ch === "\r" && text[i + 1] === "\n") {
      row.push(field);
      rows.push(row);
      row = [];
      field = "";
      i++;
    } else field += ch;
  }
  return rows;
}

describe("BOM, README and ZIP", () => {
  let plan: CutPlanResult;
  let paths: Map<string, ToolPath>;
  let job: JobInput;
  beforeAll(async () => {
    const material = 'Birch plywood, "BB/BB" grade';
    plan = buildCutParts(SQUARE_SPEC, squareResult(), { ...DEMO_SETTINGS, material }, { font: font() });
    paths = (await kerfParts(plan.parts, plan.settings)).paths;
    const nest = rowNest(plan.parts, { length: 2440, width: 1220 }, 10, 6);
    job = {
      baseName: slug("Square-wheel trike run"),
      design: "Trike run",
      revision: 3,
      result: squareResult(),
      plan,
      toolPaths: paths,
      nest,
    };
  });

  it("quotes CSV fields as RFC 4180 says", () => {
    expect(csvField("plain")).toBe("plain");
    expect(csvField("a,b")).toBe('"a,b"');
    expect(csvField('say "hi"')).toBe('"say ""hi"""');
    expect(csvField("two\nlines")).toBe('"two\nlines"');
    expect(csvField(18)).toBe("18");
  });

  it("lists every part with material, thickness, sheets, size and quantity", () => {
    const nest = rowNest(plan.parts, { length: 2440, width: 1220 }, 10, 6);
    const csv = bomCsv(plan.parts, { material: plan.settings.material, thickness: 18, units: "mm", nest });
    expect(csv.endsWith("\r\n")).toBe(true);
    expect(
      csv
        .split("\r\n")
        .slice(0, -1)
        .every((l) => !l.includes("\n")),
    ).toBe(true);
    const rows = parseCsv(csv);
    expect(rows[0]).toEqual(["part", "name", "material", "thickness (mm)", "sheet", "size L×W (mm)", "quantity"]);
    expect(rows).toHaveLength(plan.parts.length + 1);
    for (const [i, p] of plan.parts.entries()) {
      const r = rows[i + 1];
      expect(r[0]).toBe(p.id);
      expect(r[2]).toBe('Birch plywood, "BB/BB" grade');
      expect(r[3]).toBe("18");
      expect(Number(r[6])).toBe(p.quantity);
      const sheets = nest.sheets.filter((s) => s.placements.some((q) => q.id === p.id)).map((s) => s.index + 1);
      expect(r[4]).toBe(sheets.join(", "));
    }
    expect(rows.find((r) => r[0] === "W1")![5]).toBe("400 × 400"); // the 400 mm square
  });

  it("writes a README with the design, hash, settings, sheets, parts, warnings and cautions", () => {
    const readme = jobTextFiles(job).files.find((f) => f.name === "README.txt")!.data as string;
    expect(readme).toContain("Square-wheel trike run");
    expect(readme).toContain("Revision:    3");
    expect(readme).toContain(squareResult().specHash);
    expect(readme).toMatch(/Kerf mode: {3}NOMINAL OUTLINES/);
    expect(readme).toMatch(/Sheet 1: [\d.]+ % used/);
    for (const p of plan.parts) expect(readme).toMatch(new RegExp(`^${p.id}\\s+${p.quantity}\\s`, "m"));
    expect(readme).toContain("3 mm radius in 17 sharp troughs");
    // The load-path check's cautions in ANSI Z535.4 signal words, each with its figure, limit and
    // source, and the deferral to the authority having jurisdiction (lib/loads). No load settings
    // came with this job, so it ran on the library's starting figures (pushed by hand) and says so.
    expect(readme).toContain("Load settings: the shop library's starting figures");
    expect(readme).toMatch(/^WARNING {2}Pinch point where the wheel meets the track/m);
    expect(readme).toMatch(/^CAUTION {2}The contact needs more grip/m);
    expect(readme).toMatch(/^NOTICE {3}The wheel has sharp corners/m);
    expect(readme).toMatch(/Source: ISO 13854:2017/);
    expect(readme).toContain("the authority having jurisdiction");
    expect(readme).toContain("licensed professional engineer");
    // The square needs μ = tan(45° + atan 0.1) = 1.22 at its corners with the default traction (docs/safety.md T7).
    expect(readme).toMatch(/μ needed 1\.22 with traction H\/V = 0\.1/);
    // No approval came with this job: it says so at the top.
    expect(readme.split("\n").slice(0, 4).join("\n")).toContain("*** NOT APPROVED — FOR REVIEW ONLY ***");
  });

  it("bundles everything in one ZIP that unzip reads back", async () => {
    const zip = await jobZip(job, { pngWidth: 400 });
    const dir = mkdtempSync(join(tmpdir(), "axlewright-zip-"));
    const file = join(dir, "job.zip");
    writeFileSync(file, zip);
    const listing = execFileSync("/usr/bin/unzip", ["-Z1", file], { encoding: "utf8" }).trim().split("\n").sort();
    const base = "square-wheel-trike-run";
    const expected = [
      "README.txt",
      `${base}-bom.csv`,
      `${base}-parts-mm.dxf`,
      `${base}-parts-mm.svg`,
      `${base}-parts-preview.png`,
      ...job.nest!.sheets.flatMap((s) => [
        `${base}-sheet-${s.index + 1}-mm.dxf`,
        `${base}-sheet-${s.index + 1}-mm.svg`,
        `${base}-sheet-${s.index + 1}-preview.png`,
      ]),
    ].map((n) => `${base}/${n}`);
    expect(listing).toEqual(expected.sort());
    execFileSync("/usr/bin/unzip", ["-tq", file]); // CRC check of every entry; throws on a bad archive
    const readme = execFileSync("/usr/bin/unzip", ["-p", file, `${base}/README.txt`], { encoding: "utf8" });
    expect(readme).toBe(jobTextFiles(job).files.find((f) => f.name === "README.txt")!.data);
    const png = execFileSync("/usr/bin/unzip", ["-p", file, `${base}/${base}-sheet-1-preview.png`]);
    expect([...png.subarray(0, 8)]).toEqual([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]); // PNG signature (RFC 2083)
    const meta = await sharp(png).metadata();
    expect(meta.width).toBe(400);
    // The 2440 × 1220 sheet (2 : 1) and, above it, the two REFERENCE notes (approval line and revision),
    // each 10 mm high with 10 mm above it.
    expect(meta.height).toBe(Math.round((400 * (1220 + 2 * 20)) / 2440));
  });
});
