// Field paths from the engine and the load check, named as the studio's forms name them.
import { describe, expect, it } from "vitest";
import { fieldLabel, studioMessage } from "@/lib/studio/field-labels";
import { isEngineError, solve } from "@/lib/track";

describe("field labels", () => {
  it("names paths, points and places as the form does", () => {
    expect(fieldLabel("periodsPerTurn")).toBe("Periods per turn");
    expect(fieldLabel("wheel.points[3]")).toBe("Outline, point 4");
    expect(fieldLabel("theta = 1.2")).toBe("at θ = 1.2");
    expect(fieldLabel("wheel.poisson")).toBe("Tread's Poisson's ratio");
    expect(fieldLabel("no.such.field")).toBeUndefined();
  });

  it("turns an engine refusal into a sentence with the form's field, never the spec's key", () => {
    let message = "";
    try {
      solve({ mode: "wheel-for-track", track: { kind: "sine", amplitude: 10, period: 100 } });
    } catch (e) {
      if (!isEngineError(e)) throw e;
      message = studioMessage(e);
    }
    // The sentence already names the field, so nothing is added to it.
    expect(message).toBe("Wheel for a track needs the number of periods per turn (a whole number from 1).");
    expect(
      studioMessage({ message: "wheel.points[3]: The outline passes through the axle.", where: "wheel.points[3]" }),
    ).toBe("The outline passes through the axle. (Outline, point 4)");
    expect(message).not.toMatch(/periodsPerTurn/);
  });
});
