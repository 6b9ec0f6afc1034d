// The engine and the load check name a bad field by its path in the spec ("wheel.points[3]"), which
// the API and the command line keep; the studio names it as the form does ("Outline, point 4").
const LABELS: Record<string, string> = {
  mode: "Mode",
  units: "Units",
  tolerance: "Chord tolerance",
  periodsPerTurn: "Periods per turn",
  lobes: "Lobes",
  runLength: "Run length",
  period: "Period",
  wheel: "Wheel",
  "wheel.sides": "Sides",
  "wheel.inradius": "Inradius",
  "wheel.circumradius": "Circumradius",
  "wheel.side": "Side",
  "wheel.cornerRadius": "Corner radius",
  "wheel.semiMajor": "Semi-major axis",
  "wheel.semiMinor": "Semi-minor axis",
  "wheel.axle": "Axle at",
  "wheel.radius": "Radius",
  "wheel.axleOffset": "Axle offset from centre",
  "wheel.r": "r(θ)",
  "wheel.points": "Outline",
  track: "Track",
  "track.amplitude": "Amplitude",
  "track.period": "Period",
  "track.scale": "Scale (crest height)",
  "track.radius": "Rolling-circle radius",
  "track.y": "y(x)",
  "track.points": "Profile",
  // The loads panel's fields.
  use: "Use",
  "load.riderMassKg": "Rider",
  "load.dynamicFactor": "Dynamic factor",
  "load.wheels": "Wheels sharing it",
  "load.wheelLoadN": "Wheel load",
  traction: "Traction or braking",
  mu: "Friction μ",
  tiltDeg: "Measured slip angle",
  speedMps: "Design speed",
  "wheel.treadWidthMm": "Tread width",
  "wheel.modulusGpa": "Tread E",
  "wheel.poisson": "Tread's Poisson's ratio",
  "wheel.allowableMpa": "Allowable",
  "track.widthMm": "Track board width",
  "track.depthMm": "Track board depth",
  "track.supportSpanMm": "Support span",
  "track.modulusGpa": "Track material",
  "track.poisson": "Track material",
};

/** The form's name for a field path or a place ("theta = 1.2"), or undefined when the form has no such field. */
export function fieldLabel(where: string | undefined): string | undefined {
  if (!where) return undefined;
  const indexed = /^(.+)\[(\d+)\]$/.exec(where);
  if (indexed && LABELS[indexed[1]]) return `${LABELS[indexed[1]]}, point ${Number(indexed[2]) + 1}`;
  if (LABELS[where]) return LABELS[where];
  const place = /^(theta|x) = (.+)$/.exec(where);
  if (place) return `at ${place[1] === "theta" ? "θ" : "x"} = ${place[2]}`;
  return undefined;
}

/** An engine or load-check message for the studio: the path prefix dropped, the field named as the form names it. */
export function studioMessage(e: { message: string; where?: string }): string {
  const message = e.where && e.message.startsWith(`${e.where}: `) ? e.message.slice(e.where.length + 2) : e.message;
  const label = fieldLabel(e.where);
  return label && !message.toLowerCase().includes(label.toLowerCase()) ? `${message} (${label})` : message;
}
