// The sheet's look on paper: the drafting-table palette of tailwind.config.ts (ink blue for
// everything drawn and written, warm paper only as light fills, the one safety orange kept for
// cautions and the NOT APPROVED mark), the type sizes, and the page frame every section lays out in.
import type { Paper } from "../sheet";
import { PAPER_SIZES } from "../sheet";

export const COLOUR = {
  ink: "#1d3557",
  inkSoft: "#3d5a80",
  inkFaint: "#8da2bb",
  inkLine: "#c4cfdc",
  paper: "#f6f0e1",
  paperDeep: "#ece3cc",
  paperEdge: "#d9ccaa",
  caution: "#e8590c",
  cautionSoft: "#fde6d5",
  white: "#ffffff",
} as const;

/** Point sizes. 1 pt = 1/72 in (the PostScript point PDF uses, ISO 32000-1 §8.3.2.3). */
export const SIZE = {
  title: 20,
  project: 13,
  heading: 12.5,
  subheading: 10,
  body: 9,
  table: 8.25,
  small: 7.5,
  label: 6.5,
  plan: 6,
  footer: 7,
} as const;

/** The page frame: margins for the content, and the band at the foot that only the footer uses. */
export interface PageFrame {
  width: number;
  height: number;
  left: number;
  right: number;
  top: number;
  /** Content stops here; the footer sits below. */
  bottom: number;
  /** Baseline-ish top of the footer line. */
  footerY: number;
}

const MARGIN = 42;

export function pageFrame(paper: Paper): PageFrame {
  const { widthPt: width, heightPt: height } = PAPER_SIZES[paper];
  return {
    width,
    height,
    left: MARGIN,
    right: width - MARGIN,
    top: MARGIN,
    bottom: height - MARGIN - 14,
    footerY: height - MARGIN + 4,
  };
}
