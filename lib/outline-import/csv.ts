// Points as text: one x, y pair per row, separated by a comma, semicolon, tab or spaces (decided
// from the first data row; with semicolons, a decimal comma such as "1,5" is read as 1.5). An
// optional header row of two non-numeric fields may name the units as "(mm)" / "[in]". Blank rows
// and rows starting with "#" are skipped. Numbers follow the plain decimal form with an optional
// exponent; "0x10", "Infinity" or "1,000" are refused with the line that holds them.

import { fail, MAX_OUTPUT_POINTS, type Pt, type ReadResult, type Units } from "./common";

const NUMBER = /^[+-]?(?:\d+\.?\d*|\.\d+)(?:[eE][+-]?\d+)?$/;

type Delim = "\t" | ";" | "," | "space";

function split(line: string, d: Delim): string[] {
  const t = line.trim();
  const cells = d === "space" ? t.split(/\s+/) : t.split(d).map((c) => c.trim());
  return cells.map((c) => (c.length >= 2 && c.startsWith('"') && c.endsWith('"') ? c.slice(1, -1).trim() : c));
}

export function readCsv(text: string): ReadResult {
  const lines = text.split(/\r\n|\r|\n/);
  const notes: string[] = [];
  const points: Pt[] = [];
  let delim: Delim | null = null;
  let units: Units = "unknown";
  let headerSeen = false;
  let decimalComma = false;
  let comments = 0;
  for (let i = 0; i < lines.length; i++) {
    const raw = lines[i];
    const line = raw.trim();
    const no = i + 1;
    if (line === "") continue;
    if (line.startsWith("#")) {
      comments++;
      continue;
    }
    const d: Delim =
      delim ?? (line.includes("\t") ? "\t" : line.includes(";") ? ";" : line.includes(",") ? "," : "space");
    let cells = split(line, d);
    if (cells.length === 3 && cells[2] === "" && d !== "space") cells = cells.slice(0, 2); // a trailing separator
    const numeric = cells.map((c) => NUMBER.test(d === ";" && /^[+-]?\d*,\d+$/.test(c) ? c.replace(",", ".") : c));
    if (points.length === 0 && !headerSeen && numeric.every((ok) => !ok)) {
      if (cells.length !== 2) fail(`CSV line ${no}: the header row has ${cells.length} columns; expected two (x, y).`);
      headerSeen = true;
      const u = /[([]\s*(mm|in)\s*[)\]]/i.exec(line);
      if (u) units = u[1].toLowerCase() as Units;
      notes.push(`header row: ${cells.join(", ")}${u ? ` (units ${units})` : ""}`);
      continue;
    }
    delim = d;
    if (cells.length !== 2)
      fail(
        `CSV line ${no}: expected two numbers (x, y) but found ${cells.length} column${cells.length === 1 ? "" : "s"} ("${line.slice(0, 40)}").`,
      );
    const xy: number[] = [];
    for (let c = 0; c < 2; c++) {
      let cell = cells[c];
      if (d === ";" && /^[+-]?\d*,\d+$/.test(cell)) {
        cell = cell.replace(",", ".");
        decimalComma = true;
      }
      if (!NUMBER.test(cell)) fail(`CSV line ${no}: "${cells[c].slice(0, 30)}" in column ${c + 1} is not a number.`);
      const v = Number(cell);
      if (!Number.isFinite(v)) fail(`CSV line ${no}: "${cells[c].slice(0, 30)}" in column ${c + 1} is out of range.`);
      xy.push(v);
    }
    if (points.length >= MAX_OUTPUT_POINTS + 1)
      fail(
        `The CSV has more than ${MAX_OUTPUT_POINTS.toLocaleString("en-US")} points (the engine's limit); the extra ones start at line ${no}.`,
      );
    points.push([xy[0], xy[1]]);
  }
  if (points.length === 0) fail("The CSV has no rows of numbers.");
  if (decimalComma) notes.push("decimal commas read (semicolon-separated columns)");
  if (comments) notes.push(`skipped ${comments} comment line${comments === 1 ? "" : "s"} starting with #`);
  if (units === "unknown")
    notes.push('units unknown: CSV points carry none (a header such as "x (mm), y (mm)" names them)');
  return {
    subpaths: [{ points, closed: false, vertexList: true, arcs: 0, curves: 0, label: "the CSV points" }],
    units,
    notes,
  };
}
