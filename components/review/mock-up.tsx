"use client";
// The client's mock-up: the design solved in the browser by the same engine (in the studio's
// worker), laid out as the run will be built, rolling with play, pause and a scrub bar; a person
// 1.7 m tall beside it; dimensions in the units the reader picks; pinned comments as numbered
// markers. No editing: nothing of the studio's tools. Publishes a read-only probe for browser tests.
import { useEffect, useMemo, useRef, useState } from "react";
import { useSolver } from "@/components/studio/use-solver";
import { PlayControls } from "@/components/studio/view/play-controls";
import { FrameMeter } from "@/components/studio/view/studio-probe";
import { useRollingClock } from "@/components/studio/view/use-rolling-clock";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import {
  COMPACT_WIDTH,
  followView,
  scaleRatio,
  wholeView,
  type Screen,
  type ViewMode,
} from "@/lib/review/mock-up-view";
import {
  placeOfPosition,
  poseOnRun,
  positionOfPlace,
  runScene,
  type RunChoice,
  type RunScene,
} from "@/lib/review/run-scene";
import type { SolvedGeometry } from "@/lib/track";
import { MockUpDrawing, type Marker } from "./mock-up-drawing";
import { publishReviewProbe } from "./mock-up-probe";

export interface MockUpProps {
  spec: unknown;
  run: RunChoice | null;
  markers?: Marker[];
  selected?: number | null;
  onSelectMarker?: (id: number) => void;
  /** Choosing a place for a comment: the drawing takes a click (or the wheel's place by button). */
  picking?: boolean;
  onPickPlace?: (at: number) => void;
  /** Jump the roll to this place (a selected pin). */
  focusAt?: number | null;
}

/** Walking pace of the roll at 1×, mm/s, and the shortest loop, s. */
const PACE = 500;
const MIN_LOOP = 6;

function loopSeconds(scene: RunScene): number {
  return scene.kind === "pair" ? 8 : Math.max(MIN_LOOP, (scene.rollEnd - scene.rollStart) / PACE);
}

/** Words for a roll position: where the wheel is along the run, or how far a pair's driver has turned. */
function describe(scene: RunScene, p: number, units: "mm" | "in"): string {
  const place = placeOfPosition(scene, p);
  return scene.kind === "pair"
    ? `driver turned ${place.toFixed(0)}°`
    : `wheel at ${lengthIn(place, units)} along the run`;
}

function lengthIn(mm: number, units: "mm" | "in"): string {
  if (units === "in") {
    const inches = mm / 25.4;
    return inches >= 24 ? `${Math.floor(inches / 12)} ft ${(inches % 12).toFixed(1)} in` : `${inches.toFixed(2)} in`;
  }
  return mm >= 1000 ? `${(mm / 1000).toFixed(3)} m` : `${mm.toFixed(1)} mm`;
}

export function MockUp(props: MockUpProps) {
  const solved = useSolver(props.spec);
  if (solved.error) return <Notice tone="problem">The mock-up could not be drawn: {solved.error.message}</Notice>;
  if (!solved.result)
    return (
      <p
        className="rounded-plate border border-ink-line bg-paper px-3 py-8 text-center text-sm text-ink-soft"
        data-testid="mockup-waiting"
      >
        Drawing the mock-up…
      </p>
    );
  return <MockUpScene {...props} result={solved.result} />;
}

function MockUpScene({
  result,
  run,
  markers = [],
  selected = null,
  onSelectMarker,
  picking = false,
  onPickPlace,
  focusAt,
}: MockUpProps & { result: SolvedGeometry }) {
  const scene = useMemo(() => runScene(result, run), [result, run]);
  // It plays at once, unless the reader asks for less motion (Media Queries Level 5, prefers-reduced-motion).
  const [reduced] = useState(
    () => typeof window !== "undefined" && !!window.matchMedia?.("(prefers-reduced-motion: reduce)").matches,
  );
  const clock = useRollingClock({ cycleSeconds: loopSeconds(scene), initialPlaying: !reduced });
  const { playing, setPlaying, position, setPosition } = clock;
  const [mode, setMode] = useState<ViewMode>("whole");
  const [units, setUnits] = useState<"mm" | "in">(result.units);
  // The room the drawing has: the box's width, and at most 62 % of the window's height.
  const [screen, setScreen] = useState<Screen>({ width: 800, maxHeight: 500 });
  const box = useRef<HTMLDivElement>(null);
  const svg = useRef<SVGSVGElement>(null);
  const [meter] = useState(() => new FrameMeter());
  const trace = useRef<number[]>([]);

  // A selected pin brings the roll to its place (state adjusted while rendering, not in an effect).
  const [seenFocus, setSeenFocus] = useState(focusAt);
  if (focusAt !== seenFocus) {
    setSeenFocus(focusAt);
    if (focusAt !== null && focusAt !== undefined) {
      setPlaying(false);
      setPosition(positionOfPlace(scene, focusAt));
    }
  }

  useEffect(() => {
    const el = box.current;
    if (!el) return;
    const measure = () => setScreen({ width: el.clientWidth - 2, maxHeight: Math.max(220, 0.62 * window.innerHeight) });
    const ro = new ResizeObserver(measure);
    ro.observe(el);
    window.addEventListener("resize", measure);
    return () => {
      ro.disconnect();
      window.removeEventListener("resize", measure);
    };
  }, []);

  const pose = poseOnRun(result, scene, position);
  const { view, px } = mode === "whole" ? wholeView(scene, screen) : followView(scene, pose.wheelAxle[0], screen);

  const viewKey = `${mode}:${view.width.toFixed(3)}:${view.height.toFixed(3)}`;
  const traceKey = useRef("");
  useEffect(() => {
    meter.tick(performance.now());
    // Heights on the drawing itself (px down from its top edge), so scrolling or a layout shift above it does not count.
    const el = svg.current;
    const m = el?.getScreenCTM();
    const top = el?.getBoundingClientRect().top ?? 0;
    const screenY = (yMm: number) => (m ? m.d * -yMm + m.f - top : NaN);
    // A new view (resize, the other mode) starts a new trace: the pixels mean something else now.
    if (traceKey.current !== viewKey) {
      traceKey.current = viewKey;
      trace.current = [];
    }
    trace.current.push(screenY(pose.wheelAxle[1]));
    if (trace.current.length > 600) trace.current.splice(0, trace.current.length - 600);
    publishReviewProbe(box.current, {
      mode: result.mode,
      frames: meter.frames,
      fps: meter.fps,
      position,
      playing,
      view: mode,
      runLengthMm: scene.kind === "run" ? scene.runLength : null,
      axleLine: screenY(scene.kind === "run" ? scene.axleY : 0),
      axleTrace: [...trace.current],
      offLineMm: pose.offLine,
      pixelsPerMm: 1 / px,
      markers: markers.length,
    });
  });

  const place = placeOfPosition(scene, position);
  const where = describe(scene, position, units);
  const label =
    scene.kind === "run"
      ? `Mock-up to scale: a ${lengthIn(scene.runLength, units)} run of ${scene.periods} periods with a person 1.7 m tall beside it; the ${where}.`
      : `Mock-up to scale: two wheels turning on fixed axles ${lengthIn(scene.centreDistance, units)} apart, a person 1.7 m tall beside them; the ${where}.`;

  return (
    <div ref={box} className="flex flex-col gap-2" data-testid="mockup">
      <div className="overflow-hidden rounded-plate border border-paper-edge">
        <MockUpDrawing
          scene={scene}
          pose={pose}
          view={view}
          px={px}
          markers={markers}
          selected={selected}
          picking={picking}
          onPick={onPickPlace}
          onSelectMarker={onSelectMarker}
          svgRef={svg}
          label={label}
          compact={screen.width < COMPACT_WIDTH}
        />
      </div>
      <PlayControls {...clock.controls} describePosition={(p) => describe(scene, p, units)} />
      <div className="no-print flex flex-wrap items-center gap-2 text-sm">
        <div role="group" aria-label="View" className="flex overflow-hidden rounded-plate border border-ink-line">
          {(["whole", "follow"] as const).map((m) => (
            <button
              key={m}
              type="button"
              aria-pressed={mode === m}
              onClick={() => setMode(m)}
              className={`px-2 py-1 text-xs ${mode === m ? "bg-ink text-paper" : "bg-transparent text-ink"}`}
            >
              {m === "whole" ? "Whole run" : "Follow the wheel"}
            </button>
          ))}
        </div>
        <div role="group" aria-label="Units" className="flex overflow-hidden rounded-plate border border-ink-line">
          {(["mm", "in"] as const).map((u) => (
            <button
              key={u}
              type="button"
              aria-pressed={units === u}
              onClick={() => setUnits(u)}
              className={`px-2 py-1 font-mono text-xs ${units === u ? "bg-ink text-paper" : "bg-transparent text-ink"}`}
            >
              {u}
            </button>
          ))}
        </div>
        {picking && onPickPlace ? (
          <Button
            type="button"
            variant="quiet"
            onClick={() => onPickPlace(Number(place.toFixed(scene.kind === "pair" ? 1 : 0)))}
            data-testid="pin-at-wheel"
          >
            Pin where the wheel is
          </Button>
        ) : null}
      </div>
      <p className="font-mono text-xs text-ink-soft" aria-live="off">
        scale {scaleRatio(px)} on this screen
        {picking ? " · tap the drawing to choose the place, or pin where the wheel is" : ""}
      </p>
      <Dimensions scene={scene} units={units} />
    </div>
  );
}

function Dimensions({ scene, units }: { scene: RunScene; units: "mm" | "in" }) {
  const rows: [string, string][] = [];
  const dm = scene.dims;
  if (scene.kind === "run") {
    rows.push([
      "Run length",
      `${lengthIn(scene.runLength, units)} (${scene.periods} periods of ${lengthIn(scene.period, units)}${scene.eachEnd > 1 ? `, ${lengthIn(scene.eachEnd, units)} flat at each end` : ""})`,
    ]);
    rows.push(["Hump height", lengthIn(dm.humpHeight!, units)]);
    rows.push([
      scene.mode === "twin-wheels" ? "Upper axle above the lowest point" : "Axle above the floor",
      lengthIn(dm.axleHeight!, units),
    ]);
  } else rows.push(["Centre distance", lengthIn(scene.centreDistance, units)]);
  rows.push([
    scene.kind === "pair" ? "Driver, across" : scene.mode === "twin-wheels" ? "Each wheel, across" : "Wheel, across",
    lengthIn(dm.wheelAcross, units),
  ]);
  if (scene.kind === "pair" && dm.partnerAcross) rows.push(["Partner, across", lengthIn(dm.partnerAcross, units)]);
  return (
    <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-0.5 text-sm" data-testid="mockup-dimensions">
      {rows.map(([k, v]) => (
        <div key={k} className="contents">
          <dt className="text-ink-soft">{k}</dt>
          <dd className="font-mono">{v}</dd>
        </div>
      ))}
      {scene.kind === "pair" ? (
        <p className="col-span-2 text-xs text-ink-soft">
          The design does not set how high the pair is mounted: the person stands level with its lowest point.
        </p>
      ) : null}
    </dl>
  );
}
