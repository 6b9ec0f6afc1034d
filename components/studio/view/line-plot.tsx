import { fmt, niceTicks, type Series } from "@/lib/studio/view-math";

// A small line plot in plain SVG: ink on paper, labelled axes with units, optional caution guide
// line. Strokes and text are dark enough to survive a black-and-white print.

export interface LinePlotProps {
  title: string;
  series: Series;
  xLabel: string;
  yLabel: string;
  xDomain?: [number, number];
  yDomain?: [number, number];
  /** A horizontal guide (e.g. the 0.6 friction line), drawn dashed in the caution colour. */
  guide?: { y: number; label: string };
  /** Values beyond ±clip are drawn at the edge and marked (a corner's spike would flatten the rest). */
  clip?: number;
  clipNote?: string;
}

const W = 320;
const H = 170;
const M = { left: 46, right: 10, top: 10, bottom: 34 };

export function LinePlot({ title, series, xLabel, yLabel, xDomain, yDomain, guide, clip, clipNote }: LinePlotProps) {
  const n = series.x.length;
  if (n < 2)
    return (
      <figure className="text-sm">
        <figcaption className="font-medium">{title}</figcaption>
        <p className="text-ink-soft">Not enough points to plot.</p>
      </figure>
    );
  const ys = clip === undefined ? series.y : series.y.map((v) => Math.max(-clip, Math.min(clip, v)));
  const [x0, x1] = xDomain ?? [Math.min(...series.x), Math.max(...series.x)];
  let [y0, y1] = yDomain ?? [Math.min(0, ...ys, guide?.y ?? 0), Math.max(...ys, guide?.y ?? -Infinity)];
  if (!(y1 > y0)) [y0, y1] = [y0 - 1, y0 + 1];
  const pad = (y1 - y0) * 0.06;
  y1 += pad;
  if (y0 < 0) y0 -= pad;
  const px = (x: number) => M.left + ((x - x0) / (x1 - x0 || 1)) * (W - M.left - M.right);
  const py = (y: number) => H - M.bottom - ((y - y0) / (y1 - y0)) * (H - M.top - M.bottom);
  const d = series.x.map((x, i) => `${i ? "L" : "M"}${px(x).toFixed(1)},${py(ys[i]).toFixed(1)}`).join("");
  const clipped = clip === undefined ? [] : series.x.filter((_, i) => Math.abs(series.y[i]) > clip);
  const xt = niceTicks(x0, x1, 4);
  const yt = niceTicks(y0, y1, 4);
  return (
    <figure className="flex flex-col gap-1 text-sm" data-plot={title}>
      <figcaption className="font-medium">{title}</figcaption>
      <svg
        viewBox={`0 0 ${W} ${H}`}
        className="w-full"
        role="img"
        aria-label={`${title}: ${yLabel} against ${xLabel}, from ${fmt(Math.min(...series.y), 3)} to ${fmt(Math.max(...series.y), 3)}`}
      >
        <rect
          x={M.left}
          y={M.top}
          width={W - M.left - M.right}
          height={H - M.top - M.bottom}
          fill="#fffdf7"
          stroke="#c4cfdc"
        />
        {yt.map((v) => (
          <g key={`y${v}`}>
            <line x1={M.left} x2={W - M.right} y1={py(v)} y2={py(v)} stroke="#e2d6b8" strokeWidth={0.75} />
            <text x={M.left - 4} y={py(v) + 3} textAnchor="end" fontSize={9} className="fill-ink font-mono">
              {fmt(v, 3)}
            </text>
          </g>
        ))}
        {xt.map((v) => (
          <g key={`x${v}`}>
            <line x1={px(v)} x2={px(v)} y1={H - M.bottom} y2={H - M.bottom + 3} stroke="#1d3557" strokeWidth={0.75} />
            <text x={px(v)} y={H - M.bottom + 13} textAnchor="middle" fontSize={9} className="fill-ink font-mono">
              {fmt(v, 3)}
            </text>
          </g>
        ))}
        {y0 < 0 && y1 > 0 ? (
          <line x1={M.left} x2={W - M.right} y1={py(0)} y2={py(0)} stroke="#3d5a80" strokeWidth={0.75} />
        ) : null}
        {guide ? (
          <g>
            <line
              x1={M.left}
              x2={W - M.right}
              y1={py(guide.y)}
              y2={py(guide.y)}
              stroke="#e8590c"
              strokeWidth={1.25}
              strokeDasharray="5 3"
            />
            <text
              x={W - M.right - 3}
              y={py(guide.y) - 3}
              textAnchor="end"
              fontSize={9}
              fill="#e8590c"
              className="font-mono"
            >
              {guide.label}
            </text>
          </g>
        ) : null}
        <path d={d} fill="none" stroke="#1d3557" strokeWidth={1.4} strokeLinejoin="round" />
        {clipped.map((x, i) => (
          <path
            key={`c${i}`}
            d={`M${px(x) - 3},${M.top + 1}L${px(x) + 3},${M.top + 1}L${px(x)},${M.top + 6}Z`}
            fill="#e8590c"
          />
        ))}
        <text x={(M.left + W - M.right) / 2} y={H - 4} textAnchor="middle" fontSize={10} className="fill-ink">
          {xLabel}
        </text>
        <text
          x={10}
          y={(M.top + H - M.bottom) / 2}
          textAnchor="middle"
          fontSize={10}
          transform={`rotate(-90 10 ${(M.top + H - M.bottom) / 2})`}
          className="fill-ink"
        >
          {yLabel}
        </text>
      </svg>
      {clipped.length && clipNote ? <p className="text-xs text-ink-soft">▼ {clipNote}</p> : null}
    </figure>
  );
}
