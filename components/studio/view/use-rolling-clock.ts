"use client";

import { useCallback, useEffect, useRef, useState } from "react";

/** Seconds one animation cycle (see lib/studio/motion) takes at 1×. */
export const CYCLE_SECONDS = 8;
/** One "frame" for the step buttons: a sixtieth of a second of motion at the current speed. */
export const FRAME_SECONDS = 1 / 60;
/** Longest gap one animation frame may cover: after a hidden tab the wheel resumes, it does not jump. */
const MAX_STEP_SECONDS = 0.25;

export const SPEEDS = [0.25, 0.5, 1, 2, 4] as const;

const wrap01 = (p: number) => p - Math.floor(p);

export interface RollingClock {
  playing: boolean;
  setPlaying: (playing: boolean) => void;
  speed: number;
  setSpeed: (speed: number) => void;
  /** Cycle position in [0, 1). */
  position: number;
  setPosition: (position: number) => void;
  cycleSeconds: number;
  /** Ready to spread into <PlayControls {...clock.controls} />. */
  controls: {
    playing: boolean;
    onPlayingChange: (playing: boolean) => void;
    speed: number;
    onSpeedChange: (speed: number) => void;
    position: number;
    onPositionChange: (position: number) => void;
    cycleSeconds: number;
  };
}

/**
 * Play state for the studio. While playing, the position advances on requestAnimationFrame by the
 * time elapsed × speed (not by a fixed step per frame), so the roll runs at an even rate whatever
 * the frame rate, and pausing stops it on the frame it is on.
 */
export function useRollingClock(opts: { cycleSeconds?: number; initialPlaying?: boolean } = {}): RollingClock {
  const cycleSeconds = opts.cycleSeconds ?? CYCLE_SECONDS;
  const [playing, setPlaying] = useState(opts.initialPlaying ?? false);
  const [speed, setSpeed] = useState(1);
  const [position, setPositionState] = useState(0);
  const positionRef = useRef(0);

  // Stable, so panels memoised on it do not redraw every frame.
  const setPosition = useCallback((p: number) => {
    positionRef.current = wrap01(p);
    setPositionState(positionRef.current);
  }, []);

  useEffect(() => {
    if (!playing) return;
    let raf = 0;
    let last: number | null = null;
    const tick = (now: number) => {
      if (last !== null) {
        const dt = Math.min(MAX_STEP_SECONDS, (now - last) / 1000);
        positionRef.current = wrap01(positionRef.current + (dt * speed) / cycleSeconds);
        setPositionState(positionRef.current);
      }
      last = now;
      raf = requestAnimationFrame(tick);
    };
    raf = requestAnimationFrame(tick);
    return () => cancelAnimationFrame(raf);
  }, [playing, speed, cycleSeconds]);

  return {
    playing,
    setPlaying,
    speed,
    setSpeed,
    position,
    setPosition,
    cycleSeconds,
    controls: {
      playing,
      onPlayingChange: setPlaying,
      speed,
      onSpeedChange: setSpeed,
      position,
      onPositionChange: setPosition,
      cycleSeconds,
    },
  };
}

/** The cycle position one frame away (dir = ±1) at this speed. */
export function stepFrame(position: number, dir: 1 | -1, speed: number, cycleSeconds = CYCLE_SECONDS): number {
  return wrap01(position + (dir * FRAME_SECONDS * speed) / cycleSeconds);
}
