// One stock sheet drawn to scale with its parts where the nest put them: the picture a fabricator
// checks before cutting. Plain SVG (it prints, and it needs no canvas); y runs up, as in the DXF.
import type { Ring } from "@/lib/geometry/ring";

export interface SheetViewPart {
  key: string;
  label: string;
  outer: Ring;
  holes: Ring[];
  kind: string;
}

const toPoints = (ring: Ring) => ring.map(([x, y]) => `${x.toFixed(2)},${y.toFixed(2)}`).join(" ");

function centroid(ring: Ring): [number, number] {
  let sx = 0,
    sy = 0;
  for (const [x, y] of ring) {
    sx += x;
    sy += y;
  }
  return [sx / ring.length, sy / ring.length];
}

const FILL: Record<string, string> = { track: "#d9c6a3", wheel: "#c9d6c3", partner: "#c3cfd9", splice: "#e3d3c9" };

export function SheetView({
  width,
  height,
  margin,
  parts,
  grain,
  title,
}: {
  width: number;
  height: number;
  margin: number;
  parts: SheetViewPart[];
  grain: "length" | "width" | "none";
  title: string;
}) {
  const pad = Math.max(width, height) * 0.02;
  const font = Math.max(width, height) / 60;
  return (
    <svg
      viewBox={`${-pad} ${-pad} ${width + 2 * pad} ${height + 2 * pad}`}
      className="w-full rounded-plate border border-ink-line bg-white"
      role="img"
      aria-label={title}
      data-testid="sheet-view"
    >
      <g transform={`translate(0 ${height}) scale(1 -1)`}>
        <rect x={0} y={0} width={width} height={height} fill="#f4efe4" stroke="#5b5141" strokeWidth={font / 6} />
        <rect
          x={margin}
          y={margin}
          width={width - 2 * margin}
          height={height - 2 * margin}
          fill="none"
          stroke="#5b5141"
          strokeDasharray={`${font / 2} ${font / 2}`}
          strokeWidth={font / 12}
        />
        {parts.map((p) => (
          <g key={p.key}>
            <path
              d={[p.outer, ...p.holes].map((r) => `M${toPoints(r)}Z`).join(" ")}
              fillRule="evenodd"
              fill={FILL[p.kind] ?? "#ddd"}
              stroke="#2d2a24"
              strokeWidth={font / 10}
            />
          </g>
        ))}
      </g>
      {parts.map((p) => {
        const [cx, cy] = centroid(p.outer);
        return (
          <text
            key={`${p.key}-label`}
            x={cx}
            y={height - cy}
            fontSize={font}
            textAnchor="middle"
            dominantBaseline="middle"
            className="font-mono"
            fill="#2d2a24"
          >
            {p.label}
          </text>
        );
      })}
      {grain !== "none" ? (
        <text x={width - font} y={height - font / 2 - margin / 2} fontSize={font * 0.8} textAnchor="end" fill="#5b5141">
          grain {grain === "length" ? "→" : "↑"}
        </text>
      ) : null}
    </svg>
  );
}
