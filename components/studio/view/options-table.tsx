"use client";

import type { SolvedGeometry } from "@/lib/track";
import { fmt } from "@/lib/studio/view-math";
import { Badge, Panel } from "@/components/ui/panel";
import { Table } from "@/components/ui/table";

export interface OptionsTableProps {
  result?: SolvedGeometry;
  /** The options of this result are still being worked out. */
  pending?: boolean;
  /** The periods per turn or lobes the design uses now. */
  currentValue?: number;
  onPick?: (n: number) => void;
}

/** The closure options the engine lists: each whole number of periods per turn (or lobes) with the size it gives. */
export function OptionsTable({ result, pending, currentValue, onPick }: OptionsTableProps) {
  const options = result?.options ?? [];
  const lobes = result?.mode === "partner-wheel";
  // Track-for-wheel designs have no closure choice to make.
  if (result && pending && result.mode !== "track-for-wheel")
    return (
      <Panel title={lobes ? "Lobes" : "Closure options"}>
        <p className="text-sm text-ink-soft" aria-busy="true">
          Working out the choices…
        </p>
      </Panel>
    );
  if (!result || !options.length) return null;
  const u = result.units;
  const count = (o: (typeof options)[number]) => (lobes ? o.lobes : o.periodsPerTurn) ?? 0;
  const head = [
    lobes ? "Lobes" : "Periods per turn",
    lobes ? `Centre distance (${u})` : `Axle height (${u})`,
    ...(result.mode === "twin-wheels" ? [`Centre distance (${u})`] : []),
    `r max (${u})`,
    "",
  ];
  return (
    <Panel title={lobes ? "Lobes" : "Closure options"}>
      <Table
        head={head}
        caption={
          lobes ? "Lobe choices and the centre distance each gives" : "Periods per turn and the wheel size each gives"
        }
      >
        {options.map((o) => {
          const n = count(o);
          const current = n === currentValue;
          return (
            <tr
              key={n}
              aria-current={current ? "true" : undefined}
              className={current ? "bg-paper-deep" : undefined}
              data-option={n}
            >
              <td className="font-mono">{n}</td>
              <td className="font-mono">{fmt((lobes ? o.centreDistance : o.axleHeight) ?? NaN)}</td>
              {result.mode === "twin-wheels" ? <td className="font-mono">{fmt(o.centreDistance ?? NaN)}</td> : null}
              <td className="font-mono">{fmt(o.rMax)}</td>
              <td className="text-right">
                {current ? (
                  <Badge tone="pass">current</Badge>
                ) : (
                  <button
                    type="button"
                    disabled={!onPick}
                    onClick={() => onPick?.(n)}
                    className="rounded-plate border border-ink-line px-2 py-0.5 text-xs text-ink hover:bg-paper-deep disabled:opacity-50"
                    aria-label={`Use ${n} ${lobes ? (n === 1 ? "lobe" : "lobes") : n === 1 ? "period per turn" : "periods per turn"}`}
                  >
                    Use {n}
                  </button>
                )}
              </td>
            </tr>
          );
        })}
      </Table>
    </Panel>
  );
}
