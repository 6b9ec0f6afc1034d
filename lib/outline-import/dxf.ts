// An ASCII DXF reader for outlines (AutoCAD DXF Reference, "DXF Format": group codes 0 entity type,
// 10/20 x/y, 11/21 second point, 40 radius, 42 bulge, 50/51 start/end angle in degrees, 70 flags,
// 210–230 extrusion direction). The steps: the pairs and sections are checked and located
// (dxf-groups.ts), dxf-parser builds the entities that carry geometry (dxf-entities.ts), and LINE
// and ARC pieces are joined into chains (dxf-chain.ts). $INSUNITS from the HEADER gives the units
// (0 unitless, 1 inches, 2 feet, 4 millimetres, 5 centimetres, 6 metres, … per the $INSUNITS table
// of the DXF reference). Other entities, and the BLOCKS section (INSERT is not followed), are noted
// and ignored.

import { PointBudget, type ReadResult, type Units } from "./common";
import { chain } from "./dxf-chain";
import { readEntities, type EntityContext } from "./dxf-entities";
import { pairsOf, sectionsOf, type Entity } from "./dxf-groups";

// $INSUNITS code → output unit and factor (DXF reference, HEADER section, $INSUNITS).
const INSUNITS: Record<number, { units: "mm" | "in"; scale: number; name: string }> = {
  1: { units: "in", scale: 1, name: "inches" },
  2: { units: "in", scale: 12, name: "feet" },
  3: { units: "in", scale: 63360, name: "miles" },
  4: { units: "mm", scale: 1, name: "millimetres" },
  5: { units: "mm", scale: 10, name: "centimetres" },
  6: { units: "mm", scale: 1000, name: "metres" },
  7: { units: "mm", scale: 1e6, name: "kilometres" },
  8: { units: "in", scale: 1e-6, name: "microinches" },
  9: { units: "in", scale: 1e-3, name: "mils" },
  10: { units: "in", scale: 36, name: "yards" },
  11: { units: "mm", scale: 1e-7, name: "ångströms" },
  12: { units: "mm", scale: 1e-6, name: "nanometres" },
  13: { units: "mm", scale: 1e-3, name: "microns" },
  14: { units: "mm", scale: 100, name: "decimetres" },
  15: { units: "mm", scale: 1e4, name: "decametres" },
  16: { units: "mm", scale: 1e5, name: "hectometres" },
  21: { units: "in", scale: 1200 / 3937 / 0.0254, name: "US survey feet" },
};

function unitsOf(insunits: number | null): { units: Units; scale: number; note: string } {
  const u = insunits === null ? undefined : INSUNITS[insunits];
  if (u)
    return {
      units: u.units,
      scale: u.scale,
      note:
        u.scale === 1
          ? `units ${u.units} ($INSUNITS ${insunits})`
          : `drawing units ${u.name} ($INSUNITS ${insunits}) converted to ${u.units}; the tolerance is taken in ${u.units}`,
    };
  const note =
    insunits === null
      ? "units unknown: the DXF header has no $INSUNITS"
      : insunits === 0
        ? "units unknown: $INSUNITS is 0 (unitless)"
        : `units unknown: $INSUNITS ${insunits} is not a length unit the importer converts`;
  return { units: "unknown", scale: 1, note };
}

export function readDxf(text: string, tol: number, budget: PointBudget): ReadResult {
  const sections = sectionsOf(pairsOf(text));
  const notes: string[] = [];
  if (!sections.sawEof) notes.push("the DXF has no EOF marker after its last section");
  const { units, scale, note } = unitsOf(sections.insunits);
  notes.push(note);
  if (sections.blocksWithGeometry)
    notes.push(`ignored geometry inside block definitions (BLOCKS section); INSERT references are not followed`);

  const ignored = new Map<string, { count: number; line: number }>();
  const c: EntityContext = {
    tol,
    budget,
    scale,
    subpaths: [],
    pieces: [],
    notes,
    ignore: (e: Entity, why = "") => {
      const s = ignored.get(e.type + why);
      if (s) s.count++;
      else ignored.set(e.type + why, { count: 1, line: e.line });
    },
  };
  readEntities(sections.entities, c);
  for (const [key, s] of ignored)
    notes.push(
      `ignored ${s.count} ${key} ${s.count === 1 ? "entity" : "entities"} (first on DXF line ${s.line}); only LWPOLYLINE, POLYLINE, LINE, ARC and CIRCLE are read`,
    );
  if (c.pieces.length) c.subpaths.push(...chain(c.pieces, tol, notes));
  return { subpaths: c.subpaths, units, notes };
}
