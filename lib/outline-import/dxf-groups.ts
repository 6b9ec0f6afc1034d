// The group-code / value pairs of an ASCII DXF file, one per line (AutoCAD DXF Reference, "DXF
// Format"), and its sections. Lines may end in CRLF, CR or LF and carry padding; both are tolerated.
//
// dxf-parser builds the entities (dxf-entities.ts), but this scan is kept because dxf-parser
// cannot be trusted with an upload as it stands: it gives no line numbers for messages, reads
// numbers with parseFloat (so "zero" becomes NaN and "1abc" becomes 1 without a word), loops
// forever on a POLYLINE whose SEQEND is missing, and takes an LWPOLYLINE's vertices by its count
// (group 90) rather than as listed. So here every pair is checked and each entity is located, and
// dxf-parser is then handed only the checked entities that carry geometry.

import { fail, MAX_DXF_ENTITIES } from "./common";

export interface Pair {
  code: number;
  value: string;
  /** Line of the group code (1-based); the value is on the next line. */
  line: number;
}

export interface Entity {
  type: string;
  line: number;
  pairs: Pair[];
  /** A POLYLINE's VERTEX entities. */
  vertices: Entity[];
}

interface Sections {
  entities: Entity[];
  insunits: number | null;
  blocksWithGeometry: number;
  sawEof: boolean;
}

const NUMBER = /^[+-]?(?:\d+\.?\d*|\.\d+)(?:[eE][+-]?\d+)?$/;

/** The file's pairs. */
export function pairsOf(text: string): Pair[] {
  const lines = text.split(/\r\n|\r|\n/);
  while (lines.length && lines[lines.length - 1].trim() === "") lines.pop();
  const pairs: Pair[] = [];
  for (let k = 0; k < lines.length; k += 2) {
    const codeText = lines[k].trim();
    if (!/^-?\d{1,4}$/.test(codeText))
      fail(`DXF line ${k + 1}: expected a group code (a whole number), found "${codeText.slice(0, 30)}".`);
    if (k + 1 >= lines.length)
      fail(`DXF line ${k + 1}: group code ${codeText} has no value line; the file may be cut short.`);
    pairs.push({ code: Number(codeText), value: lines[k + 1].trim(), line: k + 1 });
  }
  return pairs;
}

/** A pair's value as a number, or a refusal naming its line. */
export function num(p: Pair, type: string): number {
  if (!NUMBER.test(p.value))
    fail(`DXF line ${p.line + 1}: group ${p.code} of the ${type} should be a number, found "${p.value.slice(0, 30)}".`);
  const v = Number(p.value);
  if (!Number.isFinite(v)) fail(`DXF line ${p.line + 1}: the number "${p.value.slice(0, 30)}" is out of range.`);
  return v;
}

const BLOCK_GEOMETRY = ["LINE", "ARC", "LWPOLYLINE", "POLYLINE", "CIRCLE"];

/** The entities of an ENTITIES section, with each POLYLINE's vertices gathered under it. */
function entitiesOf(pairs: Pair[], from: number, to: number): Entity[] {
  const entities: Entity[] = [];
  let current: Entity | null = null;
  let polyline: Entity | null = null;
  let count = 0;
  for (let k = from; k < to; k++) {
    const q = pairs[k];
    if (q.code !== 0) {
      if (!current) fail(`DXF line ${q.line}: the ENTITIES section must start with an entity (group code 0).`);
      current!.pairs.push(q);
      continue;
    }
    if (++count > MAX_DXF_ENTITIES)
      fail(
        `The DXF has more than ${MAX_DXF_ENTITIES.toLocaleString("en-US")} entities, the most the importer reads; simplify the drawing.`,
      );
    current = { type: q.value, line: q.line, pairs: [], vertices: [] };
    if (polyline && q.value === "VERTEX") polyline.vertices.push(current);
    else if (polyline && q.value === "SEQEND") polyline = null;
    else {
      if (polyline) fail(`DXF line ${polyline.line}: the POLYLINE has no SEQEND after its vertices.`);
      if (q.value === "VERTEX" || q.value === "SEQEND") fail(`DXF line ${q.line}: a ${q.value} outside a POLYLINE.`);
      entities.push(current);
      if (q.value === "POLYLINE") polyline = current;
    }
  }
  if (polyline) fail(`DXF line ${polyline.line}: the POLYLINE has no SEQEND after its vertices.`);
  return entities;
}

/** Sections: 0 SECTION, 2 name, …, 0 ENDSEC; then 0 EOF. */
export function sectionsOf(pairs: Pair[]): Sections {
  const out: Sections = { entities: [], insunits: null, blocksWithGeometry: 0, sawEof: false };
  let sawEntities = false;
  let k = 0;
  while (k < pairs.length) {
    const p = pairs[k];
    if (p.code === 999) {
      k++;
      continue;
    }
    if (p.code === 0 && p.value === "EOF") {
      out.sawEof = true;
      break;
    }
    if (!(p.code === 0 && p.value === "SECTION"))
      fail(`DXF line ${p.line}: expected "0 / SECTION" or "0 / EOF", found "${p.code} / ${p.value.slice(0, 30)}".`);
    const nm = pairs[k + 1];
    if (!nm || nm.code !== 2) fail(`DXF line ${p.line + 2}: a SECTION must be followed by its name (group code 2).`);
    const name = nm.value;
    const start = k + 2;
    let end = start;
    while (end < pairs.length && !(pairs[end].code === 0 && pairs[end].value === "ENDSEC")) end++;
    if (end >= pairs.length)
      fail(
        `The DXF ends inside the ${name} section that starts on line ${p.line} (no ENDSEC); the file may be cut short.`,
      );
    for (let q = start; q < end; q++) {
      const g = pairs[q];
      if (name === "HEADER" && g.code === 9 && g.value === "$INSUNITS") {
        const v = pairs[q + 1];
        if (v && v.code === 70) {
          if (!/^[+-]?\d+$/.test(v.value))
            fail(`DXF line ${v.line + 1}: $INSUNITS should be a whole number, found "${v.value.slice(0, 30)}".`);
          out.insunits = Number(v.value);
        }
      }
      if (name === "BLOCKS" && g.code === 0 && BLOCK_GEOMETRY.includes(g.value)) out.blocksWithGeometry++;
    }
    if (name === "ENTITIES") {
      sawEntities = true;
      out.entities.push(...entitiesOf(pairs, start, end));
    }
    k = end + 1;
  }
  if (!sawEntities) fail("The DXF has no ENTITIES section, so there is no geometry to read.");
  return out;
}
