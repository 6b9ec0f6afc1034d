import { describe, expect, it } from "vitest";
import { importOutline } from "@/lib/outline-import";
import { area, load, ok, refused } from "./helpers";

const svg = (body: string, root = 'width="100mm" height="100mm" viewBox="0 0 100 100"') =>
  `<svg xmlns="http://www.w3.org/2000/svg" ${root}>${body}</svg>`;
const wheel = (text: string, tolerance = 0.01, name = "w.svg") =>
  importOutline({ name, text }, { want: "wheel", tolerance });

describe("SVG paths", () => {
  it("reads a square drawn with relative commands, flips y and runs counter-clockwise", () => {
    const r = ok(load("square-relative.svg", { want: "wheel", tolerance: 0.01 }));
    expect(r.source).toBe("svg");
    expect(r.units).toBe("mm");
    expect(r.closed).toBe(true);
    // m10,10 l20,0 0,20 h-20 z visits (10,10) (30,10) (30,30) (10,30); y flipped → y = −10, −30.
    expect(r.points).toHaveLength(4); // the closing point is not repeated
    expect(new Set(r.points.map((p) => p.join(",")))).toEqual(new Set(["10,-10", "30,-10", "30,-30", "10,-30"]));
    expect(area(r.points)).toBeCloseTo(400, 12); // 20 mm × 20 mm, positive = counter-clockwise
    expect(r.bounds).toMatchObject({ minX: 10, maxX: 30, minY: -30, maxY: -10, width: 20, height: 20 });
    expect(r.notes.join("\n")).toMatch(/y flipped/);
  });

  it("flattens a circle made of two arcs to an inscribed regular polygon within the chord tolerance", () => {
    const R = 20;
    const tol = 0.01;
    const r = ok(load("circle-two-arcs.svg", { want: "wheel", tolerance: tol }));
    const n = r.points.length;
    // Every vertex lies on the circle about (25, −25) (y flipped).
    for (const [x, y] of r.points) expect(Math.hypot(x - 25, y + 25)).toBeCloseTo(R, 9);
    // Equal steps on a circle make the inscribed regular n-gon, area (n/2)·R²·sin(2π/n)
    // (the classic inscribed-polygon bound, Archimedes' Measurement of a Circle).
    const a = area(r.points);
    expect(a).toBeCloseTo((n / 2) * R * R * Math.sin((2 * Math.PI) / n), 8);
    // Chord sagitta R(1 − cos(π/n)) within the tolerance; the area lost is at most perimeter × tolerance.
    expect(R * (1 - Math.cos(Math.PI / n))).toBeLessThanOrEqual(tol);
    expect(Math.PI * R * R - a).toBeGreaterThan(0);
    expect(Math.PI * R * R - a).toBeLessThanOrEqual(2 * Math.PI * R * tol);
    // Not wastefully fine: at most twice the fewest chords that meet the tolerance, 2π / (2·acos(1 − tol/R)).
    expect(n).toBeLessThanOrEqual(2 * Math.ceil(Math.PI / Math.acos(1 - tol / R)) + 2);
    expect(r.notes.join("\n")).toMatch(/2 arcs flattened to a chord tolerance of 0\.01 mm/);
  });

  it("converges to πR² as the tolerance goes to zero", () => {
    const R = 20;
    const errors = [1, 0.1, 0.01, 0.001, 0.0001].map(
      (tol) => Math.PI * R * R - area(ok(load("circle-two-arcs.svg", { want: "wheel", tolerance: tol })).points),
    );
    for (let i = 1; i < errors.length; i++) expect(errors[i]).toBeLessThan(errors[i - 1]);
    expect(errors[errors.length - 1] / (Math.PI * R * R)).toBeLessThan(1e-5);
  });

  it("applies transforms on the element and on nested <g> ancestors (rounded rectangle)", () => {
    const tol = 0.01;
    const r = ok(load("rounded-rect-nested.svg", { want: "wheel", tolerance: tol }));
    // rect x −10…10, y −5…5; rotate(90) maps (x, y) → (−y, x); scale(2); translate(50, 40):
    // x 40…60, y 20…60 (derived by hand); flipped: y −60…−20.
    expect(r.bounds.minX).toBeCloseTo(40, 9);
    expect(r.bounds.maxX).toBeCloseTo(60, 9);
    expect(r.bounds.minY).toBeCloseTo(-60, 9);
    expect(r.bounds.maxY).toBeCloseTo(-20, 9);
    // Area of a rounded rectangle: w·h − (4 − π)·r² (each corner square loses r² − πr²/4); derived.
    // Scaled by the transform's determinant 2 × 2 = 4.
    const exact = 4 * (20 * 10 - (4 - Math.PI) * 2 * 2);
    const a = area(r.points);
    expect(a).toBeLessThanOrEqual(exact + 1e-9);
    expect(exact - a).toBeLessThanOrEqual(2 * Math.PI * 4 * tol); // four corners of radius 4 after scaling
    expect(r.notes.join("\n")).toMatch(/4 arcs flattened/);
  });

  it("reads an <ellipse>; units unknown without width and height in mm or in", () => {
    const tol = 0.01;
    const r = ok(load("ellipse.svg", { want: "wheel", tolerance: tol }));
    expect(r.units).toBe("unknown");
    expect(r.notes.join("\n")).toMatch(/units unknown/);
    for (const [x, y] of r.points) expect((x / 30) ** 2 + (y / 10) ** 2).toBeCloseTo(1, 9);
    const exact = Math.PI * 30 * 10; // area of an ellipse, πab
    const a = area(r.points);
    expect(a).toBeLessThan(exact);
    expect(exact - a).toBeLessThanOrEqual(2 * Math.PI * 30 * tol); // perimeter < 2πa (it lies inside that circle)
  });

  it("reads C S Q T with reflected control points, relative and absolute, within the chord tolerance", () => {
    const tol = 0.01;
    const r = ok(wheel(svg('<path d="M10 50C10 30 30 10 50 10S90 30 90 50q0 20-20 30t-40 0T10 50z"/>'), tol));
    // The curves with reflections worked out by hand (SVG 1.1 §8.3.6–8.3.7, derived):
    // S: first control = 2·(50,10) − (30,10) = (70,10); q: control (90,70), end (70,80);
    // t: control = 2·(70,80) − (90,70) = (50,90), end (30,80); T: control = 2·(30,80) − (50,90) = (10,70).
    type P = [number, number];
    const cubic =
      (a: P, b: P, c: P, d: P) =>
      (t: number): P => {
        const u = 1 - t;
        return [
          u * u * u * a[0] + 3 * u * u * t * b[0] + 3 * u * t * t * c[0] + t * t * t * d[0],
          u * u * u * a[1] + 3 * u * u * t * b[1] + 3 * u * t * t * c[1] + t * t * t * d[1],
        ];
      };
    const quad =
      (a: P, b: P, c: P) =>
      (t: number): P => {
        const u = 1 - t;
        return [u * u * a[0] + 2 * u * t * b[0] + t * t * c[0], u * u * a[1] + 2 * u * t * b[1] + t * t * c[1]];
      };
    const curves = [
      cubic([10, 50], [10, 30], [30, 10], [50, 10]),
      cubic([50, 10], [70, 10], [90, 30], [90, 50]),
      quad([90, 50], [90, 70], [70, 80]),
      quad([70, 80], [50, 90], [30, 80]),
      quad([30, 80], [10, 70], [10, 50]),
    ];
    const poly = r.points;
    const toPoly = ([x, y]: P) => {
      let best = Infinity;
      for (let i = 0; i < poly.length; i++) {
        const [ax, ay] = poly[i];
        const [bx, by] = poly[(i + 1) % poly.length];
        const dx = bx - ax;
        const dy = by - ay;
        const t = Math.max(0, Math.min(1, ((x - ax) * dx + (-y - ay) * dy) / (dx * dx + dy * dy)));
        best = Math.min(best, Math.hypot(ax + t * dx - x, ay + t * dy + y));
      }
      return best;
    };
    let worst = 0;
    for (const c of curves) for (let k = 0; k <= 200; k++) worst = Math.max(worst, toPoly(c(k / 200)));
    expect(worst).toBeLessThanOrEqual(tol + 1e-9);
    expect(worst).toBeGreaterThan(tol / 100); // it is a flattening, not a copy of the control polygon
    expect(r.notes.join("\n")).toMatch(/5 Bézier curves flattened/);
  });

  it("reads arc flags written without separators", () => {
    const a = ok(wheel(svg('<path d="M30 50a20 20 0 1 0 40 0a20 20 0 1 0-40 0z"/>')));
    const b = ok(wheel(svg('<path d="M30 50a20 20 0 10 40 0a20 20 0 10-40 0z"/>')));
    expect(b.points).toEqual(a.points);
  });

  it("takes the largest of several closed subpaths for a wheel and says so", () => {
    const r = ok(wheel(svg('<path d="M0 0H10V10H0Z M20 20H60V60H20Z"/><rect x="70" y="70" width="5" height="5"/>')));
    expect(Math.abs(area(r.points))).toBeCloseTo(1600, 9); // the 40 × 40 square
    expect(r.notes.join("\n")).toMatch(/largest closed shape.*2 other closed shapes were ignored/);
  });

  it("closes an open path whose ends meet within the tolerance, and refuses one with a gap", () => {
    const closed = ok(wheel(svg('<path d="M0 0 H10 V10 H0 V0.005"/>'), 0.01));
    expect(closed.points).toHaveLength(4);
    expect(closed.notes.join("\n")).toMatch(/ends were 0\.005 apart/);
    refused(
      wheel(svg('<path d="M0 0 H10 V10 H0 V2"/>'), 0.01),
      /open/,
      /2 from where it starts/,
      /\(0, 0\) and \(0, -2\)/,
    );
  });

  it("refuses a self-intersecting outline and says where", () => {
    // A bow tie: (0,0) (10,10) (10,0) (0,10) crosses itself at (5, 5), i.e. (5, −5) once y is flipped.
    refused(
      wheel(svg('<polygon points="0,0 10,10 10,0 0,10"/>')),
      /crosses or touches itself near \(5, -5\)/,
      /points 0 and 2/,
    );
    // Lopsided: y = x meets y = 20 − 2x at x = 20/3 (derived).
    refused(wheel(svg('<polygon points="0,0 10,10 10,0 0,20"/>')), /near \(6\.66667, -6\.66667\)/);
  });

  it("maps the viewBox onto a physical size and converts units when asked", () => {
    // width 200 mm over a viewBox 100 wide: one user unit is 2 mm.
    const r = ok(
      wheel(svg('<rect x="10" y="10" width="10" height="10"/>', 'width="200mm" height="200mm" viewBox="0 0 100 100"')),
    );
    expect(r.bounds.width).toBeCloseTo(20, 12);
    const cm = ok(
      wheel(svg('<rect x="10" y="10" width="10" height="10"/>', 'width="10cm" height="10cm" viewBox="0 0 100 100"')),
    );
    expect(cm.units).toBe("mm");
    expect(cm.bounds.width).toBeCloseTo(10, 12);
    // No viewBox: user units are CSS px, 96 per inch (CSS Values and Units §6.2): 96 px = 1 in.
    const inch = ok(wheel(svg('<rect x="0" y="0" width="96" height="48"/>', 'width="4in" height="4in"')));
    expect(inch.units).toBe("in");
    expect(inch.bounds.width).toBeCloseTo(1, 12);
    const conv = importOutline(
      { name: "a.svg", text: svg('<rect x="0" y="0" width="25.4" height="10"/>') },
      { want: "wheel", tolerance: 0.01, units: "in" },
    );
    expect(ok(conv).units).toBe("in");
    expect(ok(conv).bounds.width).toBeCloseTo(1, 12); // 25.4 mm = 1 in exactly (international inch)
  });

  it("applies matrix, skewX and rotate about a point", () => {
    // skewX(45) keeps area (determinant 1) and shifts x by y·tan 45° = y.
    const r = ok(wheel(svg('<rect x="0" y="0" width="10" height="10" transform="skewX(45)"/>')));
    expect(Math.abs(area(r.points))).toBeCloseTo(100, 9);
    expect(r.bounds.maxX).toBeCloseTo(20, 9);
    const m = ok(wheel(svg('<rect x="0" y="0" width="10" height="10" transform="matrix(2 0 0 3 5 7)"/>')));
    expect(m.bounds).toMatchObject({ minX: 5, maxX: 25, minY: -37, maxY: -7 });
    const rot = ok(wheel(svg('<rect x="10" y="10" width="10" height="2" transform="rotate(180 15 11)"/>')));
    expect(rot.bounds.minX).toBeCloseTo(10, 9);
    expect(rot.bounds.maxY).toBeCloseTo(-10, 9);
    refused(
      wheel(svg('<rect x="0" y="0" width="10" height="10" transform="spin(3)"/>')),
      /line 1: <rect> has a transform that cannot be read/,
    );
  });

  it("ignores shapes inside <defs> and hidden ones, with a note", () => {
    const r = ok(
      wheel(
        svg(
          '<defs><rect width="90" height="90"/></defs><g style="display:none"><rect width="80" height="80"/></g><rect width="10" height="10"/>',
        ),
      ),
    );
    expect(Math.abs(area(r.points))).toBeCloseTo(100, 9);
    expect(r.notes.join("\n")).toMatch(/inside <defs>/);
    expect(r.notes.join("\n")).toMatch(/hidden/);
  });

  it("refuses bad path data, naming the element and the character", () => {
    refused(
      wheel(svg('<path id="lobe" d="M0 0 L10 10 X 5"/>')),
      /<path id="lobe"> on line 1/,
      /unexpected "X" at character 13/,
    );
    refused(wheel(svg('<path d="L0 0 10 10"/>')), /must begin with a moveto/);
    refused(wheel(svg('<path d="M0 0 A5 5 0 2 0 10 0"/>')), /expected an arc flag/);
    refused(wheel(svg('<polygon points="0,0 10,0 10"/>')), /odd count of numbers/);
    refused(wheel(svg('<rect width="-1" height="4"/>')), /negative width/);
    refused(
      wheel('<svg xmlns="http://www.w3.org/2000/svg"><g><rect width="1" height="1"/></svg>'),
      /<\/svg> does not match <g> opened on line 1/,
    );
    refused(wheel('<svg xmlns="http://www.w3.org/2000/svg"><g>'), /cut short/);
  });
});

describe("SVG tracks", () => {
  it("reads one period of a polyline track, flips y and notes the period", () => {
    const r = ok(load("track-polyline.svg", { want: "track", tolerance: 0.01 }));
    expect(r.closed).toBe(false);
    expect(r.points).toEqual([
      [10, -20],
      [35, -30],
      [60, -20],
      [85, -10],
      [110, -20],
    ]);
    expect(r.notes.join("\n")).toMatch(/period = 100 mm/);
  });

  it("turns a right-to-left profile round, and refuses one that doubles back or steps vertically", () => {
    const t = (points: string) =>
      importOutline({ name: "t.svg", text: svg(`<polyline points="${points}"/>`) }, { want: "track", tolerance: 0.01 });
    expect(ok(t("10,0 5,3 0,0")).points[0]).toEqual([0, 0]);
    expect(ok(t("10,0 5,3 0,0")).notes.join("\n")).toMatch(/reversed to run left to right/);
    refused(t("0,0 5,3 4,4 10,0"), /doubles back at x = 5/);
    refused(t("0,0 5,3 5,4 10,0"), /vertical step at x = 5/);
    refused(t("0,0 5,3 10,1"), /must end at the height it starts/);
    refused(
      importOutline({ name: "t.svg", text: svg('<rect width="5" height="5"/>') }, { want: "track", tolerance: 0.01 }),
      /only closed shapes/,
    );
  });
});
