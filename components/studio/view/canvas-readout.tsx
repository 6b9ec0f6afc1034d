import type { SolvedGeometry } from "@/lib/track";
import type { Pose } from "@/lib/studio/motion";
import { fmt } from "@/lib/studio/view-math";

/** The design's dimensions and the current pose, in the monospace face, laid over the canvas corner. */
export function CanvasReadout({ result, pose, id }: { result: SolvedGeometry; pose: Pose; id: string }) {
  const u = result.units;
  const rows: Array<[string, string]> = [];
  const range = (o: { rMin: number; rMax: number }) => `${fmt(o.rMin)} – ${fmt(o.rMax)} ${u}`;
  if (result.mode === "partner-wheel") {
    rows.push(["centre distance", `${fmt(result.centreDistance ?? NaN)} ${u}`]);
    rows.push(["driver r", range(result.wheel)]);
    if (result.partner) rows.push(["partner r", range(result.partner)]);
    rows.push(["driver turn", `${fmt(pose.wheel.angle, 3)} rad`]);
    if (pose.partner) rows.push(["partner turn", `${fmt(pose.partner.angle, 3)} rad`]);
  } else {
    rows.push(["period", `${fmt(result.period ?? NaN)} ${u}`]);
    rows.push(["depth", `${fmt(result.depth ?? NaN)} ${u}`]);
    rows.push(
      result.mode === "track-for-wheel"
        ? ["axle line", `y = 0, track below`]
        : ["axle height", `${fmt(result.axleHeight ?? NaN)} ${u}`],
    );
    if (result.mode === "twin-wheels") {
      rows.push(["lower axle", `${fmt(result.lowerAxleHeight ?? NaN)} ${u}`]);
      rows.push(["centre distance", `${fmt(result.centreDistance ?? NaN)} ${u}`]);
    }
    rows.push([result.mode === "twin-wheels" ? "upper wheel r" : "wheel r", range(result.wheel)]);
    if (result.mode === "twin-wheels" && result.partner) rows.push(["lower wheel r", range(result.partner)]);
    rows.push(["axle at x", `${fmt(pose.wheel.x)} ${u}`]);
    rows.push(["wheel turn", `${fmt(pose.wheel.angle, 3)} rad`]);
  }
  return (
    <dl
      id={id}
      className="pointer-events-none absolute left-2 top-2 grid grid-cols-[auto_auto] gap-x-3 rounded-plate border border-paper-edge bg-paper/85 px-2 py-1 font-mono text-[11px] leading-4 text-ink"
    >
      {rows.map(([k, v]) => (
        <div key={k} className="contents">
          <dt className="text-ink-soft">{k}</dt>
          <dd>{v}</dd>
        </div>
      ))}
    </dl>
  );
}
