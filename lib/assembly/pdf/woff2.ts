// WOFF2 to a plain TrueType (sfnt) font, by the W3C "WOFF File Format 2.0" Recommendation: the
// header and table directory (§4, §5), one Brotli stream for all tables (§5.2, RFC 7932), and the
// reconstruction of the transformed glyf and loca tables (§5.1, §5.3); the output's table records
// and checksums follow the OpenType spec ("OpenType font file", table directory). The optional
// hmtx transform (§5.4) is refused rather than guessed at: the shipped faces do not use it.
//
// Why this exists: pdfkit subsets fonts through fontkit, and fontkit subsets a WOFF2 font with a
// transformed glyf table from the untransformed bytes, so every glyph comes out empty (its issue
// #201): the text extracts but prints blank. Giving pdfkit the decoded TrueType avoids that path.
import { brotliDecompressSync } from "node:zlib";

// §5.1: the tags a table's flags byte may name by index (63 means a 4-byte tag follows).
const KNOWN_TAGS = (
  "cmap head hhea hmtx maxp name OS/2 post cvt_ fpgm glyf loca prep CFF_ VORG EBDT EBLC gasp hdmx kern LTSH PCLT VDMX vhea vmtx BASE GDEF GPOS " +
  "GSUB EBSC JSTF MATH CBDT CBLC COLR CPAL SVG_ sbix acnt avar bdat bloc bsln cvar fdsc feat fmtx fvar gvar hsty just lcar mort morx opbd prop " +
  "trak Zapf Silf Glat Gloc Feat Sill"
)
  .split(" ")
  .map((t) => t.replace("_", " "));

class Reader {
  pos = 0;
  constructor(private readonly b: Buffer) {}
  u8 = () => this.b.readUInt8(this.pos++);
  u16 = () => ((this.pos += 2), this.b.readUInt16BE(this.pos - 2));
  i16 = () => ((this.pos += 2), this.b.readInt16BE(this.pos - 2));
  u32 = () => ((this.pos += 4), this.b.readUInt32BE(this.pos - 4));
  bytes = (n: number) => ((this.pos += n), this.b.subarray(this.pos - n, this.pos));
  /** §6.1.1 UIntBase128: up to five bytes of seven bits, high bit set on all but the last. */
  base128(): number {
    let v = 0;
    for (let i = 0; i < 5; i++) {
      const c = this.u8();
      if (i === 0 && c === 0x80) throw new Error("WOFF2: UIntBase128 with a leading zero");
      v = v * 128 + (c & 0x7f);
      if (!(c & 0x80)) return v;
    }
    throw new Error("WOFF2: UIntBase128 longer than five bytes");
  }
  /** §6.1.2 255UInt16. */
  u255(): number {
    const c = this.u8();
    if (c === 253) return this.u16();
    if (c === 255) return this.u8() + 253;
    if (c === 254) return this.u8() + 506;
    return c;
  }
}

interface Entry {
  tag: string;
  origLength: number;
  transformed: boolean;
  stored: number;
}

export function woff2ToSfnt(file: Buffer): Buffer {
  const r = new Reader(file);
  if (r.u32() !== 0x774f4632) throw new Error("WOFF2: not a WOFF2 file");
  const flavor = r.u32();
  if (flavor === 0x74746366) throw new Error("WOFF2: font collections are not supported");
  r.u32(); // length
  const numTables = r.u16();
  r.u16(); // reserved
  r.u32(); // totalSfntSize
  const compressed = r.u32();
  r.bytes(4 + 12 + 8); // version, metadata block, private block
  const entries: Entry[] = [];
  for (let i = 0; i < numTables; i++) {
    const flags = r.u8();
    const tag = (flags & 0x3f) === 0x3f ? r.bytes(4).toString("latin1") : KNOWN_TAGS[flags & 0x3f];
    const version = flags >> 6;
    const origLength = r.base128();
    // §5.1: for glyf and loca version 0 is the transform and 3 the null one; for others, the reverse.
    const transformed = tag === "glyf" || tag === "loca" ? version === 0 : version !== 0;
    entries.push({ tag, origLength, transformed, stored: transformed ? r.base128() : origLength });
  }
  const data = brotliDecompressSync(file.subarray(r.pos, r.pos + compressed));
  const raw = new Map<string, Buffer>();
  let at = 0;
  for (const e of entries) {
    raw.set(e.tag, data.subarray(at, at + e.stored));
    at += e.stored;
  }

  const out = new Map<string, Buffer>();
  for (const e of entries) if (!e.transformed) out.set(e.tag, Buffer.from(raw.get(e.tag)!));
  if (entries.some((e) => e.tag === "hmtx" && e.transformed)) throw new Error("WOFF2: the transformed hmtx table (§5.4) is not supported");
  if (entries.some((e) => e.tag === "glyf" && e.transformed)) {
    const g = rebuildGlyf(raw.get("glyf")!);
    out.set("glyf", g.glyf);
    out.set("loca", g.loca);
    // The rebuilt loca is always the long form; say so in head (indexToLocFormat, offset 50).
    out.get("head")!.writeInt16BE(1, 50);
  }
  return writeSfnt(flavor, out);
}

interface Pt {
  x: number;
  y: number;
  on: boolean;
}

/** §5.3 triplet encoding: one flag byte a point, 0–4 data bytes, deltas from the last point. */
function readPoints(flags: Reader, glyphs: Reader, n: number): Pt[] {
  const pts: Pt[] = [];
  let x = 0;
  let y = 0;
  const signed = (f: number, v: number) => (f & 1 ? v : -v);
  for (let i = 0; i < n; i++) {
    let f = flags.u8();
    const on = !(f >> 7);
    f &= 0x7f;
    let dx: number;
    let dy: number;
    if (f < 10) {
      dx = 0;
      dy = signed(f, ((f & 14) << 7) + glyphs.u8());
    } else if (f < 20) {
      dx = signed(f, (((f - 10) & 14) << 7) + glyphs.u8());
      dy = 0;
    } else if (f < 84) {
      const b0 = f - 20;
      const b1 = glyphs.u8();
      dx = signed(f, 1 + (b0 & 0x30) + (b1 >> 4));
      dy = signed(f >> 1, 1 + ((b0 & 0x0c) << 2) + (b1 & 0x0f));
    } else if (f < 120) {
      const b0 = f - 84;
      dx = signed(f, 1 + (Math.floor(b0 / 12) << 8) + glyphs.u8());
      dy = signed(f >> 1, 1 + (((b0 % 12) >> 2) << 8) + glyphs.u8());
    } else if (f < 124) {
      const b1 = glyphs.u8();
      const b2 = glyphs.u8();
      dx = signed(f, (b1 << 4) + (b2 >> 4));
      dy = signed(f >> 1, ((b2 & 0x0f) << 8) + glyphs.u8());
    } else {
      dx = signed(f, glyphs.u16());
      dy = signed(f >> 1, glyphs.u16());
    }
    x += dx;
    y += dy;
    pts.push({ x, y, on });
  }
  return pts;
}

class Writer {
  readonly b: number[] = [];
  u8(v: number) {
    this.b.push(v & 0xff);
  }
  u16(v: number) {
    this.b.push((v >> 8) & 0xff, v & 0xff);
  }
  bytes(src: Uint8Array) {
    for (const v of src) this.b.push(v);
  }
}

/** §5.3: the glyf table back from its seven streams, and a long-format loca for it. */
function rebuildGlyf(t: Buffer): { glyf: Buffer; loca: Buffer } {
  const h = new Reader(t);
  h.u16(); // reserved
  const optionFlags = h.u16();
  const numGlyphs = h.u16();
  h.u16(); // indexFormat: the rebuilt loca is long whatever the original was
  const sizes = Array.from({ length: 7 }, () => h.u32());
  const streams: Reader[] = [];
  let at = h.pos;
  for (const s of sizes) {
    streams.push(new Reader(t.subarray(at, at + s)));
    at += s;
  }
  const [nContours, nPoints, flags, glyphs, composites, bboxes, instructions] = streams;
  const bitmapBytes = 4 * Math.floor((numGlyphs + 31) / 32);
  const bboxBitmap = bboxes.bytes(bitmapBytes);
  const overlap = optionFlags & 1 ? t.subarray(at, at + Math.ceil(numGlyphs / 8)) : null;
  const bit = (map: Uint8Array, i: number) => (map[i >> 3] & (0x80 >> (i & 7))) !== 0;

  const glyf = new Writer();
  const offsets: number[] = [];
  for (let i = 0; i < numGlyphs; i++) {
    offsets.push(glyf.b.length);
    const n = nContours.i16();
    const explicit = bit(bboxBitmap, i) ? [bboxes.i16(), bboxes.i16(), bboxes.i16(), bboxes.i16()] : null;
    if (n === 0) continue;
    if (n > 0) {
      const ends: number[] = [];
      let total = 0;
      for (let c = 0; c < n; c++) ends.push((total += nPoints.u255()) - 1);
      const pts = readPoints(flags, glyphs, total);
      const code = instructions.bytes(glyphs.u255());
      const box = explicit ?? [Math.min(...pts.map((p) => p.x)), Math.min(...pts.map((p) => p.y)), Math.max(...pts.map((p) => p.x)), Math.max(...pts.map((p) => p.y))];
      glyf.u16(n);
      box.forEach((v) => glyf.u16(v));
      ends.forEach((e) => glyf.u16(e));
      glyf.u16(code.length);
      glyf.bytes(code);
      writePoints(glyf, pts, overlap !== null && bit(overlap, i));
    } else {
      if (!explicit) throw new Error(`WOFF2: composite glyph ${i} has no bounding box`);
      glyf.u16(n);
      explicit.forEach((v) => glyf.u16(v));
      // Composite records are stored as in glyf; walk them to find their end (OpenType glyf, flags).
      let more = true;
      let hasCode = false;
      while (more) {
        const f = composites.u16();
        const len = 2 + (f & 0x0001 ? 4 : 2) + (f & 0x0008 ? 2 : f & 0x0040 ? 4 : f & 0x0080 ? 8 : 0);
        glyf.u16(f);
        glyf.bytes(composites.bytes(len));
        more = (f & 0x0020) !== 0;
        hasCode ||= (f & 0x0100) !== 0;
      }
      if (hasCode) {
        const code = instructions.bytes(glyphs.u255());
        glyf.u16(code.length);
        glyf.bytes(code);
      }
    }
    while (glyf.b.length % 4) glyf.u8(0);
  }
  offsets.push(glyf.b.length);
  const loca = Buffer.alloc(4 * offsets.length);
  offsets.forEach((o, i) => loca.writeUInt32BE(o, 4 * i));
  return { glyf: Buffer.from(glyf.b), loca };
}

/** A simple glyph's flags and coordinates, short forms where they fit (no flag repeats). */
function writePoints(w: Writer, pts: Pt[], overlapSimple: boolean): void {
  const xs = new Writer();
  const ys = new Writer();
  let px = 0;
  let py = 0;
  pts.forEach((p, i) => {
    let f = p.on ? 0x01 : 0;
    if (i === 0 && overlapSimple) f |= 0x40;
    const dx = p.x - px;
    const dy = p.y - py;
    if (dx === 0) f |= 0x10;
    else if (Math.abs(dx) < 256) {
      f |= 0x02 | (dx > 0 ? 0x10 : 0);
      xs.u8(Math.abs(dx));
    } else xs.u16(dx);
    if (dy === 0) f |= 0x20;
    else if (Math.abs(dy) < 256) {
      f |= 0x04 | (dy > 0 ? 0x20 : 0);
      ys.u8(Math.abs(dy));
    } else ys.u16(dy);
    w.u8(f);
    px = p.x;
    py = p.y;
  });
  w.bytes(Uint8Array.from(xs.b));
  w.bytes(Uint8Array.from(ys.b));
}

function checksum(b: Buffer): number {
  let sum = 0;
  for (let i = 0; i < b.length; i += 4) sum = (sum + ((b[i] << 24) | ((b[i + 1] ?? 0) << 16) | ((b[i + 2] ?? 0) << 8) | (b[i + 3] ?? 0))) >>> 0;
  return sum;
}

/** OpenType table directory: records sorted by tag, each table on a 4-byte boundary. */
function writeSfnt(flavor: number, tables: Map<string, Buffer>): Buffer {
  const tags = [...tables.keys()].sort((a, b) => (a < b ? -1 : a > b ? 1 : 0));
  const n = tags.length;
  const pow = 2 ** Math.floor(Math.log2(n));
  const head = Buffer.alloc(12 + 16 * n);
  head.writeUInt32BE(flavor, 0);
  head.writeUInt16BE(n, 4);
  head.writeUInt16BE(pow * 16, 6);
  head.writeUInt16BE(Math.log2(pow), 8);
  head.writeUInt16BE(n * 16 - pow * 16, 10);
  const headTable = tables.get("head");
  headTable?.writeUInt32BE(0, 8); // checkSumAdjustment, set below
  const parts: Buffer[] = [head];
  let offset = head.length;
  tags.forEach((tag, i) => {
    const data = tables.get(tag)!;
    const padded = Buffer.concat([data, Buffer.alloc((4 - (data.length % 4)) % 4)]);
    head.write(tag, 12 + 16 * i, 4, "latin1");
    head.writeUInt32BE(checksum(padded), 16 + 16 * i);
    head.writeUInt32BE(offset, 20 + 16 * i);
    head.writeUInt32BE(data.length, 24 + 16 * i);
    parts.push(padded);
    offset += padded.length;
  });
  const font = Buffer.concat(parts);
  const headAt = head.readUInt32BE(20 + 16 * tags.indexOf("head"));
  if (headTable) font.writeUInt32BE((0xb1b0afba - checksum(font)) >>> 0, headAt + 8);
  return font;
}
