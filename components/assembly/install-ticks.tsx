"use client";
// The installer's ticks on the assembly sheet: a box per part and per joint. Each tick (or untick)
// is written to the build log with the part ids; the bar shows how many of all are installed.
import { useMutation } from "@tanstack/react-query";
import { createContext, useContext, useState, type ReactNode } from "react";
import { postJson } from "@/components/api/request-json";

interface TickAnswer {
  items: { item: string; done: boolean }[];
  installed: number;
  total: number;
}

interface TickState {
  done: Record<string, boolean>;
  installed: number;
  total: number;
}

interface Ticks {
  state: TickState;
  canTick: boolean;
  busy: string | null;
  error: string | null;
  toggle: (item: string) => void;
}

const TicksContext = createContext<Ticks | null>(null);

export function InstallTicks({
  cutPlanId,
  initial,
  canTick,
  children,
}: {
  cutPlanId: number;
  initial: TickState;
  canTick: boolean;
  children: ReactNode;
}) {
  const [state, setState] = useState(initial);
  const tick = useMutation({
    mutationFn: ({ item, done }: { item: string; done: boolean; before: TickState }) =>
      postJson<TickAnswer>(`/api/cut-plans/${cutPlanId}/ticks`, { item, done }),
    // The box shows the tick at once; the server's answer then sets the count (or undoes the tick).
    onMutate: ({ item, done, before }) =>
      setState({ ...before, done: { ...before.done, [item]: done }, installed: before.installed + (done ? 1 : -1) }),
    onSuccess: (answer) =>
      setState({
        done: Object.fromEntries(answer.items.map((i) => [i.item, i.done])),
        installed: answer.installed,
        total: answer.total,
      }),
    onError: (_error, { before }) => setState(before),
  });
  const busy = tick.isPending ? (tick.variables?.item ?? null) : null;
  const error = tick.isError && tick.variables ? `${tick.variables.item} was not saved: ${tick.error.message}` : null;
  const toggle = (item: string) => {
    if (!canTick || busy) return;
    tick.mutate({ item, done: !state.done[item], before: state });
  };
  return <TicksContext.Provider value={{ state, canTick, busy, error, toggle }}>{children}</TicksContext.Provider>;
}

function useTicks(): Ticks {
  const t = useContext(TicksContext);
  if (!t) throw new Error("TickBox must sit inside InstallTicks");
  return t;
}

/** The box in a table row: a checkbox on screen for those who tick, an empty square on paper. */
export function TickBox({ item, label }: { item: string; label: string }) {
  const { state, canTick, busy, toggle } = useTicks();
  const done = !!state.done[item];
  return (
    <>
      <input
        type="checkbox"
        className="no-print size-4 accent-ink"
        checked={done}
        disabled={!canTick || (busy !== null && busy !== item)}
        onChange={() => toggle(item)}
        aria-label={`${label} installed`}
        data-testid={`tick-${item}`}
      />
      <span className="print-only inline-block size-3.5 border border-ink align-middle" aria-hidden>
        {done ? "✓" : ""}
      </span>
    </>
  );
}

export function InstallProgress() {
  const { state, error, canTick } = useTicks();
  const share = state.total ? state.installed / state.total : 0;
  return (
    <div className="flex flex-col gap-1" data-testid="install-progress">
      <div
        role="progressbar"
        aria-label="Installed"
        aria-valuemin={0}
        aria-valuemax={state.total}
        aria-valuenow={state.installed}
        className="h-2 w-full overflow-hidden rounded-plate bg-paper-deep"
      >
        <div className="h-full bg-ink" style={{ width: `${share * 100}%` }} />
      </div>
      <p className="text-sm">
        <span className="font-mono" data-testid="install-count">
          {state.installed} of {state.total}
        </span>{" "}
        parts and joints installed{canTick ? " · each tick goes into the build log" : ""}
      </p>
      {error ? (
        <p role="alert" className="text-sm text-caution-ink">
          {error}
        </p>
      ) : null}
    </div>
  );
}
