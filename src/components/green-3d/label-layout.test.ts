import fc from "fast-check";
import { expect, test } from "vitest";
import { LABEL_GAP_PX, overlaps, placeLabels, type LabelBox } from "./label-layout";

const view = { width: 358, height: 336 };

function placedRects(labels: LabelBox[], v = view) {
  const p = placeLabels(labels, v);
  return labels.flatMap((l) => {
    const s = p.get(l.id);
    return s ? [{ id: l.id, x: l.rect.x + s.dx, y: l.rect.y + s.dy, w: l.rect.w, h: l.rect.h }] : [];
  });
}

test("three labels wanted on one spot (the compare view from above) end up apart, all shown", () => {
  const at = (id: string, x: number) => ({ id, rect: { x, y: 120, w: 110, h: 22 } });
  const rects = placedRects([at("aim-chosen", 130), at("aim-dying", 125), at("aim-firm", 140)]);
  expect(rects).toHaveLength(3);
  for (let i = 0; i < rects.length; i++) for (let j = i + 1; j < rects.length; j++) expect(overlaps(rects[i]!, rects[j]!)).toBe(false);
  // The first (most important) keeps its place.
  expect(rects[0]).toMatchObject({ x: 130, y: 120 });
});

test("a label past the edge of the view is pulled inside it", () => {
  const [r] = placedRects([{ id: "higher", rect: { x: 330, y: -10, w: 60, h: 20 } }]);
  expect(r!.x + r!.w).toBeLessThanOrEqual(view.width - LABEL_GAP_PX);
  expect(r!.y).toBeGreaterThanOrEqual(LABEL_GAP_PX);
});

test("property: whatever the wanted places, placed labels never overlap and stay inside the view", () => {
  const box = fc.record({
    x: fc.integer({ min: -80, max: 400 }),
    y: fc.integer({ min: -40, max: 380 }),
    w: fc.integer({ min: 30, max: 160 }),
    h: fc.integer({ min: 16, max: 26 }),
  });
  fc.assert(
    fc.property(fc.array(box, { minLength: 1, maxLength: 6 }), (boxes) => {
      const labels = boxes.map((rect, i) => ({ id: `l${i}`, rect }));
      const rects = placedRects(labels);
      for (const r of rects) {
        expect(r.x).toBeGreaterThanOrEqual(0);
        expect(r.y).toBeGreaterThanOrEqual(0);
        expect(r.x + r.w).toBeLessThanOrEqual(view.width);
        expect(r.y + r.h).toBeLessThanOrEqual(view.height);
      }
      for (let i = 0; i < rects.length; i++) for (let j = i + 1; j < rects.length; j++) expect(overlaps(rects[i]!, rects[j]!)).toBe(false);
    }),
  );
});
