// The check panel, plots and options table render from a real result (server markup, no DOM),
// with the pass / warn states and "show" buttons where the check has a place to point at.

import { createElement } from "react";
import { renderToStaticMarkup } from "react-dom/server";
import { describe, expect, it } from "vitest";
import { solve, solveInStages } from "@/lib/track";
import { CheckPanel, CheckPlots, OptionsTable, PlayControls, checkFigures } from "@/components/studio/view";

const triangle = solve({ mode: "track-for-wheel", wheel: { kind: "polygon", sides: 3, side: 300 } });
const sine = solve({ mode: "wheel-for-track", track: { kind: "sine", amplitude: 20, period: 200 }, periodsPerTurn: 4 });

describe("check figures", () => {
  it("warns on interference, friction and corners for a triangle", () => {
    const f = Object.fromEntries(checkFigures(triangle).map((x) => [x.key, x]));
    expect(f.interference.state).toBe("warn");
    expect(f.interference.locate).toBe("interference");
    expect(f.friction.state).toBe("warn"); // 1.732 = tan 60° at the triangle's cusps (Hall & Wagon 1992)
    expect(f.friction.value).toBe("1.73");
    expect(f["radius-wheel"].value).toBe("0 (corner)");
    expect(f.closure.state).toBe("pass");
  });

  it("passes a smooth sine design except for its friction demand", () => {
    const f = Object.fromEntries(checkFigures(sine).map((x) => [x.key, x]));
    expect(f.interference.state).toBe("pass");
    // Steepest slope of A sin(2πx/P) is 2πA/P = 0.628 for A = 20, P = 200.
    expect(f.friction.value).toBe("0.628");
    expect(f.friction.state).toBe("warn");
    expect(f.friction.note).toMatch(/depends on the materials/);
  });
});

describe("panels render", () => {
  it("lists the warnings in plain words with show buttons", () => {
    const html = renderToStaticMarkup(createElement(CheckPanel, { result: triangle, onPointAt: () => {} }));
    expect(html).toContain("cuts into the track");
    expect(html).toContain("Show where it cuts in on the canvas");
    expect(html).toContain('data-state="warn"');
  });

  it("shows a calm placeholder while solving", () => {
    expect(renderToStaticMarkup(createElement(CheckPanel, {}))).toContain("Solving…");
    expect(renderToStaticMarkup(createElement(CheckPlots, {}))).toContain("Solving…");
  });

  it("says the check is running while the geometry is already drawn, and when it stopped", () => {
    const html = renderToStaticMarkup(createElement(CheckPanel, { checking: true }));
    expect(html).toContain("Checking…");
    expect(html).not.toContain("data-check=");
    const stopped = renderToStaticMarkup(
      createElement(CheckPanel, { error: "The computation ran past its time limit." }),
    );
    expect(stopped).toContain("The rolling check stopped: The computation ran past its time limit.");
  });

  it("holds the options table's place while the choices are worked out", () => {
    const geometry = solveInStages({
      mode: "wheel-for-track",
      track: { kind: "sine", amplitude: 20, period: 200 },
      periodsPerTurn: 4,
    }).geometry;
    expect(renderToStaticMarkup(createElement(OptionsTable, { result: geometry, pending: true }))).toContain(
      "Working out the choices…",
    );
    // A wheel with a track made for it has no closure choice: nothing to wait for.
    expect(renderToStaticMarkup(createElement(OptionsTable, { result: triangle, pending: true }))).toBe("");
  });

  it("plots friction with the 0.6 guide and labelled axes", () => {
    const html = renderToStaticMarkup(createElement(CheckPlots, { result: sine }));
    expect(html).toContain("Grip needed (μ = |dy/dx|)");
    expect(html).toContain("axle x (mm)");
    expect(html).toContain('stroke="#e8590c"');
    expect(html).toContain("Track curvature");
  });

  it("marks the current closure option and offers the others as buttons", () => {
    const html = renderToStaticMarkup(createElement(OptionsTable, { result: sine, currentValue: 4, onPick: () => {} }));
    expect(html).toContain('aria-current="true"');
    expect((html.match(/<button/g) ?? []).length).toBe(sine.options!.length - 1);
    expect(html).toContain("Use 3 periods per turn");
  });

  it("renders the play controls with a labelled scrub bar", () => {
    const noop = () => {};
    const html = renderToStaticMarkup(
      createElement(PlayControls, {
        playing: false,
        onPlayingChange: noop,
        speed: 1,
        onSpeedChange: noop,
        position: 0.25,
        onPositionChange: noop,
      }),
    );
    expect(html).toContain('type="range"');
    expect(html).toContain("Step one frame forward");
    expect(html).toContain("4×");
  });
});
