// Loads an engineer designing the supports, the frame and the guards will want, shown as inputs and
// not as a structural design (each with where it comes from, as docs/safety.md §5 reads it).
import { lbfToN, plfToNPerM, psfToKpa } from "./units";

export interface EngineerLoad {
  what: string;
  value: string;
  source: string;
}

export function engineerLoads(o: { riderMassKg: number; dynamicFactor: number; use: string }): EngineerLoad[] {
  const out: EngineerLoad[] = [];
  if (o.use === "ride-on")
    out.push(
      {
        what: "Design rider",
        value: `${o.riderMassKg} kg × dynamic factor ${o.dynamicFactor}`,
        source:
          "110 kg: the upper user mass of most furniture seating standards (BSI); factor 2: a load applied suddenly doubles its effect (Timoshenko and Gere, elementary impact) — suggestions, not code values",
      },
      { what: "Misuse: two riders", value: `${2 * o.riderMassKg} kg`, source: "common practice for ride-on exhibits" },
    );
  out.push(
    {
      what: "Crowd on platforms and floors around the piece",
      value: `${psfToKpa(100).toFixed(2)} kPa (100 psf)`,
      source:
        "ASCE 7-16 Table 4.3-1, assembly areas without fixed seats; EN 1991-1-1 category C3/C5 as the National Annex sets",
    },
    {
      what: "Guards and handrails: line load",
      value: `${(plfToNPerM(50) / 1000).toFixed(2)} kN/m (50 plf), any direction at the top`,
      source: "IBC 1607.8.1 (2018); ASCE 7-16 §4.5.1",
    },
    {
      what: "Guards and handrails: point load",
      value: `${(lbfToN(200) / 1000).toFixed(2)} kN (200 lb), any direction at any point along the top`,
      source: "ASCE 7-16 §4.5.1",
    },
    {
      what: "Guard infill",
      value: `${(lbfToN(50) / 1000).toFixed(2)} kN (50 lb) on 305 × 305 mm`,
      source: "ASCE 7-16 §4.5.1.2",
    },
  );
  return out;
}
