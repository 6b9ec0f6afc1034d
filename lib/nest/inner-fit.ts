// Inner-fit polygon of a shape in a rectangular container (Bennell & Oliveira 2008, §5): the set
// of reference-point positions that keep the shape inside. For a rectangle it is the rectangle
// shrunk by the shape's bounding box.
import type { Box } from "@/lib/geometry/box";

/**
 * Positions for a shape with bounding box `box` (in its own frame) inside `container`, widened by
 * `slack` integer steps on each side so that an exact fit keeps a region of non-zero area.
 * Null when the shape does not fit; a shape exactly as long or wide as the container gets a
 * rectangle of zero width.
 */
export function innerFitRectangle(container: Box, box: Box, slack = 0): Box | null {
  const r = {
    minX: container.minX - box.minX - slack,
    minY: container.minY - box.minY - slack,
    maxX: container.maxX - box.maxX + slack,
    maxY: container.maxY - box.maxY + slack,
  };
  return r.maxX >= r.minX && r.maxY >= r.minY ? r : null;
}
