"use client";
// Solves the current spec in a Web Worker (solve-worker.ts) with no debounce: every change is
// posted at once and the latest request wins (solver-client.ts, on components/worker). The geometry comes back first and
// is drawn at once; the closure options and the rolling check of it follow.
import { useEffect, useState } from "react";
import type { CheckResult, SolvedGeometry, SolveOption } from "@/lib/track";
import { createSolverClient } from "./solver-client";
import type { LoadsReport, Suggestion } from "@/lib/loads";
import type { LoadsRequest, SolveFailure, SolveReply } from "./solve-worker";

export interface SolverState {
  /** The newest geometry solved (kept while a newer spec is being solved). */
  result?: SolvedGeometry;
  /** The other closure choices for `result`; undefined until they arrive (or for modes without them). */
  options?: SolveOption[];
  /** The rolling check of `result`; undefined until it arrives. */
  check?: CheckResult;
  /** The load-path check of `result` and the helper's suggestions; undefined until they arrive, null without load settings. */
  loads?: { report: LoadsReport; suggestions: Suggestion[] } | null;
  /** The load-path check stopped on an error (bad settings, or the engine). */
  loadsError?: SolveFailure;
  /** The newest spec could not be solved. */
  error?: SolveFailure;
  /** The options or the rolling check of `result` stopped on an error. */
  checkError?: SolveFailure;
  /** Waiting for the newest spec's geometry. */
  busy: boolean;
  /** Waiting for the options or the check of `result`. */
  checking: boolean;
  /** Milliseconds from the spec change to its geometry, including the hop to the worker. */
  ms?: number;
}

type Solved = Omit<SolverState, "busy"> & { key: string | null };

function newWorker(): Worker {
  return new Worker(new URL("./solve-worker.ts", import.meta.url), { type: "module" });
}

export function useSolver(spec: unknown, loads: LoadsRequest | null = null): SolverState {
  // The client makes its worker on the first request, so nothing starts during the server render.
  const [client] = useState(() => createSolverClient(newWorker));
  const [solved, setSolved] = useState<Solved>({ key: null, checking: false });
  const key = JSON.stringify([spec, loads]);

  useEffect(() => () => client.dispose(), [client]);

  useEffect(() => {
    const posted = performance.now();
    const [specNow, loadsNow] = JSON.parse(key) as [unknown, LoadsRequest | null];
    client.request({ spec: specNow, loads: loadsNow }, (event) => {
      // A worker that could not start (or stopped answering) reads as a failed geometry stage.
      const reply: SolveReply =
        event.type === "reply"
          ? event.reply
          : { id: 0, stage: "geometry", ok: false, error: { message: event.message, code: "internal" } };
      if (!reply.ok) {
        const error = reply.error;
        if (reply.stage === "geometry")
          setSolved((s) => ({ key, result: s.result, error, checking: false, ms: performance.now() - posted }));
        else if (reply.stage === "loads") setSolved((s) => ({ ...s, loads: undefined, loadsError: error }));
        else setSolved((s) => ({ ...s, checkError: error, checking: false }));
      } else if (reply.stage === "geometry")
        setSolved({ key, result: reply.geometry, checking: true, ms: performance.now() - posted });
      else if (reply.stage === "options") setSolved((s) => ({ ...s, options: reply.options }));
      else if (reply.stage === "check") setSolved((s) => ({ ...s, check: reply.check, checking: false }));
      else setSolved((s) => ({ ...s, loads: reply.loads, loadsError: undefined }));
    });
  }, [client, key]);

  const { key: solvedKey, ...state } = solved;
  return { ...state, busy: solvedKey !== key };
}
