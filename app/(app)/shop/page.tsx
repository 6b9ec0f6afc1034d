import type { Metadata } from "next";
import type { ReactNode } from "react";
import { NoAccess } from "@/components/no-access";
import { MachineForm, MaterialForm, RetireToggle, StockSheetForm } from "@/components/shop-forms";
import { Badge, Panel } from "@/components/ui/panel";
import { Table } from "@/components/ui/table";
import { listShopLibrary } from "@/db/queries/shop";
import { requirePageUser } from "@/lib/server/dal";
import { machineKindLabel } from "@/lib/labels";

export const metadata: Metadata = { title: "Shop library" };

const fmt = (v: number | null) => (v === null ? "—" : String(Number(v.toPrecision(6))));

function SourceCell({ source, kind }: { source: string; kind: string }) {
  return (
    <td className="max-w-xs text-xs text-ink-soft">
      <Badge tone={kind === "common-practice" ? "caution" : "ink"}>
        {kind === "common-practice" ? "common practice" : kind}
      </Badge>{" "}
      {source}
    </td>
  );
}

function Status({ active }: { active: boolean }) {
  return active ? <Badge tone="pass">in use</Badge> : <Badge tone="caution">retired</Badge>;
}

function Edit({ name, children }: { name: string; children: ReactNode }) {
  return (
    <details className="mt-1">
      <summary className="cursor-pointer text-xs text-ink-soft hover:underline">Edit {name}</summary>
      <div className="mt-2 rounded-plate border border-ink-line bg-white/50 p-3">{children}</div>
    </details>
  );
}

export default async function ShopLibraryPage() {
  const user = await requirePageUser();
  if (user.role !== "admin" && user.role !== "fabricator")
    return <NoAccess what="The shop library is kept by the shop's admins and fabricators." />;
  const library = await listShopLibrary();
  return (
    <>
      <h1 className="text-2xl font-semibold tracking-tight">Shop library</h1>
      <p className="max-w-3xl text-sm text-ink-soft">
        The figures cut plans and rolling checks use. Rows marked common practice are trade defaults, not facts: measure
        your own material and tread (friction coefficients depend on the whole system) and edit the row. Retired rows
        stay for the plans that used them.
      </p>
      <Panel title="Materials">
        <Table
          head={[
            "Name",
            "Thickness",
            "Density",
            "Modulus, ν",
            "Strength, allowable contact",
            "Friction μ (static / kinetic)",
            "Source",
            "Status",
          ]}
          caption="Materials"
        >
          {library.materials.map((m) => (
            <tr key={m.id} data-testid={`material-${m.name}`} className={m.active ? "" : "opacity-60"}>
              <td>
                {m.name}
                {m.kind === "tread" ? <div className="text-xs text-ink-soft">tread</div> : null}
                <Edit name={m.name}>
                  <MaterialForm row={m} />
                </Edit>
              </td>
              <td className="font-mono">{fmt(m.thicknessMm)} mm</td>
              <td className="font-mono">{fmt(m.densityKgM3)} kg/m³</td>
              <td className="font-mono">
                {fmt(m.modulusGpa)} GPa, ν {fmt(m.poisson)}
              </td>
              <td className="font-mono">
                {fmt(m.strengthMpa)} MPa, {m.allowableMpa === null ? "—" : `${fmt(m.allowableMpa)} MPa`}
              </td>
              <td className="font-mono">
                {fmt(m.frictionStatic)} / {fmt(m.frictionKinetic)}
                <div className="font-sans text-xs text-ink-soft">{m.frictionPair}</div>
              </td>
              <SourceCell source={m.source} kind={m.sourceKind} />
              <td>
                <Status active={m.active} />
                <RetireToggle table="materials" id={m.id} active={m.active} name={m.name} />
              </td>
            </tr>
          ))}
        </Table>
        <h3 className="mt-4 mb-2 text-sm font-semibold">Add a material</h3>
        <MaterialForm />
      </Panel>
      <Panel title="Stock sheets">
        <Table head={["Name", "Material", "Size", "Grain", "Source", "Status"]} caption="Stock sheets">
          {library.stockSheets.map((s) => (
            <tr key={s.id} data-testid={`sheet-${s.name}`} className={s.active ? "" : "opacity-60"}>
              <td>
                {s.name}
                <Edit name={s.name}>
                  <StockSheetForm row={s} materials={library.materials} />
                </Edit>
              </td>
              <td>{s.materialName}</td>
              <td className="font-mono">
                {fmt(s.lengthMm)} × {fmt(s.widthMm)} mm
              </td>
              <td>{s.grain === "none" ? "none" : s.grain === "length" ? "along the length" : "across the width"}</td>
              <SourceCell source={s.source} kind={s.sourceKind} />
              <td>
                <Status active={s.active} />
                <RetireToggle table="stockSheets" id={s.id} active={s.active} name={s.name} />
              </td>
            </tr>
          ))}
        </Table>
        <h3 className="mt-4 mb-2 text-sm font-semibold">Add a stock sheet</h3>
        <StockSheetForm materials={library.materials.filter((m) => m.active)} />
      </Panel>
      <Panel title="Machines">
        <Table head={["Name", "Kind", "Kerf", "Bed", "Smallest inside radius", "Source", "Status"]} caption="Machines">
          {library.machines.map((k) => (
            <tr key={k.id} data-testid={`machine-${k.name}`} className={k.active ? "" : "opacity-60"}>
              <td>
                {k.name}
                <Edit name={k.name}>
                  <MachineForm row={k} />
                </Edit>
              </td>
              <td>{machineKindLabel(k.kind)}</td>
              <td className="font-mono">{fmt(k.kerfMm)} mm</td>
              <td className="font-mono">
                {fmt(k.bedLengthMm)} × {fmt(k.bedWidthMm)} mm
              </td>
              <td className="font-mono">{fmt(k.minInsideRadiusMm)} mm</td>
              <SourceCell source={k.source} kind={k.sourceKind} />
              <td>
                <Status active={k.active} />
                <RetireToggle table="machines" id={k.id} active={k.active} name={k.name} />
              </td>
            </tr>
          ))}
        </Table>
        <h3 className="mt-4 mb-2 text-sm font-semibold">Add a machine</h3>
        <MachineForm />
      </Panel>
    </>
  );
}
