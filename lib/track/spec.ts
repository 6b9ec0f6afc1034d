// The design spec: a zod schema, a canonical JSON form (keys sorted at every level, no whitespace,
// numbers in ECMAScript's shortest round-trip form — the same rule as RFC 8785's JSON
// Canonicalization Scheme for the values a spec can hold) and its SHA-256 (FIPS 180-4) hash, so a
// client can sign a revision. The hash is taken over the parsed spec, after defaults are filled in,
// so two specs that mean the same design hash the same.

import { z } from "zod";
import { sha256 } from "@noble/hashes/sha2.js";
import { bytesToHex, utf8ToBytes } from "@noble/hashes/utils.js";
import { EngineError } from "./errors";
import { MAX_FORMULA_LENGTH } from "./formula";

const len = z.number().finite().positive();
const point = z.tuple([z.number().finite(), z.number().finite()]);
const xy = z.strictObject({ x: z.number().finite(), y: z.number().finite() });
const formula = z.string().min(1).max(MAX_FORMULA_LENGTH);

export const MAX_POINTS = 20000;

/** The modes as people call them, for messages and forms. */
export const MODE_NAMES = {
  "track-for-wheel": "Track for a wheel",
  "wheel-for-track": "Wheel for a track",
  "partner-wheel": "Partner wheel",
  "twin-wheels": "Twin wheels",
} as const;

const polygon = z
  .strictObject({
    kind: z.literal("polygon"),
    sides: z.number().int().min(3).max(360),
    inradius: len.optional(),
    circumradius: len.optional(),
    side: len.optional(),
    cornerRadius: z.number().finite().min(0).default(0),
  })
  .refine((w) => [w.inradius, w.circumradius, w.side].filter((v) => v !== undefined).length === 1, {
    message: "Give exactly one size for the polygon: its inradius, its circumradius or its side length.",
  });

const ellipse = z
  .strictObject({
    kind: z.literal("ellipse"),
    semiMajor: len,
    semiMinor: len,
    axle: z.union([z.literal("focus"), z.literal("centre"), xy]).default("focus"),
  })
  .refine((w) => w.semiMajor >= w.semiMinor, {
    message: "The ellipse's semi-major axis must be at least as long as its semi-minor axis.",
  });

const circle = z.strictObject({
  kind: z.literal("circle"),
  radius: len,
  axleOffset: z.number().finite().min(0).default(0),
});

const polar = z.strictObject({ kind: z.literal("polar"), r: formula });

const outline = z.strictObject({
  kind: z.literal("outline"),
  points: z.array(point).min(3).max(MAX_POINTS),
  axle: xy,
});

export const wheelSchema = z.discriminatedUnion("kind", [polygon, ellipse, circle, polar, outline]);

const sine = z.strictObject({ kind: z.literal("sine"), amplitude: z.number().finite().min(0), period: len });
const catenary = z.strictObject({ kind: z.literal("catenary"), scale: len, period: len });
const cycloid = z.strictObject({ kind: z.literal("cycloid"), radius: len });
const fn = z.strictObject({ kind: z.literal("function"), y: formula, period: len });
const profile = z.strictObject({
  kind: z.literal("profile"),
  points: z.array(point).min(2).max(MAX_POINTS),
});

export const trackSchema = z.discriminatedUnion("kind", [sine, catenary, cycloid, fn, profile]);

const count = z.number().int().min(1).max(64);

export const designSpecSchema = z
  .strictObject({
    mode: z.enum(["track-for-wheel", "wheel-for-track", "partner-wheel", "twin-wheels"]),
    units: z.enum(["mm", "in"]).default("mm"),
    wheel: wheelSchema.optional(),
    track: trackSchema.optional(),
    lobes: count.optional(),
    periodsPerTurn: count.optional(),
    /** Chord error of the output polylines, in units. Default 0.01 mm or 0.0005 in. */
    tolerance: len.optional(),
  })
  .superRefine((s, ctx) => {
    const needsWheel = s.mode === "track-for-wheel" || s.mode === "partner-wheel";
    const mode = MODE_NAMES[s.mode];
    if (needsWheel && !s.wheel) ctx.addIssue({ code: "custom", path: ["wheel"], message: `${mode} needs a wheel.` });
    if (!needsWheel && !s.track) ctx.addIssue({ code: "custom", path: ["track"], message: `${mode} needs a track.` });
    if (needsWheel && s.track)
      ctx.addIssue({ code: "custom", path: ["track"], message: `${mode} starts from a wheel, not a track.` });
    if (!needsWheel && s.wheel)
      ctx.addIssue({ code: "custom", path: ["wheel"], message: `${mode} starts from a track, not a wheel.` });
    if (s.mode === "partner-wheel" && s.lobes === undefined)
      ctx.addIssue({
        code: "custom",
        path: ["lobes"],
        message: "A partner wheel needs its number of lobes (a whole number from 1).",
      });
    if ((s.mode === "wheel-for-track" || s.mode === "twin-wheels") && s.periodsPerTurn === undefined)
      ctx.addIssue({
        code: "custom",
        path: ["periodsPerTurn"],
        message: `${mode} needs the number of periods per turn (a whole number from 1).`,
      });
  })
  .transform((s) => ({ ...s, tolerance: s.tolerance ?? (s.units === "in" ? 0.0005 : 0.01) }));

export type DesignSpec = z.output<typeof designSpecSchema>;
export type DesignSpecInput = z.input<typeof designSpecSchema>;
export type WheelSpec = z.output<typeof wheelSchema>;
export type TrackSpec = z.output<typeof trackSchema>;

/** Validates a spec, throwing EngineError "invalid-spec" that names the first bad field. */
export function parseSpec(json: unknown): DesignSpec {
  const r = designSpecSchema.safeParse(json);
  if (r.success) return r.data;
  const issue = r.error.issues[0];
  const where = issue.path
    .map((p) => (typeof p === "number" ? `[${p}]` : `.${String(p)}`))
    .join("")
    .replace(/^\./, "");
  throw new EngineError("invalid-spec", `${where ? `${where}: ` : ""}${issue.message}`, where || undefined);
}

function canonical(v: unknown): string {
  if (v === null) return "null";
  if (typeof v === "number") {
    if (!Number.isFinite(v)) throw new EngineError("invalid-spec", "Numbers in a spec must be finite.");
    return JSON.stringify(Object.is(v, -0) ? 0 : v);
  }
  if (typeof v === "string" || typeof v === "boolean") return JSON.stringify(v);
  if (Array.isArray(v)) return `[${v.map(canonical).join(",")}]`;
  if (typeof v === "object") {
    const o = v as Record<string, unknown>;
    const keys = Object.keys(o)
      .filter((k) => o[k] !== undefined)
      .sort();
    return `{${keys.map((k) => `${JSON.stringify(k)}:${canonical(o[k])}`).join(",")}}`;
  }
  throw new EngineError("invalid-spec", `A spec cannot hold a ${typeof v}.`);
}

/** Canonical JSON of the parsed spec (defaults filled in, keys sorted, no whitespace). */
export function canonicalJson(spec: unknown): string {
  return canonical(parseSpec(spec));
}

/** Hex SHA-256 of the canonical JSON, UTF-8 encoded. */
export function specHash(spec: unknown): string {
  return bytesToHex(sha256(utf8ToBytes(canonicalJson(spec))));
}
