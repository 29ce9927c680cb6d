export interface Point {
  x: number;
  y: number;
}

/** Where a label's centre goes, relative to its node's centre (screen axes: y grows downwards). */
export interface LabelOffset {
  dx: number;
  dy: number;
}

const GAP = 3;
const UP = -Math.PI / 2;

/**
 * The direction from `centre` furthest from every arrow: the middle of the widest angle between
 * the neighbours' directions. A step node's arrows leave its centre towards its species, so a label
 * put there crosses none of them. Gaps within a few degrees of the widest are read as equal and the
 * one nearest "above" wins, so that labels of a tidy layout sit alike.
 */
export function freestDirection(centre: Point, neighbours: readonly Point[]): number {
  const angles = neighbours
    .filter((p) => p.x !== centre.x || p.y !== centre.y)
    .map((p) => Math.atan2(p.y - centre.y, p.x - centre.x))
    .sort((a, b) => a - b);
  if (angles.length === 0) return UP;
  let best = { middle: UP, width: -1 };
  for (let i = 0; i < angles.length; i += 1) {
    const from = angles[i];
    const width = (i + 1 < angles.length ? angles[i + 1] : angles[0] + 2 * Math.PI) - from;
    const middle = from + width / 2;
    const wider = width > best.width + 0.1;
    const asWide = Math.abs(width - best.width) <= 0.1 && angleApart(middle, UP) < angleApart(best.middle, UP);
    if (wider || asWide) best = { middle, width };
  }
  return Math.atan2(Math.sin(best.middle), Math.cos(best.middle));
}

/** The smaller angle between two directions, 0…π. */
function angleApart(a: number, b: number): number {
  const d = Math.abs(a - b) % (2 * Math.PI);
  return d > Math.PI ? 2 * Math.PI - d : d;
}

/**
 * The offset that puts a `label` box just clear of a square node of half-size `half`, in the given
 * direction: the nearest point along that direction where the two boxes stand apart on one axis.
 */
export function labelOffsetToward(direction: number, half: number, label: { width: number; height: number }): LabelOffset {
  const ux = Math.cos(direction);
  const uy = Math.sin(direction);
  const alongX = Math.abs(ux) > 1e-6 ? (half + GAP + label.width / 2) / Math.abs(ux) : Infinity;
  const alongY = Math.abs(uy) > 1e-6 ? (half + GAP + label.height / 2) / Math.abs(uy) : Infinity;
  const distance = Math.min(alongX, alongY);
  return { dx: round(ux * distance), dy: round(uy * distance) };
}

const round = (value: number) => Math.round(value * 10) / 10;
