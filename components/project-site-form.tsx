"use client";
// The project's site and stock: the run length on site, the track lines, the stock sheet and the
// machine a new cut plan starts from. The form is for an admin or the project's fabricator; other
// members see the same figures read-only (ProjectSiteFacts). Every field may be left blank: not set.
import { useActionState } from "react";
import type { ProjectSite } from "@/db/queries/projects";
import { setProjectSiteAction } from "@/lib/actions/projects";
import { RUN_LENGTH_MAX_MM, RUN_LENGTH_MIN_MM, TRACK_LINES_MAX } from "@/lib/validation/limits";
import { Button } from "./ui/button";
import { SelectField, TextField } from "./ui/field";
import { FormMessage } from "./ui/notice";

type Row = { id: number; name: string };

/** 6000 → "6000 mm (6.0 m)". */
function runText(mm: number): string {
  const m = Number((mm / 1000).toFixed(3));
  return `${mm} mm (${Number.isInteger(m) ? m.toFixed(1) : m} m)`;
}
const rowText = (row: { name: string; active: boolean } | null) =>
  row ? `${row.name}${row.active ? "" : " (no longer in the shop library)"}` : "not set";

/** A library row chosen before and since retired is not offered again; the hint says so. */
function retiredHint(row: { name: string; active: boolean } | null, what: string) {
  return row && !row.active ? `${row.name} is no longer in the shop library: choose another ${what}.` : undefined;
}

export function ProjectSiteForm({
  projectId,
  site,
  sheets,
  machines,
}: {
  projectId: number;
  site: ProjectSite;
  sheets: Row[];
  machines: Row[];
}) {
  const [state, action, pending] = useActionState(setProjectSiteAction, {});
  const v = state.values ?? {};
  const f = state.fields;
  const current = (row: { id: number; active: boolean } | null) => (row?.active ? String(row.id) : "");
  const options = (rows: Row[]) => [
    { value: "", label: "Not set" },
    ...rows.map((r) => ({ value: String(r.id), label: r.name })),
  ];
  return (
    <form
      action={action}
      className="grid gap-3 sm:grid-cols-2 sm:items-start"
      aria-label="Site and stock"
      data-testid="project-site-form"
      noValidate
    >
      <input type="hidden" name="projectId" value={projectId} />
      <p className="text-sm text-ink-soft sm:col-span-2">
        A new cut plan of any design in this project starts from these. Leave a field blank if it is not known yet.
      </p>
      <TextField
        id="site-runLength"
        label="Run length on site (mm)"
        name="siteRunLengthMm"
        inputMode="decimal"
        defaultValue={v.siteRunLengthMm ?? (site.runLengthMm === null ? "" : String(site.runLengthMm))}
        errors={f?.siteRunLengthMm}
        hint={`From ${RUN_LENGTH_MIN_MM} mm to ${RUN_LENGTH_MAX_MM / 1000} m.`}
      />
      <TextField
        id="site-trackLines"
        label="Track lines"
        name="trackLines"
        inputMode="numeric"
        defaultValue={v.trackLines ?? (site.trackLines === null ? "" : String(site.trackLines))}
        errors={f?.trackLines}
        hint={`Parallel tracks of the run, 1 to ${TRACK_LINES_MAX} (a trike has 2).`}
      />
      <SelectField
        id="site-stockSheet"
        label="Stock sheet"
        name="stockSheetId"
        defaultValue={v.stockSheetId ?? current(site.stockSheet)}
        errors={f?.stockSheetId}
        hint={retiredHint(site.stockSheet, "sheet") ?? "The plan's material is the sheet's."}
        options={options(sheets)}
      />
      <SelectField
        id="site-machine"
        label="Machine"
        name="machineId"
        defaultValue={v.machineId ?? current(site.machine)}
        errors={f?.machineId}
        hint={retiredHint(site.machine, "machine")}
        options={options(machines)}
      />
      <div>
        <Button type="submit" disabled={pending}>
          {pending ? "Saving…" : "Save site and stock"}
        </Button>
      </div>
      <div className="sm:col-span-2">
        <FormMessage state={state} />
      </div>
    </form>
  );
}

/** The same figures, read-only, for the project's other members. */
export function ProjectSiteFacts({ site }: { site: ProjectSite }) {
  return (
    <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-1 text-sm" data-testid="project-site">
      <dt className="text-ink-soft">Run length on site</dt>
      <dd className="font-mono text-xs">{site.runLengthMm === null ? "not set" : runText(site.runLengthMm)}</dd>
      <dt className="text-ink-soft">Track lines</dt>
      <dd className="font-mono text-xs">{site.trackLines ?? "not set"}</dd>
      <dt className="text-ink-soft">Stock sheet</dt>
      <dd>{rowText(site.stockSheet)}</dd>
      <dt className="text-ink-soft">Machine</dt>
      <dd>{rowText(site.machine)}</dd>
    </dl>
  );
}
