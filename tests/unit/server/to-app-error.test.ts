// toAppError is the one place where thrown errors become an HTTP status and a plain message: each
// family of error the app can meet, with its status, its message and the field it lands on.
import { describe, expect, it, vi } from "vitest";
import { z } from "zod";
import { Refusal } from "@/db/queries/refusal";
import { CutError } from "@/lib/cut/errors";
import { ImportFailure } from "@/lib/outline-import/common";
import { AppError, NO_CLOSING_SHAPE, notFoundAs, TIMEOUT_HINT, toAppError } from "@/lib/server/errors";
import { solve } from "@/lib/track";
import { brent, NotBracketedError } from "@/lib/track/brent";
import { EngineError } from "@/lib/track/errors";

const thrown = (fn: () => unknown): unknown => {
  try {
    fn();
  } catch (error) {
    return error;
  }
  throw new Error("expected a throw");
};

describe("toAppError", () => {
  it("passes an AppError through as it is", () => {
    const e = new AppError("conflict", "Already there.", { name: ["Taken."] });
    expect(toAppError(e)).toBe(e);
    expect(toAppError(e).status).toBe(409);
  });

  it("turns zod issues into a 400 with field messages", () => {
    const error = thrown(() => z.object({ name: z.string({ error: "Enter a name." }) }).parse({}));
    const a = toAppError(error);
    expect(a.status).toBe(400);
    expect(a.message).toBe("Some fields need attention.");
    expect(a.fields).toEqual({ name: ["Enter a name."] });
  });

  describe("the engine's errors", () => {
    it("a spec the engine refuses: 400 with the engine's sentence, no spec path in the words", () => {
      const error = thrown(() =>
        solve({ mode: "track-for-wheel", units: "mm", wheel: { kind: "polar", r: "100 + cos(theta" } }),
      );
      expect(error).toBeInstanceOf(EngineError);
      const a = toAppError(error);
      expect(a.status).toBe(400);
      expect(a.message).toBe((error as EngineError).message);
      expect(a.message).not.toMatch(/\(at /);
    });

    it("keeps `where` as the field key, under the spec's place in the request", () => {
      const error = new EngineError("invalid-wheel", "The axle is outside the outline.", "wheel.points[3]");
      expect(toAppError(error, { spec: "" }).fields).toEqual({
        "wheel.points[3]": ["The axle is outside the outline."],
      });
      expect(toAppError(error, { spec: "spec" }).fields).toEqual({
        "spec.wheel.points[3]": ["The axle is outside the outline."],
      });
      // A stored spec is not in the request: no field to point at.
      expect(toAppError(error).fields).toBeUndefined();
      expect(toAppError(error).message).toBe("The axle is outside the outline.");
    });

    it("a solve past its deadline: 408 with what to change", () => {
      const a = toAppError(new EngineError("timeout", "The computation ran past its time limit."));
      expect(a.status).toBe(408);
      expect(a.message).toBe(`The computation ran past its time limit. ${TIMEOUT_HINT}`);
      expect(a.fields).toBeUndefined();
    });

    it("the root finder's own wording never reaches a person", () => {
      const error = thrown(() => brent((x) => x * x + 1, -1, 1));
      expect(error).toBeInstanceOf(NotBracketedError);
      expect((error as Error).message).toMatch(/not bracketed/);
      const a = toAppError(error);
      expect(a.status).toBe(400);
      expect(a.message).toBe(NO_CLOSING_SHAPE);
      expect(a.message).not.toMatch(/bracketed|f\(/);
    });

    it("a no-solution refusal the engine already worded is kept", () => {
      const a = toAppError(
        new EngineError(
          "no-solution",
          "No axle height gives a wheel that closes: try fewer periods per turn.",
          "periodsPerTurn",
        ),
        { spec: "" },
      );
      expect(a.status).toBe(400);
      expect(a.message).toMatch(/^No axle height/);
      expect(a.fields).toEqual({ periodsPerTurn: [a.message] });
    });
  });

  describe("the cut errors", () => {
    const short = new CutError("run-too-short", "The run is shorter than one period of the track.", "runLength");
    it("a 400 on the settings field they name, under the settings' place in the request", () => {
      const a = toAppError(short, { settings: "settings" });
      expect(a.status).toBe(400);
      expect(a.message).toBe(short.message);
      expect(a.fields).toEqual({ "settings.runLength": [short.message] });
      expect(toAppError(short, { settings: "" }).fields).toEqual({ runLength: [short.message] });
    });

    it("a refusal naming no field lands on the caller's field, or none", () => {
      const big = new CutError("part-too-big", "A wheel is too wide for the sheet.");
      expect(toAppError(big, { settings: "settings" }).fields).toBeUndefined();
      expect(toAppError(big, { cutField: "runLength" }).fields).toEqual({ runLength: [big.message] });
      expect(toAppError(short, { cutField: "runLength" }).fields).toEqual({ runLength: [short.message] });
    });
  });

  it("a query's refusal: its own kind, words and fields", () => {
    const taken = toAppError(
      new Refusal("conflict", "An account with that e-mail already exists.", { email: ["Already in use."] }),
    );
    expect(taken.status).toBe(409);
    expect(taken.message).toBe("An account with that e-mail already exists.");
    expect(taken.fields).toEqual({ email: ["Already in use."] });
    expect(toAppError(new Refusal("not_found", "No such user.")).status).toBe(404);
    expect(toAppError(new Refusal("bad_request", "That member is not in this project.")).status).toBe(400);
  });

  it("an outline-import refusal: 400 with the reader's words", () => {
    const a = toAppError(
      new ImportFailure("The file declares a DOCTYPE; outlines with DOCTYPE or ENTITY declarations are refused."),
    );
    expect(a.status).toBe(400);
    expect(a.message).toMatch(/DOCTYPE/);
  });

  it("anything else: a 500 that says nothing of the inside, logged", () => {
    const log = vi.spyOn(console, "error").mockImplementation(() => {});
    const a = toAppError(new Error("Nothing to nest: the item list is empty"));
    expect(a.status).toBe(500);
    expect(a.message).toBe("Something went wrong on our side. Nothing was changed.");
    expect(log).toHaveBeenCalledOnce();
    log.mockRestore();
  });
});

describe("notFoundAs", () => {
  it("says a parent's 404 as the record asked for, and lets other errors through", () => {
    expect(() => notFoundAs("No such photo.")(new AppError("not_found", "No such project."))).toThrow("No such photo.");
    const forbidden = new AppError("forbidden");
    expect(() => notFoundAs("No such photo.")(forbidden)).toThrow(forbidden);
  });
});
