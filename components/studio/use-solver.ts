"use client";
// Solves the current spec in a Web Worker. Only the newest spec counts: when a new one arrives while
// the worker is busy, the busy worker is ended and a fresh one takes the new spec.
import { useEffect, useRef, useState } from "react";
import type { SolveResult } from "@/lib/track";
import type { SolveReply } from "./solve-worker";

export interface SolverState {
  result?: SolveResult;
  error?: { message: string; code: string; where?: string };
  busy: boolean;
  /** Milliseconds from the spec change to the result, including the hop to the worker. */
  ms?: number;
}

function newWorker(): Worker {
  return new Worker(new URL("./solve-worker.ts", import.meta.url), { type: "module" });
}

export function useSolver(spec: unknown, delayMs = 60): SolverState {
  const [state, setState] = useState<SolverState>({ busy: true });
  const worker = useRef<Worker | null>(null);
  const busy = useRef(false);
  const seq = useRef(0);
  const key = JSON.stringify(spec);

  useEffect(() => () => worker.current?.terminate(), []);

  useEffect(() => {
    const id = ++seq.current;
    const timer = setTimeout(() => {
      if (busy.current) {
        worker.current?.terminate();
        worker.current = null;
      }
      const w = (worker.current ??= newWorker());
      const started = performance.now();
      busy.current = true;
      setState((s) => ({ ...s, busy: true }));
      w.onmessage = (event: MessageEvent<SolveReply>) => {
        if (event.data.id !== seq.current) return;
        busy.current = false;
        const ms = performance.now() - started;
        if (event.data.ok) setState({ result: event.data.result, busy: false, ms });
        else setState((s) => ({ result: s.result, error: (event.data as Extract<SolveReply, { ok: false }>).error, busy: false, ms }));
      };
      w.onerror = () => {
        busy.current = false;
        setState((s) => ({ ...s, busy: false, error: { message: "The solver could not start in this browser.", code: "internal" } }));
      };
      w.postMessage({ id, spec: JSON.parse(key) });
    }, delayMs);
    return () => clearTimeout(timer);
  }, [key, delayMs]);

  return state;
}
