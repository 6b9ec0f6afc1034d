import { describe, expect, it } from "vitest";
import { importOutline } from "@/lib/outline-import";
import { area, load, ok, refused } from "./helpers";

const dxf = (entities: string, header = "") =>
  [
    "0",
    "SECTION",
    "2",
    "HEADER",
    header,
    "0",
    "ENDSEC",
    "0",
    "SECTION",
    "2",
    "ENTITIES",
    entities,
    "0",
    "ENDSEC",
    "0",
    "EOF",
    "",
  ]
    .filter((l) => l !== "")
    .join("\n");
const lw = (flags: number, verts: Array<[number, number, number?]>, extra = "") =>
  [
    "0",
    "LWPOLYLINE",
    "90",
    String(verts.length),
    "70",
    String(flags),
    ...(extra ? [extra] : []),
    ...verts.flatMap(([x, y, b]) => ["10", String(x), "20", String(y), ...(b ? ["42", String(b)] : [])]),
  ].join("\n");
const read = (text: string, want: "wheel" | "track" = "wheel", tolerance = 0.001) =>
  importOutline({ name: "d.dxf", text }, { want, tolerance });

describe("DXF", () => {
  it("reads a closed LWPOLYLINE with bulges, CRLF and padded codes, and $INSUNITS 4 = mm", () => {
    const tol = 0.01;
    const r = ok(load("stadium-lwpolyline.dxf", { want: "wheel", tolerance: tol }));
    expect(r.source).toBe("dxf");
    expect(r.units).toBe("mm"); // $INSUNITS 4 = millimetres (DXF reference, HEADER variables)
    // 40 × 20 rectangle with a half-disc of radius 10 on each short side (bulge 1 = semicircle):
    // area 40·20 + π·10² (derived), x from −10 to 50.
    const exact = 800 + Math.PI * 100;
    const a = area(r.points);
    expect(a).toBeLessThan(exact);
    expect(exact - a).toBeLessThanOrEqual(2 * Math.PI * 10 * tol);
    expect(r.bounds.minX).toBeCloseTo(-10, 6);
    expect(r.bounds.maxX).toBeCloseTo(50, 6);
    expect(r.bounds).toMatchObject({ minY: 0, maxY: 20 });
    expect(r.notes.join("\n")).toMatch(/2 arcs flattened to a chord tolerance of 0\.01 mm/);
    expect(r.notes.join("\n")).toMatch(/ignored 1 TEXT entity/);
  });

  it("bulge 1 is a semicircle and −1 the same on the other side (bulge = tan(θ/4), DXF reference)", () => {
    // θ = 4·atan(1) = π over the chord (0,0)–(2,0): radius 1, centre (1, 0); positive runs counter-clockwise,
    // so going from (0,0) to (2,0) it dips below the chord.
    const below = ok(
      read(
        dxf(
          lw(1, [
            [0, 0, 1],
            [2, 0],
          ]),
        ),
      ),
    );
    for (const [x, y] of below.points) expect(Math.hypot(x - 1, y)).toBeLessThanOrEqual(1 + 1e-12);
    expect(below.bounds.minY).toBeCloseTo(-1, 9);
    expect(below.bounds.maxY).toBe(0);
    expect(area(below.points)).toBeCloseTo(Math.PI / 2, 2); // half a unit disc, πr²/2
    const above = ok(
      read(
        dxf(
          lw(1, [
            [0, 0, -1],
            [2, 0],
          ]),
        ),
      ),
    );
    expect(above.bounds.maxY).toBeCloseTo(1, 9);
    expect(above.bounds.minY).toBe(0);
    // Two bulge-1 segments make a full circle of radius 1: area → π.
    const circle = ok(
      read(
        dxf(
          lw(1, [
            [0, 0, 1],
            [2, 0, 1],
          ]),
        ),
        "wheel",
        1e-6,
      ),
    );
    expect(area(circle.points)).toBeCloseTo(Math.PI, 5);
    // A bulge of tan(π/8) is a quarter circle (θ = 4·π/8 = π/2): chord √2·r between (1,0) and (0,1) about the origin.
    const quarter = ok(
      read(
        dxf(
          lw(1, [
            [0, 0],
            [1, 0, Math.tan(Math.PI / 8)],
            [0, 1],
          ]),
        ),
      ),
    );
    for (const [x, y] of quarter.points) if (x > 0 && y > 0) expect(Math.hypot(x, y)).toBeCloseTo(1, 9);
    // Quarter disc πr²/4 plus nothing: the straight edges run along the axes; chord loss ≤ arc length × tolerance.
    expect(Math.PI / 4 - area(quarter.points)).toBeGreaterThan(0);
    expect(Math.PI / 4 - area(quarter.points)).toBeLessThanOrEqual((Math.PI / 2) * 0.001);
  });

  it("joins a LINE + ARC chain end to end into one loop, reversing pieces as needed; $INSUNITS 1 = in", () => {
    const r = ok(load("slot-line-arc.dxf", { want: "wheel", tolerance: 0.0005 }));
    expect(r.units).toBe("in");
    // A 2 × 1 slot with half-discs of radius 0.5 at both ends: area 2·1 + π·0.5² (derived).
    const exact = 2 + Math.PI * 0.25;
    expect(exact - area(r.points)).toBeGreaterThan(0);
    expect(exact - area(r.points)).toBeLessThanOrEqual(2 * Math.PI * 0.5 * 0.0005);
    expect(r.bounds.minX).toBeCloseTo(-0.5, 6);
    expect(r.bounds.maxX).toBeCloseTo(2.5, 6);
    expect(r.notes.join("\n")).toMatch(/2 arcs flattened/);
  });

  it("says where LINE/ARC pieces fail to join, and refuses a branching junction", () => {
    refused(
      load("open-chain.dxf", { want: "wheel", tolerance: 0.01 }),
      /The outline is open: the chain of 3 LINE\/ARC pieces/,
      /\(0, 0\) and \(1, 10\)/,
      /10\.0499 from where it starts/,
    );
    const y = [
      "0",
      "LINE",
      "10",
      "0",
      "20",
      "0",
      "11",
      "1",
      "21",
      "0",
      "0",
      "LINE",
      "10",
      "1",
      "20",
      "0",
      "11",
      "2",
      "21",
      "1",
      "0",
      "LINE",
      "10",
      "1",
      "20",
      "0",
      "11",
      "2",
      "21",
      "-1",
    ].join("\n");
    refused(read(dxf(y)), /Three or more LINE\/ARC ends meet at \(1, 0\)/);
  });

  it("reads POLYLINE / VERTEX / SEQEND with the closed flag", () => {
    const v = (x: number, y: number) => ["0", "VERTEX", "8", "0", "10", String(x), "20", String(y)].join("\n");
    const r = ok(
      read(dxf(["0", "POLYLINE", "8", "0", "66", "1", "70", "1", v(0, 0), v(3, 0), v(3, 4), "0", "SEQEND"].join("\n"))),
    );
    expect(area(r.points)).toBeCloseTo(6, 12); // right triangle 3-4-5: ½·3·4
    refused(
      read(dxf(["0", "POLYLINE", "70", "1", v(0, 0), v(3, 0), "0", "LINE"].join("\n"))),
      /the POLYLINE has no SEQEND/,
    );
  });

  it("mirrors x for entities with extrusion (0, 0, −1) and refuses tilted planes", () => {
    const arc = (nz: string) =>
      ["0", "CIRCLE", "10", "5", "20", "0", "40", "1", "210", "0", "220", "0", "230", nz].join("\n");
    const r = ok(read(dxf(arc("-1"))));
    // Arbitrary-axis algorithm (DXF reference): for N = (0,0,−1) the OCS x-axis is (−1,0,0), so the centre is at x = −5.
    for (const [x, y] of r.points) expect(Math.hypot(x + 5, y)).toBeCloseTo(1, 12);
    refused(
      read(dxf(["0", "CIRCLE", "10", "5", "20", "0", "40", "1", "210", "0.6", "220", "0", "230", "0.8"].join("\n"))),
      /tilted plane/,
    );
  });

  it("reads a track profile from an open LWPOLYLINE and converts units by $INSUNITS", () => {
    const r = ok(
      read(
        dxf(
          lw(0, [
            [0, 0],
            [5, 0.5, 0.2],
            [10, 0],
          ]),
          "9\n$INSUNITS\n70\n5",
        ),
        "track",
        0.001,
      ),
    );
    expect(r.units).toBe("mm"); // 5 = centimetres, converted to mm (×10)
    expect(r.points[r.points.length - 1]).toEqual([100, 0]);
    expect(r.notes.join("\n")).toMatch(/centimetres \(\$INSUNITS 5\) converted to mm/);
    expect(r.notes.join("\n")).toMatch(/period = 100 mm/);
    const unitless = ok(
      read(
        dxf(
          lw(1, [
            [0, 0],
            [1, 0],
            [0, 1],
          ]),
          "9\n$INSUNITS\n70\n0",
        ),
      ),
    );
    expect(unitless.units).toBe("unknown");
    expect(unitless.notes.join("\n")).toMatch(/\$INSUNITS is 0 \(unitless\)/);
  });

  it("refuses broken DXF, naming the line", () => {
    refused(
      load("broken.dxf", { want: "wheel", tolerance: 0.01 }),
      /DXF line 10: group 20 of the LINE should be a number, found "zero"/,
    );
    refused(read("0\nSECTION\n2\nENTITIES\n0\nLINE\n10\n"), /DXF line 7: group code 10 has no value line/);
    refused(read("0\nSECTION\n2\nENTITIES\n0\nLINE\nten\n1\n"), /DXF line 7: expected a group code/);
    refused(
      read("0\nSECTION\n2\nENTITIES\n0\nLINE\n10\n1\n"),
      /ends inside the ENTITIES section that starts on line 1/,
    );
    refused(read("0\nSECTION\n2\nHEADER\n0\nENDSEC\n0\nEOF\n"), /no ENTITIES section/);
    refused(read(dxf(["0", "SPLINE", "70", "8"].join("\n"))), /No closed outline/);
  });
});
