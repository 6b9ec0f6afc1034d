"use client";
// Two workers on the shared worker client (components/worker/worker-client.ts): one rebuilds the
// parts as the settings change (the newest request wins), the other runs a nest, reporting
// progress, until it finishes or is cancelled (the nester then hands back its best layout so far).
import { useCallback, useEffect, useState } from "react";
import type { NestProgress, SheetNestResult } from "@/lib/nest/types";
import { WorkerClient } from "@/components/worker/worker-client";
import type { CutWorkerReply, CutWorkerRequest, JointChoiceReport, PartsPreview } from "./cut-worker";

const newWorker = () => new Worker(new URL("./cut-worker.ts", import.meta.url), { type: "module" });

type PartsRequest = Omit<Extract<CutWorkerRequest, { type: "parts" }>, "id">;
type NestRequest = Omit<Extract<CutWorkerRequest, { type: "nest" }>, "id">;

/** Building the parts solves the design (10 s limit) and offsets them; silence far past that is a lost worker. */
const PARTS_SILENCE_MS = 30_000;
/** The nester reports progress every fraction of a second; this long without a word, it is lost. */
const NEST_SILENCE_MS = 60_000;

function partsClient(create: () => Worker = newWorker) {
  return new WorkerClient<PartsRequest, CutWorkerReply>({
    create,
    silenceLimitMs: PARTS_SILENCE_MS,
    crashMessage: "The parts could not be built in this browser.",
    silenceMessage: "Building the parts stopped answering. Change a setting to try again.",
  });
}

function nestClient(create: () => Worker = newWorker) {
  return new WorkerClient<NestRequest, CutWorkerReply>({
    create,
    isLast: (reply) => reply.type !== "progress",
    // A new nest never queues behind an old one: that worker is ended and a fresh one starts.
    replaceBusyAfterMs: 0,
    silenceLimitMs: NEST_SILENCE_MS,
    crashMessage: "The nester could not start in this browser.",
    silenceMessage: "The nester stopped answering. Nest again.",
  });
}

export interface PartsState {
  preview?: PartsPreview;
  error?: { message: string; field?: string };
  busy: boolean;
}

export function useParts(spec: unknown, settings: unknown, delayMs = 150): PartsState {
  const [state, setState] = useState<PartsState>({ busy: true });
  const [client] = useState(() => partsClient());
  const key = JSON.stringify({ spec, settings });

  useEffect(() => () => client.dispose(), [client]);

  useEffect(() => {
    const timer = setTimeout(() => {
      setState((s) => ({ ...s, busy: true }));
      const { spec: sp, settings: st } = JSON.parse(key);
      client.request({ type: "parts", spec: sp, settings: st }, (event) => {
        if (event.type === "failed") return setState((s) => ({ ...s, busy: false, error: { message: event.message } }));
        const reply = event.reply;
        if (reply.type === "parts") setState({ preview: reply.preview, busy: false });
        else if (reply.type === "error")
          setState((s) => ({ preview: s.preview, error: { message: reply.message, field: reply.field }, busy: false }));
      });
    }, delayMs);
    return () => clearTimeout(timer);
  }, [client, key, delayMs]);

  return state;
}

type JointProgress = NonNullable<Extract<CutWorkerReply, { type: "progress" }>["joints"]>;

export type NestState =
  | { phase: "idle" }
  | {
      phase: "running";
      progress?: NestProgress;
      /** Set while the joints are being chosen. */
      joints?: JointProgress;
      startedAt: number;
      cancelling: boolean;
    }
  | { phase: "done"; nest: SheetNestResult; preview: PartsPreview; joints?: JointChoiceReport }
  | { phase: "failed"; message: string; field?: string };

export interface NestOptions {
  /** Choose the cut stations first (the settings have none). */
  chooseJoints?: boolean;
  /** Called with the choice just before the finished nest is shown. */
  onJoints?: (joints: JointChoiceReport) => void;
}

export function useNester() {
  const [state, setState] = useState<NestState>({ phase: "idle" });
  const [client] = useState(() => nestClient());

  useEffect(() => () => client.dispose(), [client]);

  const start = useCallback(
    (spec: unknown, settings: unknown, seconds: number, options: NestOptions = {}) => {
      setState({ phase: "running", startedAt: Date.now(), cancelling: false });
      const chooseJoints = options.chooseJoints ?? false;
      client.request({ type: "nest", spec, settings, seconds, chooseJoints }, (event) => {
        if (event.type === "failed") return setState({ phase: "failed", message: event.message });
        const reply = event.reply;
        if (reply.type === "progress")
          setState((s) => (s.phase === "running" ? { ...s, progress: reply.progress, joints: reply.joints } : s));
        else if (reply.type === "nested") {
          if (reply.joints) options.onJoints?.(reply.joints);
          setState({ phase: "done", nest: reply.nest, preview: reply.preview, joints: reply.joints });
        } else if (reply.type === "error") setState({ phase: "failed", message: reply.message, field: reply.field });
      });
    },
    [client],
  );

  const cancel = useCallback(() => {
    client.send({ type: "cancel", id: client.current } satisfies CutWorkerRequest);
    setState((s) => (s.phase === "running" ? { ...s, cancelling: true } : s));
  }, [client]);

  const reset = useCallback(() => setState({ phase: "idle" }), []);

  return { state, start, cancel, reset };
}
