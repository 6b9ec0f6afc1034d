import { EngineError } from "@/lib/track";

/** The EngineError a call throws; anything else (or nothing) fails the test. */
export function engineError(fn: () => unknown): EngineError {
  try {
    fn();
  } catch (e) {
    if (e instanceof EngineError) return e;
    throw e;
  }
  throw new Error("expected an EngineError");
}
