// The installer's assembly sheet as a PDF, read back with Debian's poppler-utils (pdfinfo, pdffonts,
// pdftotext, pdftoppm), which share no code with pdfkit: paper sizes, embedded fonts, the text the
// issue asks for, glyphs that really print, and a layout plan that is really to scale.
import { beforeAll, describe, expect, it } from "vitest";
import { assemblySheetPdf } from "@/lib/assembly/pdf";
import type { AssemblySheet, Paper } from "@/lib/assembly/sheet";
import {
  darkPixels,
  pdffonts,
  pdfinfo,
  pdftextPages,
  pdfWords,
  type PageWords,
  type Word,
} from "./support/pdf-poppler";
import { longRun, trikeSheet, unapprovedPair } from "./support/pdf-sheets";

const MM_PER_IN = 25.4; // 1 in = 25.4 mm exactly (the international inch, NIST Handbook 44 Appendix C)
const PT_PER_MM = 72 / MM_PER_IN; // 1 pt = 1/72 in (PDF user space unit, ISO 32000-1 §8.3.2.3)
// ISO 5455:1979 §5: full size and the recommended reduction scales, 1 : d.
const ISO_5455 = [1, 2, 5, 10, 20, 50, 100, 200, 500, 1000, 2000, 5000, 10000];
// The sign-off block.
const SIGN_OFF = ["Installed by", "Date", "Checked level (max deviation found)", "Signature"];

const flat = (s: string) => s.replace(/\s+/g, " ");
const mm1 = (v: number) => `${v.toFixed(1)} mm`;
const in2 = (v: number) => `${(v / MM_PER_IN).toFixed(2)} in`;
const centre = (w: Word) => (w.xMin + w.xMax) / 2;

interface Read {
  pdf: Buffer;
  info: string;
  pages: string[];
  text: string;
  words: PageWords[];
}

async function render(sheet: AssemblySheet, paper: Paper): Promise<Read> {
  const pdf = await assemblySheetPdf(sheet, { paper });
  const pages = pdftextPages(pdf).filter((p, i, all) => i < all.length - 1 || p.trim());
  return { pdf, info: pdfinfo(pdf), pages, text: flat(pages.join(" ")), words: pdfWords(pdf) };
}

/** The pages of the layout plan: those with a strip on them. */
const planPages = (r: Read) => r.words.filter((p) => p.words.some((w) => w.text === "Strip"));

/** The scale printed on the plan, "SCALE 1 : d". */
function printedScale(r: Read): number {
  const m = r.text.match(/SCALE 1 : (\d+)/);
  expect(m, "the plan states its scale").not.toBeNull();
  return Number(m![1]);
}

/** A word's strip: the nearest strip header above it on its page. */
function stripOf(page: PageWords, w: Word): number {
  const headers = page.words.filter((h) => h.text === "Strip" && h.yMin < w.yMin);
  return Math.max(...headers.map((h) => h.yMin));
}

/**
 * The lines of a plan label under its name (S3, T01/T02): on each of the next `n` lines, the run of
 * words (split where the gap is wider than a space) that spans the name's centre.
 */
function labelLines(page: PageWords, name: Word, n: number): string[] {
  const cx = centre(name);
  const below = page.words.filter((w) => w.yMin > name.yMin + 1 && w.yMin < name.yMax + n * 8);
  const ys = [...new Set(below.map((w) => w.yMin.toFixed(1)))].sort((a, b) => Number(a) - Number(b));
  return ys.slice(0, n).map((y) => {
    const line = below.filter((w) => w.yMin.toFixed(1) === y).sort((a, b) => a.xMin - b.xMin);
    const runs: Word[][] = [];
    for (const w of line) {
      const last = runs.at(-1);
      if (last && w.xMin - last.at(-1)!.xMax < 4) last.push(w);
      else runs.push([w]);
    }
    const hit = runs.find((r) => r[0].xMin <= cx + 2 && r.at(-1)!.xMax >= cx - 2);
    return hit ? hit.map((w) => w.text).join(" ") : "";
  });
}

function expectInsidePrintableArea(r: Read) {
  const edge = 10 * PT_PER_MM; // a printer's unprintable edge is under 10 mm
  for (const page of r.words)
    for (const w of page.words) {
      expect(w.xMin, `"${w.text}" on page ${w.page + 1}`).toBeGreaterThanOrEqual(edge);
      expect(w.xMax, `"${w.text}" on page ${w.page + 1}`).toBeLessThanOrEqual(page.width - edge);
      expect(w.yMin, `"${w.text}" on page ${w.page + 1}`).toBeGreaterThanOrEqual(edge);
      expect(w.yMax, `"${w.text}" on page ${w.page + 1}`).toBeLessThanOrEqual(page.height - edge);
    }
}

describe.each([
  // ISO 216: A4 is 210 × 297 mm = 595.28 × 841.89 pt; pdfinfo names the size.
  { paper: "a4" as const, size: "Page size:       595.28 x 841.89 pts (A4)" },
  // ANSI/ASME Y14.1 size A, US Letter: 8.5 × 11 in = 612 × 792 pt.
  { paper: "letter" as const, size: "Page size:       612 x 792 pts (letter)" },
])("the fixture's sheet on $paper", ({ paper, size }) => {
  const sheet = trikeSheet;
  const run = sheet.run!;
  let r: Read;
  beforeAll(async () => {
    r = await render(sheet, paper);
  });

  it("is the paper size asked for, with the sheet's metadata and date", () => {
    expect(r.info).toContain(size);
    expect(r.info).toMatch(/^Title:\s+Assembly sheet: Square-wheel trike run, Trike run track R1$/m);
    expect(r.info).toMatch(/^Author:\s+Lantern & Lathe Works$/m);
    expect(r.info).toMatch(/^Subject:\s+.*c1bffccc10f9\/2026-11-20/m);
    expect(r.info).toMatch(/^CreationDate:\s+2026-12-02T15:00:00Z$/m);
  });

  it("gives the same bytes for the same sheet", async () => {
    expect((await assemblySheetPdf(sheet, { paper })).equals(r.pdf)).toBe(true);
  });

  it("embeds IBM Plex Sans and Mono and no other font", () => {
    const rows = pdffonts(r.pdf)
      .split("\n")
      .slice(2)
      .filter((l) => l.trim());
    expect(rows.length).toBeGreaterThan(0);
    for (const row of rows) {
      expect(row).toMatch(/^[A-Z]{6}\+IBMPlex(Sans|Mono)(-\S+)?\s+CID TrueType\s+Identity-H\s+yes yes yes/);
    }
    expect(rows.some((l) => /\+IBMPlexSans/.test(l))).toBe(true);
    expect(rows.some((l) => /\+IBMPlexMono/.test(l))).toBe(true);
  });

  it("prints its glyphs (not only a text layer): the cover's title has ink", () => {
    // The title "Assembly sheet" sits in the first 30 pt below the top margin's kicker line.
    expect(darkPixels(r.pdf, 1, { x: 42, y: 52, w: 200, h: 30 })).toBeGreaterThan(400);
  });

  it("has the cover: project, site, design and revision, reference, date, contact, cautions and the disclaimer", () => {
    const cover = flat(r.pages[0]);
    for (const s of [
      sheet.project.name,
      sheet.project.site,
      `${sheet.design.name}, R1`,
      sheet.approval!.reference,
      "2026-12-02",
      sheet.shop.name,
      sheet.shop.contact,
    ])
      expect(cover).toContain(s);
    for (const c of sheet.cautions) expect(cover).toContain(flat(`${c.signal} ${c.text}`));
    expect(cover).toContain(flat(sheet.disclaimer));
    expect(cover).not.toContain("NOT APPROVED");
  });

  it("lists every part by its engraved id with name, material, quantity and sheet", () => {
    for (const p of sheet.parts)
      expect(r.text).toContain(`${p.id} ${p.name} ${p.material} ${p.quantity} ${p.sheets.join(", ")}`);
  });

  it("gives every joint's station in mm and inches, and every support's label", () => {
    const [page] = planPages(r);
    const named = (t: string) => page.words.find((w) => w.text === t)!;
    for (const j of sheet.joints) {
      // The inches go under the millimetres, on the plan and in the joint schedule.
      expect(labelLines(page, named(j.between.join("/")), 2)).toEqual([mm1(j.station), `(${in2(j.station)})`]);
      expect(r.text).toContain(`${mm1(j.station)} ${j.between[0]} and ${j.between[1]} Key ${j.detail.split(" ")[0]}`);
    }
    run.supports.forEach((s, i) => expect(labelLines(page, named(`S${i + 1}`), 2)).toEqual([mm1(s), `(${in2(s)})`]));
    expect(flat(r.pages[1])).toContain("direction of travel");
  });

  it("has the level and position table with ± tolerances in mm and inches beside each row", () => {
    for (const l of sheet.levels) {
      const what = l.what === "support" ? "Support" : "Joint";
      expect(r.text).toContain(
        `${l.label} ${what} ${mm1(l.station)} ${mm1(l.topHeight)} ± ${l.tolerance.toFixed(2)} mm`,
      );
      expect(r.text).toContain(
        `(${in2(l.station)}) (${in2(l.topHeight)}) (± ${(l.tolerance / MM_PER_IN).toFixed(3)} in)`,
      );
    }
    expect(r.text).toContain("± 0.42 mm");
  });

  it("has the order of assembly, fasteners, tools and the sign-off block", () => {
    sheet.steps.forEach((s, i) => expect(r.text).toContain(`${i + 1}. ${flat(s)}`));
    for (const f of [...sheet.fasteners, ...sheet.tools]) expect(r.text).toContain(f);
    for (const label of SIGN_OFF) expect(r.text).toContain(label);
  });

  it("puts the footer on every page: project, design and revision, reference, page n of N", () => {
    r.pages.forEach((p, i) =>
      expect(flat(p)).toContain(
        `Square-wheel trike run · Trike run track R1 · c1bffccc10f9/2026-11-20 page ${i + 1} of ${r.pages.length}`,
      ),
    );
  });

  it("draws the plan to a standard scale: label spacing is station difference × scale", () => {
    const d = printedScale(r);
    expect(ISO_5455).toContain(d);
    expect(d).toBe(10); // 1410.2 mm at 1 : 10 is 141 mm, which fits the page width in one strip; 1 : 5 would not
    const k = PT_PER_MM / d;
    const [page] = planPages(r);
    const word = (t: string) => {
      const found = page.words.filter((w) => w.text === t);
      expect(found, t).toHaveLength(1);
      return found[0];
    };
    const s1 = centre(word("S1"));
    run.supports.forEach((x, i) => expect(centre(word(`S${i + 1}`)) - s1).toBeCloseTo((x - run.supports[0]) * k, 1));
    for (const j of sheet.joints)
      expect(centre(word(j.between.join("/"))) - s1).toBeCloseTo((j.station - run.supports[0]) * k, 1);
    for (const seg of run.segments)
      expect(centre(word(seg.id)) - s1).toBeCloseTo(((seg.x0 + seg.x1) / 2 - run.supports[0]) * k, 1);
  });

  it("keeps every word on the printable part of the page", () => expectInsidePrintableArea(r));
});

describe("a pair of wheels nobody has approved", () => {
  let r: Read;
  beforeAll(async () => {
    r = await render(unapprovedPair(), "a4");
  });

  it("says NOT APPROVED on the cover and in every footer, and has no layout plan", () => {
    expect(flat(r.pages[0])).toContain("NOT APPROVED — FOR REVIEW ONLY");
    expect(flat(r.pages[0])).toContain("Do not install production parts from this sheet.");
    r.pages.forEach((p, i) =>
      expect(flat(p)).toContain(`Trike run track R1 · NOT APPROVED page ${i + 1} of ${r.pages.length}`),
    );
    expect(r.text).toContain("This design has no track run");
    expect(r.text).not.toMatch(/SCALE 1 :/);
    expect(r.text).not.toContain("direction of travel");
    expect(planPages(r)).toHaveLength(0);
    for (const label of SIGN_OFF) expect(r.text).toContain(label);
  });

  it("keeps every word on the printable part of the page", () => expectInsidePrintableArea(r));
});

describe.each(["a4", "letter"] as const)("a 20 m run on %s", (paper) => {
  const sheet = longRun(20000);
  const run = sheet.run!;
  let r: Read;
  beforeAll(async () => {
    r = await render(sheet, paper);
  });

  it("is cut into strips at one standard scale that cover the run end to end", () => {
    expect(ISO_5455).toContain(printedScale(r));
    const strips = [...r.text.matchAll(/Strip (\d+) of (\d+) · x = ([\d.]+) to ([\d.]+) mm/g)].map((m) => ({
      n: Number(m[1]),
      of: Number(m[2]),
      x0: Number(m[3]),
      x1: Number(m[4]),
    }));
    expect(strips.length).toBeGreaterThan(1);
    strips.forEach((s, i) => {
      expect(s.n).toBe(i + 1);
      expect(s.of).toBe(strips.length);
      expect(s.x0).toBeCloseTo(i === 0 ? 0 : strips[i - 1].x1, 6);
    });
    expect(strips.at(-1)!.x1).toBeCloseTo(run.length, 1);
  });

  it("labels every support, spaced to the scale within each strip", () => {
    const k = PT_PER_MM / printedScale(r);
    const found = run.supports.map((x, i) => {
      const hits = planPages(r).flatMap((p) =>
        p.words.filter((w) => w.text === `S${i + 1}`).map((w) => ({ page: p, w })),
      );
      expect(hits, `S${i + 1}`).toHaveLength(1);
      return { x, page: hits[0].page, w: hits[0].w, strip: `${hits[0].w.page}:${stripOf(hits[0].page, hits[0].w)}` };
    });
    let pairs = 0;
    for (let i = 1; i < found.length; i++) {
      if (found[i].strip !== found[i - 1].strip) continue;
      expect(centre(found[i].w) - centre(found[i - 1].w)).toBeCloseTo((found[i].x - found[i - 1].x) * k, 1);
      pairs++;
    }
    expect(pairs).toBeGreaterThan(run.supports.length / 2);
  });

  it("keeps every word on the printable part of the page", () => expectInsidePrintableArea(r));
});
