"use client";

import { useCallback, useMemo, useState } from "react";
import type { CheckResult, DesignSpec, SolvedGeometry, SolveOption, SolveResult } from "@/lib/track";
import { alongAt, contactLocation } from "@/lib/studio/motion";
import { fmt, type Pt } from "@/lib/studio/view-math";
import { Notice } from "@/components/ui/notice";
import type { CanvasHighlight } from "./canvas-stage";
import { CheckPanel } from "./check-panel";
import { CheckPlots } from "./check-plots";
import { OptionsTable } from "./options-table";
import { PlayControls } from "./play-controls";
import { StudioCanvas } from "./studio-canvas";
import { useRollingClock } from "./use-rolling-clock";

export interface StudioViewProps {
  /** The engine's geometry (or a whole SolveResult); undefined while solving. */
  result?: SolvedGeometry;
  /** The closure options of `result`, when they come separately (undefined: still coming). */
  options?: SolveOption[];
  /** The rolling check of `result`, when it comes separately (undefined: still checking). */
  check?: CheckResult;
  /** The rolling check or the options stopped on an error. */
  checkError?: string;
  spec?: DesignSpec;
  /** A plain message when the engine could not solve the spec. */
  error?: string;
  /** Picking a closure option (periods per turn, or lobes). */
  onPick?: (n: number) => void;
  /** Placing the axle of an uploaded outline on the canvas; undefined where it cannot be edited. */
  onAxleChange?: (axle: { x: number; y: number }) => void;
  canvasHeight?: number;
  /** A panel below the check (the load-path cautions), given a way to mark a place along the roll on the canvas. */
  belowCheck?: (showAt: (along: number, label: string) => void) => React.ReactNode;
}

/** The studio's view half: canvas and playback on the left, the check and options on the right, plots below. */
export function StudioView({
  result,
  options,
  check,
  checkError,
  spec,
  error,
  onPick,
  onAxleChange,
  canvasHeight,
  belowCheck,
}: StudioViewProps) {
  const clock = useRollingClock();
  const [highlight, setHighlight] = useState<CanvasHighlight | null>(null);
  // A new design clears the old design's highlight (adjusted while rendering, not in an effect).
  const [seenHash, setSeenHash] = useState(result?.specHash);
  if (result?.specHash !== seenHash) {
    setSeenHash(result?.specHash);
    setHighlight(null);
  }

  const { setPlaying, setPosition } = clock;
  const pointAt = useCallback(
    (position: number, spot: Pt) => {
      setPlaying(false);
      setPosition(position);
      setHighlight({ point: spot, label: `${fmt(spot[0])}, ${fmt(spot[1])}` });
    },
    [setPlaying, setPosition],
  );
  const showAt = useCallback(
    (along: number, label: string) => {
      if (!result) return;
      const loc = contactLocation(result, along);
      setPlaying(false);
      setPosition(loc.position);
      setHighlight({ point: loc.point, label });
    },
    [result, setPlaying, setPosition],
  );
  const current = result?.mode === "partner-wheel" ? spec?.lobes : spec?.periodsPerTurn;
  // The drawing needs the geometry alone; the panels take the options and the check as they come.
  const withOptions = useMemo(() => (result && options ? { ...result, options } : result), [result, options]);
  const checked = useMemo((): SolveResult | undefined => {
    if (!withOptions) return undefined;
    if (check) return { ...withOptions, ...check };
    return "check" in withOptions ? (withOptions as SolveResult) : undefined;
  }, [withOptions, check]);
  const optionsPending = !!result && !result.options && !options && !checkError;
  // The clock re-renders this view on every frame; the panels and plots only change with the result.
  const plots = useMemo(() => (!error ? <CheckPlots result={result} /> : null), [error, result]);
  const side = useMemo(
    () => (
      <aside className="flex flex-col gap-3">
        {!error ? (
          <CheckPanel result={checked} checking={!!result && !checked} error={checkError} onPointAt={pointAt} />
        ) : null}
        {!error && belowCheck ? belowCheck(showAt) : null}
        <OptionsTable
          result={error ? undefined : withOptions}
          pending={optionsPending}
          currentValue={current}
          onPick={onPick}
        />
      </aside>
    ),
    [error, result, checked, checkError, withOptions, optionsPending, pointAt, current, onPick, belowCheck, showAt],
  );
  const describePosition = (p: number) => {
    if (!result) return "";
    const a = alongAt(result, p);
    return result.mode === "partner-wheel" ? `driver turned ${fmt(a, 3)} rad` : `axle at x = ${fmt(a)} ${result.units}`;
  };

  return (
    <div className="grid gap-gutter 2xl:grid-cols-[minmax(0,1fr)_22rem]" data-testid="studio-view">
      <div className="flex min-w-0 flex-col gap-3">
        {error ? <Notice tone="problem">{error}</Notice> : null}
        <StudioCanvas
          result={error ? undefined : result}
          spec={spec}
          playing={clock.playing}
          speed={clock.speed}
          position={clock.position}
          onPositionChange={clock.setPosition}
          onPlayingChange={clock.setPlaying}
          highlight={highlight}
          height={canvasHeight}
          onAxleChange={onAxleChange}
        />
        {result && !error ? (
          <div className="flex flex-wrap items-center gap-3">
            <div className="flex-1">
              <PlayControls {...clock.controls} describePosition={describePosition} />
            </div>
            {highlight ? (
              <button
                type="button"
                className="no-print text-xs text-caution-ink underline"
                onClick={() => setHighlight(null)}
              >
                Clear the mark
              </button>
            ) : null}
          </div>
        ) : null}
        {plots}
      </div>
      {side}
    </div>
  );
}
