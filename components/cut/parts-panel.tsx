// The parts the settings give, with their sizes and the cut code's warnings.
import { Panel } from "@/components/ui/panel";
import { Table } from "@/components/ui/table";
import { bbox } from "./nest-figures";
import type { PartsPreview } from "./cut-worker";

export function PartsPanel({ preview }: { preview: PartsPreview }) {
  const { parts, warnings } = preview.plan;
  return (
    <Panel title={`Parts (${parts.reduce((n, p) => n + p.quantity, 0)} to cut)`}>
      <Table head={["Part", "What", "Size (mm)", "Quantity"]} caption="Parts">
        {parts.map((p) => {
          const b = bbox(p.region.outer);
          return (
            <tr key={p.id} data-testid={`part-${p.id}`}>
              <td className="font-mono">{p.id}</td>
              <td>{p.name}</td>
              <td className="font-mono">
                {b.length.toFixed(1)} × {b.width.toFixed(1)}
              </td>
              <td className="font-mono">{p.quantity}</td>
            </tr>
          );
        })}
      </Table>
      {warnings.length ? (
        <ul className="mt-3 flex flex-col gap-1" aria-label="Warnings">
          {warnings.map((w, i) => (
            <li
              key={i}
              className="rounded-plate border border-caution bg-caution-soft px-2 py-1 text-sm text-caution-ink"
              data-testid="cut-warning"
            >
              {w.partId ? <span className="font-mono">{w.partId}: </span> : null}
              {w.message}
            </li>
          ))}
        </ul>
      ) : null}
    </Panel>
  );
}
