// The frames of a design rolling, as standalone SVGs, for the animated preview in the review e-mail.
// Each frame poses the bodies exactly as the studio canvas does (lib/studio/motion: the engine's own
// motion tables, interpolated by the rolling law; each wheel's axle set at the height its own outline
// rests at), so the picture a client gets by e-mail is the one the studio and the review page roll.
// Frame k shows cycle position k/N, so the loop is seamless. Pure string building from numbers.
import type { Pt, SolvedGeometry } from "@/lib/track";
import { axleTrace, cycleOf, isPairResult, poseAt, restingAxles } from "@/lib/studio/motion";
import { sceneOf } from "@/lib/studio/scene";
import { fitView, placeOutline, toScreen, type View } from "@/lib/studio/view-math";

// The drafting-table colours of the app (tailwind.config.ts).
const PAPER = "#f6f0e1";
const GRID = "#e2d6b8";
const INK = "#1d3557";
const SOFT = "#3d5a80";
const FAINT = "#8da2bb";

export interface FrameOptions {
  frames?: number;
  width?: number;
  height?: number;
}

export interface PosedFrame {
  position: number;
  /** Where each axle is drawn, in the design's units (y up). */
  wheelAxle: Pt;
  partnerAxle?: Pt;
  svg: string;
}

export interface RollingFrames {
  frames: PosedFrame[];
  width: number;
  height: number;
  /** Time each frame shows, ms. */
  delayMs: number;
}

const f = (v: number) => (Math.abs(v) < 1e-9 ? "0" : v.toFixed(2));
const poly = (pts: readonly Pt[], view: View, close: boolean) => {
  const d = pts.map((p, i) => {
    const [x, y] = toScreen(view, p);
    return `${i ? "L" : "M"}${f(x)} ${f(y)}`;
  });
  return d.join("") + (close ? "Z" : "");
};

/** A faint grid at a round step in the design's units, about 24 px apart. */
function grid(view: View, w: number, h: number): string {
  const raw = 24 / view.scale;
  const step =
    [1, 2, 5].map((m) => m * 10 ** Math.floor(Math.log10(raw))).find((s) => s >= raw) ??
    10 ** Math.ceil(Math.log10(raw));
  const lines: string[] = [];
  const x0 = -view.ox / view.scale;
  for (let x = Math.ceil(x0 / step) * step; view.ox + view.scale * x <= w; x += step)
    lines.push(`M${f(view.ox + view.scale * x)} 0V${h}`);
  const yTop = view.oy / view.scale;
  for (let y = Math.floor(yTop / step) * step; view.oy - view.scale * y <= h; y -= step)
    lines.push(`M0 ${f(view.oy - view.scale * y)}H${w}`);
  return `<path d="${lines.join("")}" stroke="${GRID}" stroke-width="0.6" fill="none"/>`;
}

function axleMark([x, y]: Pt, colour: string): string {
  return `<circle cx="${f(x)}" cy="${f(y)}" r="4" fill="${PAPER}" stroke="${colour}" stroke-width="1.3"/><path d="M${f(x - 7)} ${f(y)}H${f(x + 7)}M${f(x)} ${f(y - 7)}V${f(y + 7)}" stroke="${colour}" stroke-width="1"/>`;
}

/** The frames of one seamless loop of the design rolling. */
export function rollingFrames(result: SolvedGeometry, opts: FrameOptions = {}): RollingFrames {
  const n = Math.max(2, Math.round(opts.frames ?? 40));
  const width = Math.round(opts.width ?? 560);
  const height = Math.round(opts.height ?? Math.round(width * 0.5));
  const scene = sceneOf(result);
  const pair = isPairResult(result);
  // The scene's bounds hold a pair's two discs, or the run with the wheel at both of its ends.
  const view = fitView(scene.bounds, width, height, 18);
  const trace = pair ? [] : axleTrace(result, 240);
  const cycle = cycleOf(result);
  const still = [
    `<rect width="${width}" height="${height}" fill="${PAPER}"/>`,
    grid(view, width, height),
    pair
      ? ""
      : `<path d="M0 ${f(toScreen(view, [0, scene.axleY])[1])}H${width}" stroke="${FAINT}" stroke-width="1" stroke-dasharray="6 5"/>`,
    scene.track.length
      ? `<path d="${poly(scene.track, view, false)}" fill="none" stroke="${INK}" stroke-width="2" stroke-linejoin="round"/>`
      : "",
  ].join("");
  const frames: PosedFrame[] = [];
  for (let k = 0; k < n; k++) {
    const position = k / n;
    const pose = poseAt(result, position);
    const rest = restingAxles(result, pose);
    const wheelAxle: Pt = pair ? [0, 0] : [pose.wheel.x, rest.wheel];
    const partnerAxle: Pt | undefined = pose.partner
      ? pair
        ? [pose.partner.x, pose.partner.y]
        : [pose.partner.x, rest.partner ?? pose.partner.y]
      : undefined;
    const body: string[] = [];
    if (!pair) {
      const travelled = position * cycle.length;
      const pts: Pt[] = trace.filter((t) => t.along - cycle.start <= travelled).map((t) => [t.x, t.wheel]);
      pts.push(wheelAxle);
      if (pts.length > 1)
        body.push(`<path d="${poly(pts, view, false)}" fill="none" stroke="${SOFT}" stroke-width="1.4"/>`);
    }
    if (result.partner && pose.partner && partnerAxle) {
      const placed = placeOutline(result.partner.points, -pose.partner.angle, partnerAxle[0], partnerAxle[1]);
      body.push(
        `<path d="${poly(placed, view, true)}" fill="rgba(61,90,128,0.08)" stroke="${SOFT}" stroke-width="1.6" stroke-linejoin="round"/>`,
      );
      body.push(axleMark(toScreen(view, partnerAxle), SOFT));
    }
    const wheel = placeOutline(result.wheel.points, pose.wheel.angle, wheelAxle[0], wheelAxle[1]);
    body.push(
      `<path d="${poly(wheel, view, true)}" fill="rgba(29,53,87,0.08)" stroke="${INK}" stroke-width="1.8" stroke-linejoin="round"/>`,
    );
    // A spoke from the axle to the outline's first point, so a round wheel is seen to turn.
    const [ax, ay] = toScreen(view, wheelAxle);
    const [mx, my] = toScreen(view, wheel[0]);
    body.push(
      `<path d="M${f(ax)} ${f(ay)}L${f(mx)} ${f(my)}" stroke="${INK}" stroke-width="1" stroke-dasharray="4 3"/>`,
    );
    body.push(axleMark([ax, ay], INK));
    const [cx, cy] = toScreen(view, pose.contact);
    body.push(`<circle cx="${f(cx)}" cy="${f(cy)}" r="3" fill="${INK}" stroke="${PAPER}" stroke-width="1"/>`);
    const svg = `<svg xmlns="http://www.w3.org/2000/svg" width="${width}" height="${height}" viewBox="0 0 ${width} ${height}">${still}${body.join("")}</svg>`;
    frames.push({ position, wheelAxle, partnerAxle, svg });
  }
  return { frames, width, height, delayMs: 60 };
}
