// The sheet's numbered sections, in the installer's order of work (the order the issue gives).
export const SECTION = {
  cover: { number: "1", title: "Cover" },
  plan: { number: "2", title: "Layout plan" },
  parts: { number: "3", title: "Parts" },
  assembly: { number: "4", title: "Order of assembly, joints, fasteners and tools" },
  levels: { number: "5", title: "Level and position" },
  signOff: { number: "6", title: "Installer's sign-off" },
} as const;

export const SECTION_COUNT = Object.keys(SECTION).length;
