"use client";

import type { SolveResult } from "@/lib/track";
import { frictionLocation, interferenceLocation, type Location } from "@/lib/studio/motion";
import type { Pt } from "@/lib/studio/view-math";
import { Badge, Panel } from "@/components/ui/panel";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import { checkFigures, type FigureState } from "./check-figures";

export interface CheckPanelProps {
  /** The solved design with its rolling check; undefined while solving or checking. */
  result?: SolveResult;
  /** The geometry is drawn and its rolling check is still running. */
  checking?: boolean;
  /** The rolling check stopped on an error (the geometry is still drawn). */
  error?: string;
  /** Called by a "show" button: the cycle position to move to and the spot to mark there. */
  onPointAt?: (position: number, spot: Pt) => void;
}

const BADGE: Record<FigureState, { tone: "pass" | "caution" | "ink"; word: string }> = {
  pass: { tone: "pass", word: "pass" },
  warn: { tone: "caution", word: "warn" },
  info: { tone: "ink", word: "info" },
};

function locationFor(r: SolveResult, what: "interference" | "friction"): Location | null {
  return what === "interference" ? interferenceLocation(r) : frictionLocation(r);
}

export function CheckPanel({ result, checking, error, onPointAt }: CheckPanelProps) {
  if (error)
    return (
      <Panel title="Rolling check">
        <Notice tone="problem">The rolling check stopped: {error}</Notice>
      </Panel>
    );
  if (!result)
    return (
      <Panel title="Rolling check">
        <p className="text-sm text-ink-soft" aria-busy="true" data-testid="check-pending">
          {checking ? "Checking…" : "Solving…"}
        </p>
      </Panel>
    );
  const figures = checkFigures(result);
  const show = (what: "interference" | "friction", label: string) => {
    const loc = onPointAt ? locationFor(result, what) : null;
    if (!loc) return null;
    return (
      <Button
        type="button"
        variant={what === "interference" ? "caution" : "quiet"}
        className="px-2 py-0.5 text-xs"
        onClick={() => onPointAt?.(loc.position, loc.point)}
        aria-label={`Show ${label} on the canvas`}
      >
        show
      </Button>
    );
  };
  const warns = figures.filter((f) => f.state === "warn").length;
  return (
    <Panel
      title="Rolling check"
      actions={<Badge tone={warns ? "caution" : "pass"}>{warns ? `${warns} to look at` : "all pass"}</Badge>}
    >
      <dl className="flex flex-col divide-y divide-ink-line text-sm" data-testid="check-figures">
        {figures.map((f) => (
          <div
            key={f.key}
            className="flex flex-wrap items-baseline gap-x-3 gap-y-1 py-1.5"
            data-check={f.key}
            data-state={f.state}
          >
            <dt className="min-w-0 flex-1">{f.label}</dt>
            <dd className="font-mono text-ink">{f.value}</dd>
            <dd>
              <Badge tone={BADGE[f.state].tone}>{BADGE[f.state].word}</Badge>
            </dd>
            {f.locate && f.state === "warn" ? <dd>{show(f.locate, f.label.toLowerCase())}</dd> : null}
            {f.note ? (
              <dd className={`basis-full text-xs ${f.state === "warn" ? "text-caution-ink" : "text-ink-soft"}`}>
                {f.note}
              </dd>
            ) : null}
          </div>
        ))}
      </dl>
      {result.warnings.length ? (
        <div className="mt-3 border-t border-paper-edge pt-3">
          <h3 className="mb-1.5 text-xs font-semibold uppercase tracking-wider text-ink-soft">Warnings</h3>
          <ul className="flex flex-col gap-2 text-sm" aria-label="Warnings">
            {result.warnings.map((w) => {
              const what = w.code === "interference" ? "interference" : w.code === "friction" ? "friction" : null;
              return (
                <li key={w.code + w.message} className="flex items-start gap-2" data-warning={w.code}>
                  <span aria-hidden className="mt-1.5 inline-block h-2 w-2 shrink-0 rounded-full bg-caution" />
                  <span className="flex-1">{w.message}</span>
                  {what ? show(what, what === "interference" ? "where it cuts in" : "the steepest contact") : null}
                </li>
              );
            })}
          </ul>
        </div>
      ) : (
        <p className="mt-3 border-t border-paper-edge pt-3 text-sm text-pass">No warnings.</p>
      )}
    </Panel>
  );
}
