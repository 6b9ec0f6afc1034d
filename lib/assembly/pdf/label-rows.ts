// Where the plan's station labels go so none covers another. Each label hangs on a leader line from
// its station and may sit centred on it or run off to either side (a flag), in the row nearest the
// drawing where: its text overlaps no other label in the row; its leader crosses no label in a
// nearer row; no leader to a farther row crosses its text. A place that leaves the stations still
// to come uncovered (and room for the next label beside it) wins over a nearer row, so one label
// does not push its neighbours out.

export interface RowItem {
  /** Where the leader meets the drawing. */
  x: number;
  width: number;
  /** Where the label may sit against x: centred, ending at it, starting at it. */
  anchors: readonly Anchor[];
  /** Width of a first line that stays centred on x wherever the rest goes (the station's name). */
  head?: number;
}

export type Anchor = "centre" | "end" | "start";

export interface Placed {
  row: number;
  anchor: Anchor;
  left: number;
  right: number;
  /** No place worked in any row: this label overlaps another (the scale is too small for the labels). */
  forced?: true;
}

export interface RowBounds {
  left: number;
  right: number;
}

/** Places items (sorted by x) in at most `maxRows` rows, each kept inside the bounds. */
export function placeLabels(items: RowItem[], bounds: RowBounds, gap: number, maxRows: number): Placed[] {
  const placed: Placed[] = [];
  const spanOf = (it: RowItem, anchor: Anchor) => {
    const raw = anchor === "centre" ? it.x - it.width / 2 : anchor === "end" ? it.x - it.width + 1 : it.x - 1;
    const left = Math.min(Math.max(raw, bounds.left), bounds.right - it.width);
    const head = it.head ?? 0;
    return { anchor, left: Math.min(left, it.x - head / 2), right: Math.max(left + it.width, it.x + head / 2) };
  };
  items.forEach((it, i) => {
    const inside = (x: number, s: { left: number; right: number }) => x > s.left - gap / 2 && x < s.right + gap / 2;
    const fits = (row: number, s: { left: number; right: number }) =>
      placed.every((o, j) => {
        if (o.row === row) return s.left >= o.right + gap || o.left >= s.right + gap;
        if (o.row < row) return !inside(it.x, o);
        return !inside(items[j].x, s);
      });
    const leavesLaterFree = (s: { left: number; right: number }) =>
      items.slice(i + 1).every((later) => !inside(later.x, s));
    // The next label can still sit in this row if it may start as far right as it can go.
    const next = items[i + 1];
    const nextLeft = next ? Math.max(...next.anchors.map((a) => spanOf(next, a).left)) : Infinity;
    const roomForNext = (s: { right: number }) => s.right + gap <= nextLeft;
    const spans = (row: number) => it.anchors.map((a) => spanOf(it, a)).filter((s) => fits(row, s));
    let choice: Placed | null = null;
    // First the nearest row with a place that covers none of the stations still to come, then any place.
    for (let row = 0; row < maxRows && !choice; row++) {
      const free = spans(row).filter(leavesLaterFree);
      const s = free.find(roomForNext) ?? free[0];
      if (s) choice = { row, ...s };
    }
    for (let row = 0; row < maxRows && !choice; row++) {
      const s = spans(row)[0];
      if (s) choice = { row, ...s };
    }
    placed.push(choice ?? { row: maxRows - 1, ...spanOf(it, it.anchors[0]), forced: true });
  });
  return placed;
}

export const rowCount = (placed: Placed[]) => (placed.length ? Math.max(...placed.map((p) => p.row)) + 1 : 0);
