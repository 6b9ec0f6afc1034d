import { describe, expect, it } from "vitest";
import { importOutline, MAX_OUTPUT_POINTS } from "@/lib/outline-import";
import { fixture, fixtureText, load, ok, refused } from "./helpers";

const W = { want: "wheel" as const, tolerance: 0.01 };

describe("hostile and unusable files", () => {
  it("refuses DOCTYPE and ENTITY declarations (billion laughs, external entities) without expanding them", () => {
    refused(load("entity-bomb.svg", W), /line 2: the file has a DOCTYPE declaration, which is refused/);
    refused(
      importOutline({ name: "e.svg", text: '<svg xmlns="http://www.w3.org/2000/svg"><!ENTITY a "b"></svg>' }, W),
      /declares an ENTITY/,
    );
    // A reference to an undeclared entity is refused, not looked up.
    refused(
      importOutline({ name: "e.svg", text: '<svg xmlns="http://www.w3.org/2000/svg"><path d="&xxe;"/></svg>' }, W),
      /&xxe; is not one of XML's predefined entities/,
    );
  });

  it("ignores scripts, event handlers, foreignObject, <use>, <image> and external hrefs, and says so", () => {
    const r = ok(load("hostile.svg", W));
    // Only the 20 × 20 square drawn by the real <path> counts; the paths inside <script> and
    // <foreignObject> text are never read.
    expect(r.bounds).toMatchObject({ minX: 10, maxX: 30, minY: -30, maxY: -10 });
    const notes = r.notes.join("\n");
    expect(notes).toMatch(/2 <script> elements.*never run/);
    expect(notes).toMatch(/event-handler attributes \(first onload on <svg>/);
    expect(notes).toMatch(/<foreignObject>/);
    expect(notes).toMatch(/<use> element.*not followed/);
    expect(notes).toMatch(/<image>.*never loaded/);
    expect(notes).toMatch(/external references \(first xlink:href="https:\/\/evil\.example\/shapes\.svg#big"/);
  });

  it("refuses files over 2 MB, as bytes and as text", () => {
    const big = new Uint8Array(3 * 1024 * 1024).fill(0x20); // 3 MB of spaces
    refused(importOutline({ name: "big.svg", bytes: big }, W), /3\.0 MB/, /the limit is 2 MB \(2,097,152 bytes\)/);
    refused(importOutline({ name: "big.csv", text: "0,0\n".repeat(800_000) }, W), /the limit is 2 MB/);
    // Multi-byte text is counted in UTF-8 bytes: 1 M × "é" (2 bytes each) = 2 000 000 bytes is fine to count…
    refused(importOutline({ name: "big.csv", text: "é".repeat(1_100_000) }, W), /2\.1 MB/);
  });

  it("refuses binary content: NUL bytes, invalid UTF-8, control characters", () => {
    refused(load("nul.svg", W), /not a text file: it contains a NUL byte at offset 40/);
    refused(load("latin1.csv", W), /not a text file: the bytes at offset 10 are not valid UTF-8/);
    refused(importOutline({ name: "a.csv", text: "0,0\n1,\u00071\n" }, W), /control character 0x07 at offset 6/);
    refused(importOutline({ name: "a.csv", text: "0,0\n\ud800" }, W), /unpaired surrogate/);
  });

  it("refuses compressed files without unpacking them", () => {
    refused(load("zipped.svg", W), /Compressed files are not accepted: this is a ZIP archive\. Unpack it first/);
    refused(load("gzipped.dxf", W), /Compressed files are not accepted: this is a gzip archive/);
    refused(importOutline({ name: "a.svg", text: "PK\u0003\u0004rest" }, W), /ZIP archive/);
  });

  it("refuses binary DXF with a reason", () => {
    refused(load("binary.dxf", W), /binary DXF file, which is not accepted: save the drawing as an ASCII DXF/);
  });

  it("detects the type from extension and content together", () => {
    const svgText = fixtureText("square-relative.svg");
    refused(importOutline({ name: "shape.png", text: svgText }, W), /Files of type \.png are not accepted/);
    refused(importOutline({ name: "shape", text: svgText }, W), /has no file extension/);
    refused(importOutline({ name: "shape.csv", text: svgText }, W), /named \.csv but its content is an SVG file/);
    refused(
      importOutline({ name: "shape.svg", bytes: fixture("slot-line-arc.dxf") }, W),
      /named \.svg but its content is a DXF file/,
    );
    refused(
      importOutline({ name: "shape.dxf", text: "0,0\n1,0\n1,1\n" }, W),
      /named \.dxf but its content is plain text/,
    );
    refused(
      importOutline({ name: "shape.svg", text: "<html><body></body></html>" }, W),
      /XML or HTML without an <svg> element/,
    );
    refused(
      importOutline({ name: "shape.svg", type: "text/csv", text: svgText }, W),
      /file name says \.svg but its declared type is text\/csv/,
    );
    expect(importOutline({ name: "SHAPE.SVG", type: "image/svg+xml", text: svgText }, W).ok).toBe(true);
    expect(importOutline({ name: "pts.csv", type: "application/vnd.ms-excel", text: "0,0\n1,0\n1,1\n" }, W).ok).toBe(
      true,
    );
  });

  it("refuses more output points than the engine takes (lib/track/spec.ts MAX_POINTS = 20 000)", () => {
    expect(MAX_OUTPUT_POINTS).toBe(20000);
    const n = 25000;
    const pts = Array.from({ length: n }, (_, i) => {
      const t = (2 * Math.PI * i) / n;
      return `${(100 * Math.cos(t)).toFixed(6)},${(100 * Math.sin(t)).toFixed(6)}`;
    }).join(" ");
    refused(
      importOutline(
        { name: "p.svg", text: `<svg xmlns="http://www.w3.org/2000/svg"><polygon points="${pts}"/></svg>` },
        W,
      ),
      /25,000 points after flattening, more than the engine's limit of 20,000/,
    );
    refused(importOutline({ name: "p.csv", text: "0,0\n".repeat(20002) }, W), /more than 20,000 points/);
    // A tolerance so fine that one circle would need millions of points is refused before they are made.
    const t0 = Date.now();
    refused(
      importOutline(
        { name: "c.svg", text: '<svg xmlns="http://www.w3.org/2000/svg"><circle r="1000"/></svg>' },
        { want: "wheel", tolerance: 1e-12 },
      ),
      /<circle> on line 1 would need .* points at this tolerance/,
    );
    expect(Date.now() - t0).toBeLessThan(5000);
  });

  it("bounds path commands, elements and nesting", () => {
    refused(
      importOutline(
        {
          name: "p.svg",
          text: `<svg xmlns="http://www.w3.org/2000/svg"><path d="M0 0${" L1 1 0 0".repeat(5)}${" L1 1".repeat(100_001)}"/></svg>`,
        },
        W,
      ),
      /more than 100,000 path commands/,
    );
    refused(
      importOutline(
        {
          name: "g.svg",
          text: `<svg xmlns="http://www.w3.org/2000/svg">${"<g>".repeat(300)}${"</g>".repeat(300)}</svg>`,
        },
        W,
      ),
      /nested more than 256 deep/,
    );
    refused(
      importOutline(
        { name: "g.svg", text: `<svg xmlns="http://www.w3.org/2000/svg">${"<g/>".repeat(50_001)}</svg>` },
        W,
      ),
      /more than 50,000 elements/,
    );
  });

  it("refuses bad options instead of throwing", () => {
    const file = { name: "a.csv", text: "0,0\n1,0\n1,1\n" };
    refused(importOutline(file, { want: "wheel", tolerance: 0 }), /tolerance must be a positive number/);
    refused(importOutline(file, { want: "wheel", tolerance: NaN }), /tolerance must be a positive number/);
    refused(importOutline(file, { want: "gear" as "wheel", tolerance: 1 }), /want must be "wheel" or "track"/);
    refused(importOutline(file, { want: "wheel", tolerance: 1, units: "ft" as "mm" }), /units must be "mm" or "in"/);
    refused(importOutline(null as unknown as typeof file, W), /No file was given/);
  });

  it("never throws on cut-short or mangled files", () => {
    const names = [
      "square-relative.svg",
      "circle-two-arcs.svg",
      "rounded-rect-nested.svg",
      "hostile.svg",
      "stadium-lwpolyline.dxf",
      "slot-line-arc.dxf",
      "points-good.csv",
    ];
    let refusals = 0;
    let runs = 0;
    for (const name of names) {
      const text = fixtureText(name);
      for (let cut = 0; cut < text.length; cut += 7) {
        for (const t of [
          text.slice(0, cut),
          text.slice(cut),
          text.slice(0, cut) + "<&\"'%\u00e9" + text.slice(cut + 3),
        ]) {
          for (const want of ["wheel", "track"] as const) {
            const r = importOutline({ name, text: t }, { want, tolerance: 0.05 });
            runs++;
            expect(typeof r.ok).toBe("boolean");
            if (!r.ok) {
              refusals++;
              expect(r.error.length).toBeGreaterThan(10);
              expect(r.error).not.toMatch(/could not be read \(/); // every refusal is one of ours, not a stray exception
            }
          }
        }
      }
    }
    expect(refusals).toBeGreaterThan(runs / 4);
  });
});

describe("the readers behind the packages (saxes, svg-pathdata, dxf-parser)", () => {
  const svgText = (body: string) =>
    `<svg xmlns="http://www.w3.org/2000/svg">${body}<rect width="10" height="10"/></svg>`;
  const dxfText = (entities: string[]) =>
    ["0", "SECTION", "2", "ENTITIES", ...entities, "0", "ENDSEC", "0", "EOF"].join("\n");

  it("names the line of a bare & and of an undeclared entity in text, in our words", () => {
    refused(
      importOutline({ name: "a.svg", text: svgText("\n<desc>Tom & Jerry</desc>") }, W),
      /^line 2: a bare "&" \(write &amp;\)\.$/,
    );
    refused(
      importOutline({ name: "a.svg", text: svgText("<desc>&nbsp;</desc>") }, W),
      /&nbsp; is not one of XML's predefined entities/,
    );
    refused(
      importOutline({ name: "a.svg", text: svgText('<path d="M0 0" d="M1 1"/>') }, W),
      /<path> gives the attribute d twice/,
    );
    refused(
      importOutline({ name: "a.svg", text: svgText("<g><!DOCTYPE x></g>") }, W),
      /DOCTYPE declaration, which is refused/,
    );
  });

  it("skips raw text that is not XML, and reads nothing after the root closes", () => {
    const r = ok(
      importOutline(
        {
          name: "a.svg",
          text: `\n <?xml version="1.0"?>${svgText("<style>a > b { }</style><script>if (a < b && c) {}</script>")}trailing <junk`,
        },
        W,
      ),
    );
    expect(r.points).toHaveLength(4);
  });

  it("reads an LWPOLYLINE as listed (vertex count and vertex identifiers aside) and refuses groups out of order", () => {
    const square = [
      "0",
      "LWPOLYLINE",
      "70",
      "1",
      "10",
      "0",
      "20",
      "0",
      "91",
      "1",
      "10",
      "1",
      "20",
      "0",
      "91",
      "2",
      "10",
      "1",
      "20",
      "1",
      "10",
      "0",
      "20",
      "1",
    ];
    expect(ok(importOutline({ name: "a.dxf", text: dxfText(square) }, W)).points).toHaveLength(4);
    refused(
      importOutline(
        { name: "a.dxf", text: dxfText(["0", "LINE", "10", "0", "30", "0", "20", "0", "11", "1", "21", "1"]) },
        W,
      ),
      /DXF line 7: in the LINE, group 10 must be followed by group 20/,
    );
  });
});
