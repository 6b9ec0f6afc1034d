"use client";
// Two workers: one rebuilds the parts as the settings change (newest request wins), the other runs
// a nest, reporting progress, until it finishes or is cancelled.
import { useCallback, useEffect, useRef, useState } from "react";
import type { NestProgress, SheetNestResult } from "@/lib/nest/types";
import type { CutWorkerReply, PartsPreview } from "./cut-worker";

const newWorker = () => new Worker(new URL("./cut-worker.ts", import.meta.url), { type: "module" });

export interface PartsState {
  preview?: PartsPreview;
  error?: { message: string; field?: string };
  busy: boolean;
}

export function useParts(spec: unknown, settings: unknown, delayMs = 150): PartsState {
  const [state, setState] = useState<PartsState>({ busy: true });
  const worker = useRef<Worker | null>(null);
  const seq = useRef(0);
  const key = JSON.stringify({ spec, settings });

  useEffect(() => () => worker.current?.terminate(), []);

  useEffect(() => {
    const id = ++seq.current;
    const timer = setTimeout(() => {
      const w = (worker.current ??= newWorker());
      setState((s) => ({ ...s, busy: true }));
      w.onmessage = (event: MessageEvent<CutWorkerReply>) => {
        const reply = event.data;
        if (reply.id !== seq.current) return;
        if (reply.type === "parts") setState({ preview: reply.preview, busy: false });
        else if (reply.type === "error") setState((s) => ({ preview: s.preview, error: { message: reply.message, field: reply.field }, busy: false }));
      };
      w.onerror = () => setState((s) => ({ ...s, busy: false, error: { message: "The parts could not be built in this browser." } }));
      const { spec: sp, settings: st } = JSON.parse(key);
      w.postMessage({ type: "parts", id, spec: sp, settings: st });
    }, delayMs);
    return () => clearTimeout(timer);
  }, [key, delayMs]);

  return state;
}

export type NestState =
  | { phase: "idle" }
  | { phase: "running"; progress?: NestProgress; startedAt: number; cancelling: boolean }
  | { phase: "done"; nest: SheetNestResult; preview: PartsPreview }
  | { phase: "failed"; message: string; field?: string };

export function useNester() {
  const [state, setState] = useState<NestState>({ phase: "idle" });
  const worker = useRef<Worker | null>(null);
  const current = useRef(0);

  useEffect(() => () => worker.current?.terminate(), []);

  const start = useCallback((spec: unknown, settings: unknown, seconds: number) => {
    worker.current?.terminate();
    const w = newWorker();
    worker.current = w;
    const id = ++current.current;
    setState({ phase: "running", startedAt: Date.now(), cancelling: false });
    w.onmessage = (event: MessageEvent<CutWorkerReply>) => {
      const reply = event.data;
      if (reply.id !== current.current) return;
      if (reply.type === "progress") setState((s) => (s.phase === "running" ? { ...s, progress: reply.progress } : s));
      else if (reply.type === "nested") setState({ phase: "done", nest: reply.nest, preview: reply.preview });
      else if (reply.type === "error") setState({ phase: "failed", message: reply.message, field: reply.field });
    };
    w.onerror = () => setState({ phase: "failed", message: "The nester could not start in this browser." });
    w.postMessage({ type: "nest", id, spec, settings, seconds });
  }, []);

  const cancel = useCallback(() => {
    worker.current?.postMessage({ type: "cancel", id: current.current });
    setState((s) => (s.phase === "running" ? { ...s, cancelling: true } : s));
  }, []);

  const reset = useCallback(() => setState({ phase: "idle" }), []);

  return { state, start, cancel, reset };
}
