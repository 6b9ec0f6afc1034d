// The instance reader: item areas against the benchmark files themselves, both key styles, and
// plain errors for malformed input. Areas come from jsts (tests/support/independent-geometry.ts).
import { describe, expect, it } from "vitest";
import { loadInstance, MAX_TOTAL_COPIES } from "@/lib/nest";
import { areaOf, type XY } from "../../support/independent-geometry";
import { readFixture } from "./layout-check";

type Raw = {
  name: string;
  strip_height: number;
  items: Array<{ id: number; demand: number; allowed_orientations: number[]; shape: { type: string; data: XY[] } }>;
};

const rawArea = (raw: Raw) => raw.items.reduce((s, it) => s + it.demand * areaOf(it.shape.data), 0);
const loadedArea = (inst: ReturnType<typeof loadInstance>) =>
  inst.items.reduce((s, it) => s + it.quantity * areaOf(it.polygon as XY[]), 0);

/** The OR-Datasets (PascalCase) form of an instance in the sparrow (snake_case) form. */
function toPascalCase(raw: Raw) {
  return {
    Name: raw.name,
    Items: raw.items.map((it) => ({
      Demand: it.demand,
      AllowedOrientations: it.allowed_orientations,
      Shape: { Type: "SimplePolygon", Data: it.shape.data },
    })),
    Strip: { Height: raw.strip_height },
  };
}

describe("loadInstance", () => {
  // Σ item area: jakobs1 392, shapes0 1596, fu 1083 (docs/fabrication.md §1.2 B and §6.7, computed from the
  // instance files); piece counts 25, 43, 12 (docs/fabrication.md §6.7; Jakobs 1996, Oliveira et al. 2000, Fujita et al. 1993).
  it.each([
    ["jakobs1", 392, 25],
    ["shapes0", 1596, 43],
    ["fu", 1083, 12],
  ])("%s: item areas sum to %i over %i copies", (name, area, pieces) => {
    const raw = readFixture(name) as Raw;
    expect(rawArea(raw)).toBeCloseTo(area, 9);
    const inst = loadInstance(raw);
    expect(inst.name).toBe(name);
    expect(inst.height).toBe(raw.strip_height);
    expect(inst.items.reduce((s, it) => s + it.quantity, 0)).toBe(pieces);
    expect(loadedArea(inst)).toBeCloseTo(area, 9);
  });

  it("drops the repeated closing point, turns rings counter-clockwise and keeps ids and rotations", () => {
    const raw = readFixture("jakobs1") as Raw;
    const inst = loadInstance(raw);
    inst.items.forEach((it, i) => {
      expect(it.id).toBe(String(raw.items[i].id));
      expect(it.rotations).toEqual(raw.items[i].allowed_orientations);
      expect(it.polygon.length).toBe(raw.items[i].shape.data.length - 1);
      let twice = 0; // shoelace sum, positive for counter-clockwise
      it.polygon.forEach(([x, y], k) => {
        const [u, v] = it.polygon[(k + 1) % it.polygon.length];
        twice += x * v - u * y;
      });
      expect(twice).toBeGreaterThan(0);
    });
    const clockwise = loadInstance({
      name: "cw",
      strip_height: 5,
      items: [
        {
          demand: 1,
          shape: {
            type: "simple_polygon",
            data: [
              [0, 0],
              [0, 2],
              [3, 2],
              [3, 0],
              [0, 0],
            ],
          },
        },
      ],
    });
    expect(clockwise.items[0].polygon).toEqual([
      [3, 0],
      [3, 2],
      [0, 2],
      [0, 0],
    ]);
    expect(clockwise.items[0].id).toBe("0"); // no id in the file: the item's index
    expect(clockwise.items[0].rotations).toEqual([0]);
  });

  it("reads the PascalCase key style to the same instance", () => {
    for (const name of ["jakobs1", "shapes0", "shirts"]) {
      const raw = readFixture(name) as Raw;
      const pascal = loadInstance(toPascalCase(raw));
      const snake = loadInstance(raw);
      expect(pascal).toEqual(snake);
    }
  });

  const square = {
    demand: 1,
    shape: {
      type: "simple_polygon",
      data: [
        [0, 0],
        [1, 0],
        [1, 1],
        [0, 1],
      ],
    },
  };
  it.each([
    ["not an object", [], /JSON object/],
    ["no items", { strip_height: 10 }, /no items/],
    ["an empty item list", { strip_height: 10, items: [] }, /no items/],
    ["no strip height", { items: [square] }, /strip height/],
    ["a negative strip height", { strip_height: -1, items: [square] }, /strip height/],
    [
      "a non-numeric point",
      {
        strip_height: 10,
        items: [
          {
            demand: 1,
            shape: {
              data: [
                [0, 0],
                ["1", 0],
                [1, 1],
              ],
            },
          },
        ],
      },
      /item 0: point 1 is not a pair of finite numbers/,
    ],
    [
      "fewer than 3 points",
      {
        strip_height: 10,
        items: [
          {
            demand: 1,
            shape: {
              data: [
                [0, 0],
                [1, 0],
                [0, 0],
              ],
            },
          },
        ],
      },
      /at least 3 distinct points/,
    ],
    [
      "zero area",
      {
        strip_height: 10,
        items: [
          {
            demand: 1,
            shape: {
              data: [
                [0, 0],
                [1, 1],
                [2, 2],
              ],
            },
          },
        ],
      },
      /zero area/,
    ],
    [
      "demand below 1",
      { strip_height: 10, items: [{ ...square, demand: 0 }] },
      /demand must be a whole number of at least 1/,
    ],
    ["a fractional demand", { strip_height: 10, items: [{ ...square, demand: 1.5 }] }, /demand/],
    [
      "too many copies",
      { strip_height: 10, items: [{ ...square, demand: MAX_TOTAL_COPIES + 1 }] },
      /more than 5000 copies/,
    ],
    [
      "an unknown shape type",
      { strip_height: 10, items: [{ demand: 1, shape: { type: "circle", data: [] } }] },
      /not supported/,
    ],
    ["a bad orientation", { strip_height: 10, items: [{ ...square, allowed_orientations: ["up"] }] }, /orientation/],
  ])("refuses %s with a plain message", (_what, json, message) => {
    expect(() => loadInstance(json)).toThrow(message);
  });
});
