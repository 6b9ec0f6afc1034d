"use client";
// The mock-up as SVG in millimetres (user units; y drawn as −y so up is up): the run and its base,
// the flats at its ends, the person for scale, dimension lines, pinned comments, and the wheels at
// one pose. Strokes and text keep their screen size at any zoom (`px` converts screen pixels to mm).
import { memo, type PointerEvent, type RefObject } from "react";
import type { RunPose, RunScene } from "@/lib/review/run-scene";
import type { ViewBox } from "@/lib/review/mock-up-view";
import { placeOutline } from "@/lib/studio/view-math";
import type { Pt } from "@/lib/track";

const INK = "#1d3557";
const SOFT = "#3d5a80";
const FAINT = "#8da2bb";
const PAPER = "#f6f0e1";
const PAPER_DEEP = "#ece3cc";
const GRID = "#e2d6b8";
const MONO = "var(--font-plex-mono), ui-monospace, monospace";

export interface Marker {
  id: number;
  /** Pin number shown. */
  n: number;
  at: number;
}

const d = (pts: readonly Pt[], close = false) =>
  pts.map(([x, y], i) => `${i ? "L" : "M"}${x.toFixed(1)} ${(-y).toFixed(1)}`).join("") + (close ? "Z" : "");
const len = (mm: number) => (mm >= 1000 ? `${(mm / 1000).toFixed(3)} m` : `${mm.toFixed(0)} mm`);

interface Props {
  scene: RunScene;
  pose: RunPose;
  view: ViewBox;
  /** mm per screen pixel at the current size. */
  px: number;
  markers: Marker[];
  selected: number | null;
  picking: boolean;
  onPick?: (at: number) => void;
  onSelectMarker?: (id: number) => void;
  svgRef: RefObject<SVGSVGElement | null>;
  label: string;
  /** A narrow screen: the heights and flats are listed below the drawing rather than written in it. */
  compact: boolean;
}

/** The still part of the drawing: grid, run, base, person, dimensions. Redrawn only when the scene or size changes. */
const Still = memo(function Still({
  scene,
  view,
  px,
  compact,
}: {
  scene: RunScene;
  view: ViewBox;
  px: number;
  compact: boolean;
}) {
  const t = (size: number) => size * px;
  const font = { fontFamily: MONO, fontSize: t(11), fill: INK } as const;
  const parts: React.ReactNode[] = [];
  if (scene.kind === "run") {
    const base: Pt[] = [[0, scene.floorY], ...scene.profile, [scene.runLength, scene.floorY]];
    parts.push(
      <path
        key="track"
        d={d(base, true)}
        fill={PAPER_DEEP}
        stroke={INK}
        strokeWidth={1.6}
        vectorEffect="non-scaling-stroke"
        strokeLinejoin="round"
        data-part="track"
      />,
    );
    parts.push(
      <path
        key="axle-line"
        d={d([
          [view.x, scene.axleY],
          [view.x + view.width, scene.axleY],
        ])}
        stroke={FAINT}
        strokeWidth={1}
        strokeDasharray="8 6"
        vectorEffect="non-scaling-stroke"
      />,
    );
    if (scene.eachEnd > 1 && !compact)
      for (const [x0, x1, side] of [
        [0, scene.eachEnd, "start"],
        [scene.runLength - scene.eachEnd, scene.runLength, "end"],
      ] as const)
        parts.push(
          <g key={`flat-${side}`}>
            <path
              d={d([
                [x0, scene.crestY + t(6)],
                [x1, scene.crestY + t(6)],
              ])}
              stroke={SOFT}
              strokeWidth={3}
              vectorEffect="non-scaling-stroke"
            />
            <text
              x={(x0 + x1) / 2}
              y={-(scene.crestY + t(12))}
              textAnchor="middle"
              {...font}
              fontSize={t(10)}
              fill={SOFT}
            >
              flat {len(x1 - x0)}
            </text>
          </g>,
        );
    // Run length, below the floor.
    const yRun = scene.floorY - t(26);
    parts.push(
      <g key="dim-run" data-dimension="run-length">
        <path
          d={
            d([
              [0, scene.floorY - t(4)],
              [0, yRun - t(6)],
            ]) +
            d([
              [scene.runLength, scene.floorY - t(4)],
              [scene.runLength, yRun - t(6)],
            ]) +
            d([
              [0, yRun],
              [scene.runLength, yRun],
            ])
          }
          stroke={INK}
          strokeWidth={1}
          vectorEffect="non-scaling-stroke"
          fill="none"
        />
        <text x={scene.runLength / 2} y={-yRun + t(14)} textAnchor="middle" {...font}>
          {compact
            ? `run ${len(scene.runLength)}`
            : `run ${len(scene.runLength)} · ${scene.periods} periods of ${scene.period.toFixed(1)} mm${scene.scale !== 1 ? ` · scaled ×${scene.scale.toFixed(4)}` : ""}`}
        </text>
      </g>,
    );
    // Hump height and axle height, to the right of the run (on a phone they are listed below instead).
    const xh = scene.runLength + t(18);
    if (!compact)
      parts.push(
        <g key="dim-heights">
          <path
            d={
              d([
                [xh, scene.troughY],
                [xh, scene.crestY],
              ]) +
              d([
                [xh - t(4), scene.troughY],
                [xh + t(4), scene.troughY],
              ]) +
              d([
                [xh - t(4), scene.crestY],
                [xh + t(4), scene.crestY],
              ])
            }
            stroke={INK}
            strokeWidth={1}
            vectorEffect="non-scaling-stroke"
            fill="none"
            data-dimension="hump-height"
          />
          <text x={xh + t(8)} y={-(scene.troughY + scene.crestY) / 2 + t(4)} {...font}>
            hump {scene.dims.humpHeight!.toFixed(1)} mm
          </text>
          <path
            d={
              d([
                [xh + t(110), scene.floorY],
                [xh + t(110), scene.axleY],
              ]) +
              d([
                [xh + t(104), scene.axleY],
                [xh + t(116), scene.axleY],
              ])
            }
            stroke={INK}
            strokeWidth={1}
            vectorEffect="non-scaling-stroke"
            fill="none"
            data-dimension="axle-height"
          />
          <text x={xh + t(118)} y={-(scene.floorY + scene.axleY) / 2} {...font}>
            axle {scene.dims.axleHeight!.toFixed(0)} mm
          </text>
        </g>,
      );
  } else {
    parts.push(
      <path
        key="centres"
        d={d([
          [0, 0],
          [0, -scene.centreDistance],
        ])}
        stroke={FAINT}
        strokeWidth={1}
        strokeDasharray="6 5"
        vectorEffect="non-scaling-stroke"
      />,
    );
    parts.push(
      <text key="dim-centres" x={t(10)} y={scene.centreDistance / 2} {...font}>
        centres {scene.centreDistance.toFixed(1)} mm
      </text>,
    );
  }
  // The floor and the person.
  parts.push(
    <path
      key="floor"
      d={d([
        [view.x, scene.floorY],
        [view.x + view.width, scene.floorY],
      ])}
      stroke={SOFT}
      strokeWidth={1.2}
      vectorEffect="non-scaling-stroke"
    />,
  );
  const top = Math.max(...scene.person.map((p) => p[1]));
  const px0 = Math.min(...scene.person.map((p) => p[0]));
  parts.push(
    <g key="person" data-part="person">
      <path
        d={d(scene.person, true)}
        fill="rgba(61,90,128,0.12)"
        stroke={SOFT}
        strokeWidth={1.2}
        vectorEffect="non-scaling-stroke"
        strokeLinejoin="round"
      />
      <path
        d={
          d([
            [px0 - t(10), scene.floorY],
            [px0 - t(10), top],
          ]) +
          d([
            [px0 - t(14), top],
            [px0 - t(6), top],
          ])
        }
        stroke={SOFT}
        strokeWidth={1}
        vectorEffect="non-scaling-stroke"
      />
      <text x={px0 - t(14)} y={-(scene.floorY + top) / 2} textAnchor="end" {...font} fill={SOFT}>
        1.7 m
      </text>
    </g>,
  );
  return (
    <>
      <defs>
        <pattern id="mockup-grid-minor" width={100} height={100} patternUnits="userSpaceOnUse" x={0} y={0}>
          <path d="M100 0H0V100" fill="none" stroke={GRID} strokeWidth={0.6} vectorEffect="non-scaling-stroke" />
        </pattern>
        <pattern id="mockup-grid" width={1000} height={1000} patternUnits="userSpaceOnUse" x={0} y={0}>
          <rect width={1000} height={1000} fill="url(#mockup-grid-minor)" />
          <path d="M1000 0H0V1000" fill="none" stroke={GRID} strokeWidth={1.4} vectorEffect="non-scaling-stroke" />
        </pattern>
      </defs>
      <rect x={view.x} y={view.y} width={view.width} height={view.height} fill={PAPER} />
      <rect x={view.x} y={view.y} width={view.width} height={view.height} fill="url(#mockup-grid)" />
      {parts}
    </>
  );
});

function Wheel({ outline, angleCw, axle, tone }: { outline: Pt[]; angleCw: number; axle: Pt; tone: string }) {
  const placed = placeOutline(outline, angleCw, axle[0], axle[1]);
  return (
    <g>
      <path
        d={d(placed, true)}
        fill="rgba(29,53,87,0.1)"
        stroke={tone}
        strokeWidth={1.8}
        vectorEffect="non-scaling-stroke"
        strokeLinejoin="round"
      />
      <path
        d={d([axle, placed[0]])}
        stroke={tone}
        strokeWidth={1}
        strokeDasharray="4 3"
        vectorEffect="non-scaling-stroke"
      />
    </g>
  );
}

function AxleMark({ at, r, tone, name }: { at: Pt; r: number; tone: string; name: string }) {
  return (
    <g data-axle={name}>
      <circle
        cx={at[0]}
        cy={-at[1]}
        r={r}
        fill={PAPER}
        stroke={tone}
        strokeWidth={1.2}
        vectorEffect="non-scaling-stroke"
      />
      <path
        d={
          d([
            [at[0] - 1.8 * r, at[1]],
            [at[0] + 1.8 * r, at[1]],
          ]) +
          d([
            [at[0], at[1] - 1.8 * r],
            [at[0], at[1] + 1.8 * r],
          ])
        }
        stroke={tone}
        strokeWidth={1}
        vectorEffect="non-scaling-stroke"
      />
    </g>
  );
}

/** Where a pin stands: above the run at its place, or round the driver at its turn. */
function pinSpot(scene: RunScene, at: number, lift: number): { foot: Pt; head: Pt } {
  if (scene.kind === "pair") {
    const r = scene.dims.wheelAcross / 2 + lift;
    const a = (at * Math.PI) / 180;
    // Measured clockwise from straight down, the way the driver turns.
    return { foot: [-Math.sin(a) * (r - lift), -Math.cos(a) * (r - lift)], head: [-Math.sin(a) * r, -Math.cos(a) * r] };
  }
  const i = scene.profile.findIndex((p) => p[0] >= at);
  const y =
    i <= 0
      ? scene.profile[0][1]
      : scene.profile[i - 1][1] +
        ((at - scene.profile[i - 1][0]) / (scene.profile[i][0] - scene.profile[i - 1][0])) *
          (scene.profile[i][1] - scene.profile[i - 1][1]);
  return { foot: [at, y], head: [at, scene.crestY + lift] };
}

export function MockUpDrawing({
  scene,
  pose,
  view,
  px,
  markers,
  selected,
  picking,
  onPick,
  onSelectMarker,
  svgRef,
  label,
  compact,
}: Props) {
  const t = (size: number) => size * px;
  const pick = (e: PointerEvent<SVGSVGElement>) => {
    if (!picking || !onPick || !svgRef.current) return;
    const m = svgRef.current.getScreenCTM();
    if (!m) return;
    const p = new DOMPoint(e.clientX, e.clientY).matrixTransform(m.inverse());
    if (scene.kind === "pair") {
      // Clockwise from straight down, in degrees.
      const deg = ((Math.atan2(-p.x, p.y) * 180) / Math.PI + 360) % 360;
      onPick(Number(deg.toFixed(1)));
    } else onPick(Number(Math.min(scene.runLength, Math.max(0, p.x)).toFixed(0)));
  };
  const tone = INK;
  return (
    <svg
      ref={svgRef}
      viewBox={`${view.x} ${view.y} ${view.width} ${view.height}`}
      preserveAspectRatio="xMidYMid meet"
      className={`block w-full ${picking ? "cursor-crosshair" : ""}`}
      style={{ aspectRatio: `${view.width} / ${view.height}` }}
      // A picture, unless it holds pinned comments: those are buttons, which an "img" would hide
      // from assistive technology (its children are presentational), so it is then a labelled group.
      role={markers.length > 0 ? "group" : "img"}
      aria-label={label}
      onPointerDown={pick}
      data-testid="mockup-drawing"
    >
      <Still scene={scene} view={view} px={px} compact={compact} />
      {pose.partnerAxle && scene.partner ? (
        <>
          <Wheel outline={scene.partner} angleCw={-(pose.partnerAngle ?? 0)} axle={pose.partnerAxle} tone={SOFT} />
          <AxleMark at={pose.partnerAxle} r={t(4)} tone={SOFT} name="partner" />
        </>
      ) : null}
      <Wheel outline={scene.wheel} angleCw={pose.wheelAngle} axle={pose.wheelAxle} tone={tone} />
      <AxleMark at={pose.wheelAxle} r={t(4)} tone={tone} name="wheel" />
      <circle
        cx={pose.contact[0]}
        cy={-pose.contact[1]}
        r={t(3)}
        fill={INK}
        stroke={PAPER}
        strokeWidth={1}
        vectorEffect="non-scaling-stroke"
      />
      {markers.map((m) => {
        const { foot, head } = pinSpot(scene, m.at, t(36));
        const on = selected === m.id;
        return (
          <g
            key={m.id}
            data-pin={m.n}
            role="button"
            tabIndex={0}
            aria-label={`Pinned comment ${m.n}`}
            onPointerDown={(e) => {
              e.stopPropagation();
              onSelectMarker?.(m.id);
            }}
            onKeyDown={(e) => {
              if (e.key === "Enter" || e.key === " ") {
                e.preventDefault();
                onSelectMarker?.(m.id);
              }
            }}
            className="cursor-pointer"
          >
            <path
              d={d([foot, head])}
              stroke={on ? INK : SOFT}
              strokeWidth={on ? 2 : 1.2}
              vectorEffect="non-scaling-stroke"
            />
            <circle
              cx={head[0]}
              cy={-head[1]}
              r={t(on ? 10 : 8)}
              fill={on ? INK : PAPER}
              stroke={on ? INK : SOFT}
              strokeWidth={1.4}
              vectorEffect="non-scaling-stroke"
            />
            <text
              x={head[0]}
              y={-head[1] + t(3.5)}
              textAnchor="middle"
              fontFamily={MONO}
              fontSize={t(10)}
              fill={on ? PAPER : INK}
            >
              {m.n}
            </text>
          </g>
        );
      })}
    </svg>
  );
}
