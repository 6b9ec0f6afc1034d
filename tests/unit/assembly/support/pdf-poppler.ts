// Debian's poppler-utils (pdfinfo, pdffonts, pdftotext, pdftoppm) read the PDFs back for the tests:
// a reader that shares no code with pdfkit. Missing tools fail the test with the command that
// installs them; they are never skipped.
import { execFileSync } from "node:child_process";
import { existsSync, mkdtempSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";

function tool(name: string): string {
  const file = `/usr/bin/${name}`;
  if (!existsSync(file))
    throw new Error(`${file} is missing: install Debian's poppler-utils (apt-get install poppler-utils)`);
  return file;
}

function withFile<T>(pdf: Buffer, run: (file: string) => T): T {
  const dir = mkdtempSync(path.join(tmpdir(), "axlewright-pdf-"));
  try {
    const file = path.join(dir, "sheet.pdf");
    writeFileSync(file, pdf);
    return run(file);
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}

const run = (name: string, args: string[]) => execFileSync(tool(name), args, { maxBuffer: 64 << 20 });

export const pdfinfo = (pdf: Buffer) => withFile(pdf, (f) => run("pdfinfo", ["-isodates", f]).toString("utf8"));

export const pdffonts = (pdf: Buffer) => withFile(pdf, (f) => run("pdffonts", [f]).toString("utf8"));

/** The text in reading layout, pages split on form feeds. */
export const pdftextPages = (pdf: Buffer) =>
  withFile(pdf, (f) => run("pdftotext", ["-layout", "-enc", "UTF-8", f, "-"]).toString("utf8").split("\f"));

export interface Word {
  page: number;
  text: string;
  xMin: number;
  yMin: number;
  xMax: number;
  yMax: number;
}

export interface PageWords {
  width: number;
  height: number;
  words: Word[];
}

const decode = (s: string) =>
  s
    .replace(/&lt;/g, "<")
    .replace(/&gt;/g, ">")
    .replace(/&quot;/g, '"')
    .replace(/&#39;/g, "'")
    .replace(/&amp;/g, "&");

/** Every word with its box in pt from the page's top-left (pdftotext -bbox). */
export function pdfWords(pdf: Buffer): PageWords[] {
  const html = withFile(pdf, (f) => run("pdftotext", ["-bbox", "-enc", "UTF-8", f, "-"]).toString("utf8"));
  const pages: PageWords[] = [];
  for (const m of html.matchAll(/<page width="([\d.]+)" height="([\d.]+)">([\s\S]*?)<\/page>/g)) {
    const page = pages.length;
    const words = [
      ...m[3].matchAll(/<word xMin="([\d.-]+)" yMin="([\d.-]+)" xMax="([\d.-]+)" yMax="([\d.-]+)">([^<]*)<\/word>/g),
    ].map((w) => ({
      page,
      xMin: Number(w[1]),
      yMin: Number(w[2]),
      xMax: Number(w[3]),
      yMax: Number(w[4]),
      text: decode(w[5]),
    }));
    pages.push({ width: Number(m[1]), height: Number(m[2]), words });
  }
  return pages;
}

/** How many pixels are darker than mid-grey in a box of a page rendered at 72 dpi (1 px = 1 pt). */
export function darkPixels(pdf: Buffer, page: number, box: { x: number; y: number; w: number; h: number }): number {
  const pgm = withFile(pdf, (f) =>
    run("pdftoppm", [
      "-gray",
      "-r",
      "72",
      "-f",
      String(page),
      "-l",
      String(page),
      "-x",
      String(box.x),
      "-y",
      String(box.y),
      "-W",
      String(box.w),
      "-H",
      String(box.h),
      f,
    ]),
  );
  // Binary PGM (P5): three header lines (magic, size, maxval), then one byte a pixel.
  let at = 0;
  for (let lines = 0; lines < 3; at++) if (pgm[at] === 0x0a) lines++;
  let dark = 0;
  for (let i = at; i < pgm.length; i++) if (pgm[i] < 128) dark++;
  return dark;
}
