import { describe, expect, it } from "vitest";
import { importOutline } from "@/lib/outline-import";
import { area, load, ok, refused } from "./helpers";

describe("CSV points", () => {
  it("reads two columns with a header naming mm; a wheel's points close on themselves", () => {
    const r = ok(load("points-good.csv", { want: "wheel", tolerance: 0.01 }));
    expect(r.source).toBe("csv");
    expect(r.units).toBe("mm");
    expect(r.points).toHaveLength(4);
    expect(area(r.points)).toBe(100); // the 10 × 10 square, counter-clockwise as given
    expect(r.notes.join("\n")).toMatch(/last point joins the first/);
  });

  it("reads tab-separated track points with a comment", () => {
    const r = ok(load("track-good.tsv", { want: "track", tolerance: 0.01 }));
    expect(r.points).toEqual([
      [0, 0],
      [2.5, 1.5],
      [5, 0],
      [7.5, -1.5],
      [10, 0],
    ]);
    expect(r.units).toBe("unknown");
    expect(r.notes.join("\n")).toMatch(/period = 10 \(last x − first x\)/);
    expect(r.notes.join("\n")).toMatch(/skipped 1 comment line/);
  });

  it("reads semicolons with decimal commas, and whitespace columns", () => {
    const r = ok(load("points-semicolon.csv", { want: "wheel", tolerance: 0.01 }));
    expect(area(r.points)).toBeCloseTo(3, 12); // 1.5 × 2
    expect(r.notes.join("\n")).toMatch(/decimal commas/);
    const s = ok(importOutline({ name: "p.txt", text: "0 0\n  4   0\n4 3e0\n" }, { want: "wheel", tolerance: 0.01 }));
    expect(area(s.points)).toBe(6);
  });

  it("says which line is bad", () => {
    refused(
      load("points-bad.csv", { want: "wheel", tolerance: 0.01 }),
      /CSV line 5: "ten" in column 1 is not a number/,
    );
    refused(
      importOutline({ name: "p.csv", text: "0,0\n1,2,3\n" }, { want: "wheel", tolerance: 1 }),
      /CSV line 2: expected two numbers \(x, y\) but found 3 columns/,
    );
    refused(
      importOutline({ name: "p.csv", text: "0,0\n0x10,2\n" }, { want: "wheel", tolerance: 1 }),
      /CSV line 2: "0x10"/,
    );
    refused(
      importOutline({ name: "p.csv", text: "0,0\nInfinity,2\n" }, { want: "wheel", tolerance: 1 }),
      /CSV line 2: "Infinity"/,
    );
    refused(
      importOutline({ name: "p.csv", text: "\n\n# nothing\n" }, { want: "wheel", tolerance: 1 }),
      /no rows of numbers/,
    );
  });
});
