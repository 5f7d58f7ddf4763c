// Where the scene's labels go on screen so that no two overlap: each label has a wanted rectangle (beside its
// anchor); in priority order, a label takes the first of a few nudged positions that stays inside the view and
// clear of the labels already placed, or is left out. Pure, so the rule is tested without WebGL.

export type Rect = { x: number; y: number; w: number; h: number };
export type LabelBox = { id: string; rect: Rect };
/** The shift that was applied to a label, or null when it is left out (no clear place). */
export type Placement = { dx: number; dy: number } | null;

/** Gap kept between labels and from the view's edge, px. */
export const LABEL_GAP_PX = 3;

export function overlaps(a: Rect, b: Rect, gap = 0): boolean {
  return a.x < b.x + b.w + gap && b.x < a.x + a.w + gap && a.y < b.y + b.h + gap && b.y < a.y + a.h + gap;
}

/**
 * Places labels in the order given (the first is the most important). Each is first pulled inside the view, then
 * tried at its place and at steps of its own height above and below it, then beside it; the first clear spot wins.
 * Placed rectangles never overlap one another (with {@link LABEL_GAP_PX} between them).
 */
export function placeLabels(labels: readonly LabelBox[], view: { width: number; height: number }): Map<string, Placement> {
  const placed: Rect[] = [];
  const out = new Map<string, Placement>();
  const g = LABEL_GAP_PX;
  for (const { id, rect } of labels) {
    // Inside the view first (a label wider than the view cannot be placed).
    if (rect.w + 2 * g > view.width || rect.h + 2 * g > view.height) {
      out.set(id, null);
      continue;
    }
    const inX = Math.min(Math.max(rect.x, g), view.width - g - rect.w) - rect.x;
    const inY = Math.min(Math.max(rect.y, g), view.height - g - rect.h) - rect.y;
    const stepY = rect.h + g;
    const stepX = rect.w / 2 + g;
    const tries: [number, number][] = [[0, 0]];
    for (let k = 1; k <= 4; k++) tries.push([0, -k * stepY], [0, k * stepY]);
    for (const sx of [-1, 1])
      for (let k = 1; k <= 3; k++) tries.push([sx * k * stepX, 0], [sx * k * stepX, -stepY], [sx * k * stepX, stepY]);
    let chosen: Placement = null;
    for (const [tx, ty] of tries) {
      const r = { x: rect.x + inX + tx, y: rect.y + inY + ty, w: rect.w, h: rect.h };
      if (r.x < g || r.y < g || r.x + r.w > view.width - g || r.y + r.h > view.height - g) continue;
      if (placed.some((p) => overlaps(p, r, g))) continue;
      chosen = { dx: inX + tx, dy: inY + ty };
      placed.push(r);
      break;
    }
    out.set(id, chosen);
  }
  return out;
}
