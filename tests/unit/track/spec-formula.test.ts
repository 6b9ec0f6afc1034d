// The spec contract: schema, canonical JSON, SHA-256, and the locked-down formula compiler.
import { describe, expect, it } from "vitest";
import { engineError } from "./engine-error";
import { sha256 } from "@noble/hashes/sha2.js";
import { bytesToHex, utf8ToBytes } from "@noble/hashes/utils.js";
import { canonicalJson, parseSpec, specHash } from "@/lib/track";
import { compileFormula } from "@/lib/track/formula";
import { pythonReference } from "./python-reference";

const square = {
  mode: "track-for-wheel",
  units: "mm",
  wheel: { kind: "polygon", sides: 4, side: 400 },
  tolerance: 0.01,
};

describe("spec", () => {
  it("fills defaults and names the failing field", () => {
    const s = parseSpec(square);
    expect(s.wheel).toMatchObject({ kind: "polygon", cornerRadius: 0 });
    const e = engineError(() => parseSpec({ ...square, wheel: { kind: "polygon", sides: 2, side: 1 } }));
    expect(e.code).toBe("invalid-spec");
    expect(e.where).toBe("wheel.sides");
    expect(engineError(() => parseSpec({ mode: "partner-wheel", wheel: square.wheel })).where).toBe("lobes");
    expect(engineError(() => parseSpec({ ...square, extra: 1 })).code).toBe("invalid-spec");
    expect(
      engineError(() => parseSpec({ ...square, wheel: { kind: "polygon", sides: 4, side: 1, inradius: 1 } })).message,
    ).toMatch(/exactly one/);
  });

  it("hashes the canonical JSON with SHA-256 as Python's hashlib and json do", () => {
    const cj = canonicalJson({
      tolerance: 0.01,
      wheel: { side: 400, sides: 4, kind: "polygon" },
      units: "mm",
      mode: "track-for-wheel",
    });
    expect(cj).toBe(canonicalJson(square)); // key order does not matter
    const [py] = pythonReference<{ hex: string; canonical: string }>([
      { kind: "sha256", text: cj, json: JSON.stringify(parseSpec(square)) },
    ]);
    expect(specHash(square)).toBe(py.hex);
    expect(cj).toBe(py.canonical);
  });

  it("uses a SHA-256 that gives the FIPS 180-2 example digest", () => {
    // FIPS 180-2, Appendix B.1: SHA-256("abc").
    expect(bytesToHex(sha256(utf8ToBytes("abc")))).toBe(
      "ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad",
    );
  });
});

describe("formula", () => {
  it("evaluates arithmetic and elementary functions", () => {
    const f = compileFormula("100 + 20*cos(3*theta) - 2theta^2 + sqrt(e) * pi", "theta", "wheel.r");
    const t = 0.7;
    expect(f(t)).toBe(100 + 20 * Math.cos(3 * t) - 2 * t ** 2 + Math.sqrt(Math.E) * Math.PI);
  });

  it.each([
    ["a = 1", /Assignment/],
    ["f(x) = x", /FunctionAssignment/],
    ["import({}, {})", /not allowed/],
    ['evaluate("1")', /not allowed/],
    ["x + y", /Unknown name "y"/],
    ["5 cm", /Unknown name "cm"/],
    ["x!", /operator "!"/],
    ["x == 1", /operator "=="/],
    ["[1, 2]", /Array/],
    ["x ? 1 : 2", /Conditional/],
    ['"abc"', /Only numbers/],
    ["sin(x", /does not parse/],
    ["", /empty/],
    ["x+".repeat(300) + "x", /at most 500/],
    ["(".repeat(200) + "x" + ")".repeat(200), /nested too deeply|more than/],
    ["sin(1, 2)", /takes 1/],
  ])("refuses %s", (src, msg) => {
    const e = engineError(() => compileFormula(src, "x", "track.y"));
    expect(e.code).toBe("bad-formula");
    expect(e.message).toMatch(msg);
    expect(e.where).toBe("track.y");
  });
});

describe("the parser's complaints in plain words", () => {
  it.each([
    ["sin(x", /A bracket is opened but not closed at character 6/],
    ["1 +", /The formula stops too soon at character 4/],
    ["2 * * 3", /A number or a name is missing at character 5/],
    ["1 2", /"2" at character 3 follows without a sign/],
    ["(1+2))", /The sign "\)" at character 6 is out of place/],
  ])("%s", (src, msg) => {
    const e = engineError(() => compileFormula(src, "x", "track.y"));
    expect(e.message).toMatch(msg);
    // mathjs's own wording never reaches the person (its words, as printed by mathjs 15).
    expect(e.message).not.toMatch(/Unexpected|Value expected|Parenthesis \) expected|\(char \d+\)/);
  });
});
