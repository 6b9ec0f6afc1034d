"use client";

import type { KeyboardEvent } from "react";
import { Button } from "@/components/ui/button";
import { CYCLE_SECONDS, SPEEDS, stepFrame } from "./use-rolling-clock";

export interface PlayControlsProps {
  playing: boolean;
  onPlayingChange: (playing: boolean) => void;
  speed: number;
  onSpeedChange: (speed: number) => void;
  /** Cycle position in [0, 1). */
  position: number;
  onPositionChange: (position: number) => void;
  cycleSeconds?: number;
  /** Words for the scrub bar's current value, e.g. "axle at x = 120 mm". */
  describePosition?: (position: number) => string;
}

const NATIVE_SPACE = new Set(["BUTTON", "SELECT", "TEXTAREA", "INPUT"]);

export function PlayControls({
  playing,
  onPlayingChange,
  speed,
  onSpeedChange,
  position,
  onPositionChange,
  cycleSeconds = CYCLE_SECONDS,
  describePosition,
}: PlayControlsProps) {
  const step = (dir: 1 | -1) => {
    onPlayingChange(false);
    onPositionChange(stepFrame(position, dir, speed, cycleSeconds));
  };
  // Space plays and pauses from anywhere in the bar; buttons and selects keep their own Space,
  // but the scrub bar has none, so it gets ours.
  const onKeyDown = (e: KeyboardEvent<HTMLDivElement>) => {
    if (e.key !== " ") return;
    const el = e.target as HTMLElement;
    const isRange = el instanceof HTMLInputElement && el.type === "range";
    if (NATIVE_SPACE.has(el.tagName) && !isRange) return;
    e.preventDefault();
    onPlayingChange(!playing);
  };
  const valueText = describePosition?.(position) ?? `${(position * 100).toFixed(1)}% of the cycle`;
  return (
    <div
      role="group"
      aria-label="Playback"
      className="no-print flex flex-wrap items-center gap-2"
      onKeyDown={onKeyDown}
    >
      <Button
        type="button"
        className="w-24 justify-center"
        onClick={() => onPlayingChange(!playing)}
        aria-keyshortcuts="Space"
      >
        {playing ? "❚❚ Pause" : "▶ Play"}
      </Button>
      <Button
        type="button"
        variant="quiet"
        onClick={() => step(-1)}
        aria-label="Step one frame back"
        title="One frame back"
      >
        ◀︎
      </Button>
      <Button
        type="button"
        variant="quiet"
        onClick={() => step(1)}
        aria-label="Step one frame forward"
        title="One frame forward"
      >
        ▶︎
      </Button>
      <label className="flex items-center gap-1.5 text-sm">
        <span>Speed</span>
        <select
          className="rounded-plate border border-ink-line bg-white/70 px-1.5 py-1 font-mono text-sm"
          value={speed}
          onChange={(e) => onSpeedChange(Number(e.target.value))}
        >
          {SPEEDS.map((s) => (
            <option key={s} value={s}>
              {s}×
            </option>
          ))}
        </select>
      </label>
      <label className="flex min-w-48 flex-1 items-center gap-2 text-sm">
        <span>Position</span>
        <input
          type="range"
          min={0}
          max={1}
          step={0.001}
          value={position}
          onChange={(e) => {
            onPlayingChange(false);
            // The top end is the cycle's start again; stay just short of it so the bar does not jump back.
            onPositionChange(Math.min(Number(e.target.value), 0.9999));
          }}
          aria-valuetext={valueText}
          className="flex-1 accent-ink"
        />
      </label>
      <output className="min-w-40 font-mono text-xs text-ink-soft" aria-live="off">
        {valueText}
      </output>
    </div>
  );
}
