"use client";
// The studio's load-path panel: how the piece is used and loaded, the tread and track from the shop
// library, the track board and its supports, the gaps people can reach — and, live from the worker,
// the cautions with their figures and sources, each linked to its place on the drawing, and the
// helper's re-checked fixes, one click each into the draft.
import { useState } from "react";
import { SIGNAL_TONE } from "@/components/review/caution-list";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import { Badge, Panel } from "@/components/ui/panel";
import type { Caution, LoadsReport, Suggestion } from "@/lib/loads";
import type { LibraryMaterial } from "@/lib/loads/settings";
import { USE_LABELS, USES, type LoadsSettings, type Use } from "@/lib/validation/loads";
import { NumberInput, SelectInput, TextInput } from "@/components/ui/inputs";

const n = (v: number | null | undefined, d = 2) =>
  v === null || v === undefined || !Number.isFinite(v) ? "—" : Number(v.toFixed(d)).toString();

export interface LoadsPanelProps {
  settings: LoadsSettings;
  library: LibraryMaterial[];
  readOnly: boolean;
  loads?: { report: LoadsReport; suggestions: Suggestion[] } | null;
  error?: string;
  onChange: (next: LoadsSettings) => void;
  onApply: (s: Suggestion) => void;
  showAt: (along: number, label: string) => void;
}

function wheelFrom(m: LibraryMaterial, s: LoadsSettings): LoadsSettings["wheel"] {
  return {
    ...s.wheel,
    material: m.name,
    modulusGpa: m.modulusGpa,
    poisson: m.poisson,
    allowableMpa: m.allowableMpa ?? undefined,
    densityKgM3: m.kind === "sheet" ? m.densityKgM3 : s.wheel.densityKgM3,
  };
}

function trackFrom(m: LibraryMaterial, s: LoadsSettings): LoadsSettings["track"] {
  return {
    ...s.track,
    material: m.name,
    modulusGpa: m.modulusGpa,
    poisson: m.poisson,
    allowableMpa: m.allowableMpa ?? undefined,
    densityKgM3: m.densityKgM3,
    widthMm: m.thicknessMm,
  };
}

/** μ for a tread on a track: a tread row's own figure (it names the surface), else the track row's. */
function muFor(wheel: LibraryMaterial | undefined, track: LibraryMaterial | undefined): number | undefined {
  return wheel?.kind === "tread" ? wheel.frictionStatic : track?.frictionStatic;
}

function Inputs({
  settings: s,
  library,
  readOnly,
  onChange,
}: Pick<LoadsPanelProps, "settings" | "library" | "readOnly" | "onChange">) {
  const [gapName, setGapName] = useState("");
  const sheets = library.filter((m) => m.kind === "sheet");
  const byName = (name?: string) => library.find((m) => m.name === name);
  const set = (patch: Partial<LoadsSettings>) => onChange({ ...s, ...patch });
  const wheelOptions = [...library.filter((m) => m.kind === "tread"), ...sheets].map((m) => ({
    value: m.name,
    label: m.kind === "tread" ? m.name : `${m.name} (bare edge)`,
  }));
  if (s.wheel.material && !byName(s.wheel.material))
    wheelOptions.unshift({ value: s.wheel.material, label: `${s.wheel.material} (as saved)` });
  const trackOptions = sheets.map((m) => ({ value: m.name, label: m.name }));
  if (s.track.material && !byName(s.track.material))
    trackOptions.unshift({ value: s.track.material, label: `${s.track.material} (as saved)` });
  const gaps = Object.entries(s.clearancesMm ?? {});
  return (
    <fieldset disabled={readOnly} className="flex flex-col gap-2" data-testid="loads-inputs">
      <SelectInput<Use>
        label="Use"
        value={s.use}
        options={USES.map((u) => ({ value: u, label: USE_LABELS[u] }))}
        onChange={(use) => set({ use })}
        testId="loads-use"
      />
      {s.use === "ride-on" ? (
        <div className="grid grid-cols-3 gap-2">
          <NumberInput
            label="Rider"
            unit="kg"
            value={s.load.riderMassKg ?? 110}
            min={1}
            max={1000}
            onChange={(v) => set({ load: { ...s.load, riderMassKg: v } })}
          />
          <NumberInput
            label="Dynamic factor"
            value={s.load.dynamicFactor ?? 2}
            min={1}
            max={10}
            onChange={(v) => set({ load: { ...s.load, dynamicFactor: v } })}
          />
          <NumberInput
            label="Wheels sharing it"
            value={s.load.wheels ?? 2}
            min={1}
            max={64}
            integer
            onChange={(v) => set({ load: { ...s.load, wheels: v } })}
          />
        </div>
      ) : null}
      <NumberInput
        label="Wheel load"
        unit="N"
        value={s.load.wheelLoadN}
        min={0.001}
        max={1e6}
        optional
        hint={
          s.use === "ride-on"
            ? "Leave empty to work it out from the rider."
            : "Leave empty for a person leaning on it (0.89 kN)."
        }
        onChange={(v) => set({ load: { ...s.load, wheelLoadN: v } })}
      />
      <div className="grid grid-cols-2 gap-2">
        <NumberInput
          label="Traction or braking, share of the load"
          value={s.traction}
          min={0}
          max={1}
          optional
          hint={`Empty: ${s.use === "ride-on" ? 0.2 : 0.1}`}
          onChange={(v) => set({ traction: v })}
        />
        <NumberInput
          label="Design speed"
          unit="m/s"
          value={s.speedMps}
          min={0.01}
          max={20}
          optional
          onChange={(v) => set({ speedMps: v })}
        />
      </div>
      <SelectInput
        label="Wheel tread"
        value={s.wheel.material ?? ""}
        options={[{ value: "", label: "As typed below" }, ...wheelOptions]}
        testId="loads-tread"
        onChange={(name) => {
          const m = byName(name);
          if (!m) return;
          set({ wheel: wheelFrom(m, s), mu: muFor(m, byName(s.track.material)) ?? s.mu, tiltDeg: undefined });
        }}
      />
      <SelectInput
        label="Track material"
        value={s.track.material ?? ""}
        options={[{ value: "", label: "As typed below" }, ...trackOptions]}
        testId="loads-track-material"
        onChange={(name) => {
          const m = byName(name);
          if (!m) return;
          set({ track: trackFrom(m, s), mu: muFor(byName(s.wheel.material), m) ?? s.mu, tiltDeg: undefined });
        }}
      />
      <div className="grid grid-cols-2 gap-2">
        <NumberInput
          label="Friction μ, tread on track"
          value={s.mu}
          min={0.001}
          max={5}
          optional
          hint="From the library, or measured."
          onChange={(v) => set({ mu: v })}
        />
        <NumberInput
          label="Or a measured slip angle"
          unit="°"
          value={s.tiltDeg}
          min={0.1}
          max={89.9}
          optional
          hint="Tilt test: μ = tan θ."
          onChange={(v) => set({ tiltDeg: v })}
        />
      </div>
      <div className="grid grid-cols-3 gap-2">
        <NumberInput
          label="Tread width"
          unit="mm"
          value={s.wheel.treadWidthMm}
          min={0.1}
          max={10000}
          onChange={(v) => v && set({ wheel: { ...s.wheel, treadWidthMm: v } })}
        />
        <NumberInput
          label="Tread E"
          unit="GPa"
          value={s.wheel.modulusGpa}
          min={0.0001}
          max={1000}
          onChange={(v) => v && set({ wheel: { ...s.wheel, modulusGpa: v, material: undefined } })}
        />
        <NumberInput
          label="Allowable"
          unit="MPa"
          value={s.wheel.allowableMpa}
          min={0.001}
          max={10000}
          optional
          onChange={(v) => set({ wheel: { ...s.wheel, allowableMpa: v } })}
        />
      </div>
      <p className="text-xs font-semibold uppercase tracking-wider text-ink-soft">Track board between supports</p>
      <div className="grid grid-cols-3 gap-2">
        <NumberInput
          label="Width"
          unit="mm"
          value={s.track.widthMm}
          min={0.1}
          max={10000}
          onChange={(v) => v && set({ track: { ...s.track, widthMm: v } })}
        />
        <NumberInput
          label="Depth"
          unit="mm"
          value={s.track.depthMm}
          min={0.1}
          max={10000}
          onChange={(v) => v && set({ track: { ...s.track, depthMm: v } })}
        />
        <NumberInput
          label="Support span"
          unit="mm"
          value={s.track.supportSpanMm}
          min={1}
          max={100000}
          onChange={(v) => v && set({ track: { ...s.track, supportSpanMm: v } })}
        />
      </div>
      <p className="text-xs font-semibold uppercase tracking-wider text-ink-soft">
        Gaps people can reach that open and close
      </p>
      {gaps.map(([name, mm]) => (
        <div key={name} className="flex items-end gap-2">
          <div className="flex-1">
            <NumberInput
              label={name}
              unit="mm"
              value={mm}
              min={0}
              max={10000}
              onChange={(v) => v !== undefined && set({ clearancesMm: { ...s.clearancesMm, [name]: v } })}
            />
          </div>
          <Button
            type="button"
            variant="quiet"
            className="px-2 py-1 text-xs"
            aria-label={`Remove the ${name} gap`}
            onClick={() => set({ clearancesMm: Object.fromEntries(gaps.filter(([k]) => k !== name)) })}
          >
            Remove
          </Button>
        </div>
      ))}
      <div className="flex items-end gap-2">
        <div className="flex-1">
          <TextInput label="New gap, e.g. wheel to frame" maxLength={60} value={gapName} onChange={setGapName} />
        </div>
        <Button
          type="button"
          variant="quiet"
          className="px-2 py-1 text-xs"
          disabled={!gapName.trim() || gaps.some(([k]) => k === gapName.trim())}
          onClick={() => {
            set({ clearancesMm: { ...s.clearancesMm, [gapName.trim()]: 10 } });
            setGapName("");
          }}
        >
          Add gap
        </Button>
      </div>
    </fieldset>
  );
}

function Figures({ r }: { r: LoadsReport }) {
  const rows: Array<[string, string]> = [
    ["Wheel load", `${n(r.wheelLoadN, 0)} N`],
    ["Grip needed (μ)", `${n(r.grip.needed)} against ${n(r.grip.available)} available (asks ${r.grip.marginAsked}×)`],
    [
      "Contact",
      r.contact.radiusMm === 0
        ? "a sharp corner: no bound"
        : `peak pressure ${n(r.contact.pMaxMpa)} MPa over ${n(2 * r.contact.halfWidthMm, 3)} mm at radius ${n(r.contact.radiusMm, 1)} mm`,
    ],
    [
      "Track sag",
      `${n(r.deflection.pointLoadMm + r.deflection.selfWeightMm, 3)} mm against ${n(r.deflection.limitMm, 3)} mm; longest span ${n(r.deflection.maxSpanMm, 0)} mm`,
    ],
  ];
  return (
    <dl className="grid grid-cols-[auto_1fr] gap-x-3 gap-y-1 text-sm" data-testid="loads-figures">
      {rows.map(([k, v]) => (
        <div key={k} className="contents">
          <dt className="text-ink-soft">{k}</dt>
          <dd className="font-mono text-xs leading-5">{v}</dd>
        </div>
      ))}
    </dl>
  );
}

function CautionItem({ c, showAt }: { c: Caution; showAt: LoadsPanelProps["showAt"] }) {
  return (
    <li className="flex flex-col gap-1 text-sm" data-testid="loads-caution" data-signal={c.signal} data-check={c.check}>
      <div className="flex gap-2">
        <span
          className={`h-fit shrink-0 rounded-plate border px-1.5 py-0.5 font-mono text-[11px] font-semibold tracking-wider ${SIGNAL_TONE[c.signal]}`}
        >
          {c.signal}
        </span>
        <span>
          {c.hazard} {c.consequence} <strong className="font-medium">{c.avoid}</strong>
        </span>
      </div>
      <div className="ml-1 flex flex-wrap items-center gap-2 text-xs text-ink-soft">
        {c.figure ? <span className="font-mono">{c.figure}</span> : null}
        {c.limit ? <span>limit: {c.limit}</span> : null}
        {c.at !== undefined ? (
          <Button
            type="button"
            variant="quiet"
            className="px-1.5 py-0 text-xs"
            onClick={() => showAt(c.at!, c.check)}
            aria-label={`Show where: ${c.hazard}`}
          >
            show
          </Button>
        ) : null}
      </div>
      <p className="ml-1 text-xs text-ink-soft">Source: {c.source}</p>
    </li>
  );
}

export function LoadsPanel(props: LoadsPanelProps) {
  const { loads, error, readOnly } = props;
  const serious = loads?.report.cautions.filter((c) => c.signal === "DANGER" || c.signal === "WARNING").length ?? 0;
  return (
    <Panel
      title="Loads and cautions"
      actions={
        loads ? (
          <Badge tone={serious ? "caution" : "pass"}>
            {serious ? `${serious} warning${serious === 1 ? "" : "s"}` : "no warnings"}
          </Badge>
        ) : null
      }
    >
      <div className="flex flex-col gap-3" data-testid="loads-panel">
        <details open={!readOnly}>
          <summary className="cursor-pointer text-sm font-medium">How it is used and built</summary>
          <div className="mt-2">
            <Inputs {...props} />
          </div>
        </details>
        {error ? <Notice tone="problem">The load check stopped: {error}</Notice> : null}
        {!loads && !error ? (
          <p className="text-sm text-ink-soft" aria-busy="true" data-testid="loads-pending">
            Checking the loads…
          </p>
        ) : null}
        {loads ? (
          <>
            <Figures r={loads.report} />
            <ul className="flex flex-col gap-3" aria-label="Load-path cautions" data-testid="loads-cautions">
              {loads.report.cautions.map((c, i) => (
                <CautionItem key={`${c.check}-${c.name ?? ""}-${i}`} c={c} showAt={props.showAt} />
              ))}
            </ul>
            {loads.suggestions.length ? (
              <div
                className="flex flex-col gap-2 rounded-plate border border-ink-line p-2"
                data-testid="loads-suggestions"
              >
                <p className="text-xs font-semibold uppercase tracking-wider text-ink-soft">
                  Changes that clear a caution (each checked again)
                </p>
                {loads.suggestions.map((s, i) => (
                  <div key={i} className="flex items-center justify-between gap-2 text-sm">
                    <span>{s.change}</span>
                    {!readOnly ? (
                      <Button
                        type="button"
                        variant="quiet"
                        className="shrink-0 px-2 py-0.5 text-xs"
                        onClick={() => props.onApply(s)}
                        aria-label={`Use this: ${s.change}`}
                      >
                        Use this
                      </Button>
                    ) : null}
                  </div>
                ))}
              </div>
            ) : null}
            <details>
              <summary className="cursor-pointer text-sm font-medium">
                Loads for the engineer (inputs, not a structural design)
              </summary>
              <ul className="mt-1 flex flex-col gap-1 text-xs" data-testid="engineer-loads">
                {loads.report.engineerLoads.map((l) => (
                  <li key={l.what}>
                    <span className="font-medium">{l.what}:</span> <span className="font-mono">{l.value}</span>{" "}
                    <span className="text-ink-soft">({l.source})</span>
                  </li>
                ))}
              </ul>
            </details>
            <p className="text-xs text-ink-soft" data-testid="loads-disclaimer">
              {loads.report.disclaimer}
            </p>
          </>
        ) : null}
      </div>
    </Panel>
  );
}
