// The limits the rolling check is read against, in one place for the studio's panel and the
// client's review. The friction guide and the sharp-bend share are the engine's own warning levels;
// the length tolerance is the default chord tolerance of the outputs (lib/track/spec.ts).

/** Friction coefficient above which many dry material pairs slip (the engine flags the same figure). */
export const FRICTION_GUIDE = 0.6;
/** A bend tighter than this share of the wheel size is flagged (as the engine does). */
export const SHARP_SHARE = 0.02;
/** Closure error (rad) above which the wheel visibly fails to close after its turn. */
export const CLOSURE_LIMIT = 1e-6;

/** Lengths below which the roll counts as exact: the default chord tolerance of the outputs. */
export const lengthTolerance = (units: string) => (units === "in" ? 0.0005 : 0.01);
