// Runs the engine off the main thread, so typing in the form or dragging never freezes the page.
// The same lib/track code the server uses for saved revisions.
import { isEngineError, solve } from "@/lib/track";

export interface SolveRequest {
  id: number;
  spec: unknown;
}

export type SolveReply =
  | { id: number; ok: true; result: ReturnType<typeof solve>; ms: number }
  | { id: number; ok: false; error: { message: string; code: string; where?: string } };

const TIME_LIMIT_MS = 8_000;

self.onmessage = (event: MessageEvent<SolveRequest>) => {
  const { id, spec } = event.data;
  const started = performance.now();
  try {
    const result = solve(spec, { deadlineMs: TIME_LIMIT_MS });
    (self as unknown as Worker).postMessage({ id, ok: true, result, ms: performance.now() - started } satisfies SolveReply);
  } catch (error) {
    const e = isEngineError(error)
      ? { message: error.message, code: error.code, where: error.where }
      : { message: "The engine stopped on an unexpected error.", code: "internal" };
    (self as unknown as Worker).postMessage({ id, ok: false, error: e } satisfies SolveReply);
  }
};
