// Reading an upload as text and deciding what it is. Checks run before any parsing, in this order:
// size (2 MB), compressed-file signatures (ZIP "PK\3\4", gzip 1F 8B, and the 7z, xz, zstd and bzip2
// magic numbers; nothing is ever decompressed), the binary DXF sentinel, NUL bytes, UTF-8 validity
// (RFC 3629: no overlong forms, no surrogates, nothing above U+10FFFF) and stray control
// characters. The type is then taken from the extension and the content together and must agree.

import { fail, MAX_FILE_BYTES } from "./common";

export type Kind = "svg" | "dxf" | "csv";

export type FileInput =
  { name: string; type?: string; text: string } | { name: string; type?: string; bytes: Uint8Array };

const MB = (n: number) => `${(n / (1024 * 1024)).toFixed(1)} MB (${n.toLocaleString("en-US")} bytes)`;
const LIMIT = `the limit is 2 MB (${MAX_FILE_BYTES.toLocaleString("en-US")} bytes)`;

function startsWith(b: ArrayLike<number>, sig: number[]): boolean {
  if (b.length < sig.length) return false;
  for (let i = 0; i < sig.length; i++) if (b[i] !== sig[i]) return false;
  return true;
}

const COMPRESSED: Array<[string, number[]]> = [
  ["ZIP", [0x50, 0x4b, 0x03, 0x04]],
  ["ZIP", [0x50, 0x4b, 0x05, 0x06]],
  ["ZIP", [0x50, 0x4b, 0x07, 0x08]],
  ["gzip", [0x1f, 0x8b]],
  ["7z", [0x37, 0x7a, 0xbc, 0xaf, 0x27, 0x1c]],
  ["xz", [0xfd, 0x37, 0x7a, 0x58, 0x5a, 0x00]],
  ["zstd", [0x28, 0xb5, 0x2f, 0xfd]],
  ["bzip2", [0x42, 0x5a, 0x68]], // "BZh", checked further below
];

function compressedKind(b: ArrayLike<number>): string | null {
  for (const [name, sig] of COMPRESSED) {
    if (!startsWith(b, sig)) continue;
    // bzip2: "BZh" + block size '1'..'9' + the block magic 31 41 59 26 53 59.
    if (
      name === "bzip2" &&
      !(
        b.length >= 10 &&
        b[3] >= 0x31 &&
        b[3] <= 0x39 &&
        startsWith(
          Array.from({ length: 6 }, (_, i) => b[4 + i]),
          [0x31, 0x41, 0x59, 0x26, 0x53, 0x59],
        )
      )
    )
      continue;
    return name;
  }
  return null;
}

const BINARY_DXF = "AutoCAD Binary DXF";

/** Offset of the first byte that breaks UTF-8 (RFC 3629), or −1. */
function invalidUtf8At(b: Uint8Array): number {
  const n = b.length;
  let i = 0;
  while (i < n) {
    const c = b[i];
    if (c < 0x80) {
      i++;
      continue;
    }
    let need: number;
    let min: number;
    let cp: number;
    if (c >= 0xc2 && c <= 0xdf) {
      need = 1;
      min = 0x80;
      cp = c & 0x1f;
    } else if (c >= 0xe0 && c <= 0xef) {
      need = 2;
      min = 0x800;
      cp = c & 0x0f;
    } else if (c >= 0xf0 && c <= 0xf4) {
      need = 3;
      min = 0x10000;
      cp = c & 0x07;
    } else return i;
    if (i + need >= n) return i;
    for (let k = 1; k <= need; k++) {
      const d = b[i + k];
      if (d === undefined || (d & 0xc0) !== 0x80) return i;
      cp = (cp << 6) | (d & 0x3f);
    }
    if (cp < min || cp > 0x10ffff || (cp >= 0xd800 && cp <= 0xdfff)) return i;
    i += need + 1;
  }
  return -1;
}

function checkControls(text: string): string {
  // A DOS end-of-file mark (Ctrl-Z) at the very end is tolerated and dropped.
  const t = text.endsWith("\u001a") ? text.slice(0, -1) : text;
  for (let i = 0; i < t.length; i++) {
    const c = t.charCodeAt(i);
    if (c < 0x20 && c !== 9 && c !== 10 && c !== 13 && c !== 12)
      fail(
        `This is not a text file: it contains the control character 0x${c.toString(16).padStart(2, "0")} at offset ${i}.`,
      );
    if (c === 0x7f) fail(`This is not a text file: it contains the control character 0x7f at offset ${i}.`);
  }
  return t;
}

/** The upload as a string, or a refusal saying why it is not an acceptable text file. */
export function readText(file: FileInput): string {
  if ("bytes" in file && file.bytes !== undefined) {
    const b = file.bytes;
    if (!(b instanceof Uint8Array)) fail("The file's bytes must be given as a Uint8Array.");
    if (b.length > MAX_FILE_BYTES) fail(`The file is ${MB(b.length)}; ${LIMIT}.`);
    const z = compressedKind(b);
    if (z)
      fail(
        `Compressed files are not accepted: this is a ${z} archive. Unpack it first and upload the SVG, DXF or CSV inside.`,
      );
    if (
      startsWith(
        b,
        Array.from(BINARY_DXF, (ch) => ch.charCodeAt(0)),
      )
    )
      fail("This is a binary DXF file, which is not accepted: save the drawing as an ASCII DXF and upload that.");
    const nul = b.indexOf(0);
    if (nul >= 0) fail(`This is not a text file: it contains a NUL byte at offset ${nul}.`);
    const bad = invalidUtf8At(b);
    if (bad >= 0) fail(`This is not a text file: the bytes at offset ${bad} are not valid UTF-8.`);
    const text = new TextDecoder("utf-8").decode(b); // valid, so nothing is replaced; a BOM is dropped
    return checkControls(text);
  }
  if (!("text" in file) || typeof file.text !== "string") fail("The file has neither text nor bytes.");
  let text = file.text;
  // Each UTF-16 unit is at least one UTF-8 byte, so a long string is refused before counting.
  if (text.length > MAX_FILE_BYTES) fail(`The file is more than ${MB(text.length)}; ${LIMIT}.`);
  let bytes = 0;
  for (let i = 0; i < text.length; i++) {
    const c = text.charCodeAt(i);
    if (c >= 0xd800 && c <= 0xdbff) {
      const d = text.charCodeAt(i + 1);
      if (!(d >= 0xdc00 && d <= 0xdfff))
        fail(`This is not a text file: it holds an unpaired surrogate at character ${i}.`);
      bytes += 4;
      i++;
    } else if (c >= 0xdc00 && c <= 0xdfff)
      fail(`This is not a text file: it holds an unpaired surrogate at character ${i}.`);
    else bytes += c < 0x80 ? 1 : c < 0x800 ? 2 : 3;
  }
  if (bytes > MAX_FILE_BYTES) fail(`The file is ${MB(bytes)}; ${LIMIT}.`);
  const head = Array.from(text.slice(0, 10), (ch) => ch.charCodeAt(0));
  const z = compressedKind(head);
  if (z)
    fail(
      `Compressed files are not accepted: this is a ${z} archive. Unpack it first and upload the SVG, DXF or CSV inside.`,
    );
  if (text.startsWith(BINARY_DXF))
    fail("This is a binary DXF file, which is not accepted: save the drawing as an ASCII DXF and upload that.");
  const nul = text.indexOf("\u0000");
  if (nul >= 0) fail(`This is not a text file: it contains a NUL character at offset ${nul}.`);
  if (text.charCodeAt(0) === 0xfeff) text = text.slice(1);
  return checkControls(text);
}

type ContentKind = "svg" | "dxf" | "markup" | "text";

function looksDxf(text: string): boolean {
  const lines = text.split(/\r\n|\r|\n/, 400);
  let i = 0;
  while (i < lines.length && lines[i].trim() === "") i++;
  while (i + 1 < lines.length) {
    const code = lines[i].trim();
    const value = lines[i + 1].trim();
    if (code === "999") {
      i += 2;
      continue;
    }
    return code === "0" && value === "SECTION";
  }
  return false;
}

function contentKind(text: string): ContentKind {
  const head = text.trimStart();
  if (head.startsWith("<")) return /<svg[\s>/]/.test(text) ? "svg" : "markup";
  if (looksDxf(text)) return "dxf";
  return "text";
}

const EXT: Record<string, Kind> = { svg: "svg", dxf: "dxf", csv: "csv", tsv: "csv", txt: "csv" };
const MIME: Record<string, Kind> = {
  "image/svg+xml": "svg",
  "image/vnd.dxf": "dxf",
  "image/x-dxf": "dxf",
  "application/dxf": "dxf",
  "application/x-dxf": "dxf",
  "text/csv": "csv",
  "text/tab-separated-values": "csv",
  "application/vnd.ms-excel": "csv", // what Windows browsers report for .csv
};
const DESCRIBE: Record<ContentKind, string> = {
  svg: "an SVG file",
  dxf: "a DXF file",
  markup: "XML or HTML without an <svg> element",
  text: "plain text, not SVG or DXF",
};

/** The file's type, from its extension and its content together; a refusal when they disagree. */
export function detectKind(name: string, type: string | undefined, text: string): Kind {
  const m = /\.([A-Za-z0-9]+)$/.exec(typeof name === "string" ? name : "");
  const ext = m ? m[1].toLowerCase() : "";
  const byExt = EXT[ext];
  if (!byExt)
    fail(
      `${ext ? `Files of type .${ext} are not accepted` : `"${name}" has no file extension`}: upload an SVG (.svg), a DXF (.dxf) or points as CSV (.csv, .tsv or .txt).`,
    );
  const mime = typeof type === "string" ? type.split(";")[0].trim().toLowerCase() : "";
  const byMime = MIME[mime];
  if (byMime && byMime !== byExt)
    fail(`The file name says .${ext} but its declared type is ${mime}; the two must agree.`);
  const byContent = contentKind(text);
  const want: ContentKind = byExt === "csv" ? "text" : byExt;
  if (byContent !== want) {
    if (byExt === "svg")
      fail(`The file is named .${ext} but its content is ${DESCRIBE[byContent]} (no <svg> element at the start).`);
    if (byExt === "dxf")
      fail(
        `The file is named .${ext} but its content is ${DESCRIBE[byContent]}: an ASCII DXF starts with the pair "0" / "SECTION".`,
      );
    fail(
      `The file is named .${ext} but its content is ${DESCRIBE[byContent]}; CSV points must be plain rows of numbers.`,
    );
  }
  return byExt;
}
