"use client";
// Reads an outline (wheel) or profile (track) from an SVG path, a DXF polyline or CSV points. The
// file is read in the browser and parsed for geometry only (lib/outline-import): SVG markup is never
// rendered or run. Every refusal says why.
import { useId, useState } from "react";
import { importOutline, placeAxleDefault } from "@/lib/outline-import";
import type { Units } from "@/lib/studio/units";

const MAX_BYTES = 2 * 1024 * 1024;
const ACCEPT = ".svg,.dxf,.csv,.txt,image/svg+xml,text/csv,text/plain,application/dxf";

export function OutlineUpload({
  want,
  units,
  onPoints,
}: {
  want: "wheel" | "track";
  units: Units;
  onPoints: (points: [number, number][], axle?: { x: number; y: number }) => void;
}) {
  const id = useId();
  const [message, setMessage] = useState<{ ok: boolean; text: string } | null>(null);
  return (
    <div className="flex flex-col gap-1 text-sm">
      <label htmlFor={id} className="font-medium">
        {want === "wheel" ? "Upload an outline" : "Upload a profile"} (SVG, DXF or CSV)
      </label>
      <input
        id={id}
        type="file"
        accept={ACCEPT}
        data-testid={`upload-${want}`}
        className="text-sm file:mr-3 file:rounded-plate file:border file:border-ink-line file:bg-white/70 file:px-2 file:py-1"
        onChange={async (event) => {
          const file = event.target.files?.[0];
          event.target.value = "";
          if (!file) return;
          if (file.size > MAX_BYTES) {
            setMessage({
              ok: false,
              text: `${file.name} is ${(file.size / 1048576).toFixed(1)} MB; files up to 2 MB are accepted.`,
            });
            return;
          }
          const bytes = new Uint8Array(await file.arrayBuffer());
          const result = importOutline(
            { name: file.name, type: file.type, bytes },
            { want, tolerance: units === "in" ? 0.0005 : 0.01, units },
          );
          if (!result.ok) {
            setMessage({ ok: false, text: result.error });
            return;
          }
          const axle = want === "wheel" ? placeAxleDefault(result.points) : undefined;
          onPoints(result.points, axle);
          const unitNote =
            result.units === "unknown"
              ? ` Units are not stated in the file; read as ${units}.`
              : result.units !== units
                ? ` The file is in ${result.units}; switch units if needed.`
                : "";
          setMessage({
            ok: true,
            text: `Read ${result.points.length} points from ${file.name}.${unitNote} ${result.notes.join(" ")}`.trim(),
          });
        }}
      />
      {message ? (
        <p
          role={message.ok ? "status" : "alert"}
          data-testid="upload-message"
          className={`text-xs ${message.ok ? "text-pass" : "font-medium text-caution-ink"}`}
        >
          {message.text}
        </p>
      ) : null}
    </div>
  );
}
