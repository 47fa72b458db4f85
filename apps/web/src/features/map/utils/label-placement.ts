/** A label's screen box: `x` is its horizontal centre, `y` its top edge, in CSS pixels. */
export type LabelBox = { id: string; x: number; y: number; width: number; height: number };

/**
 * Greedy label placement: walks the labels in priority order and keeps each one whose box (grown by
 * `padding`) overlaps none kept before it, so crowded sites do not print over each other.
 * @param boxes labels in priority order (most important first)
 * @param padding free pixels kept around each label
 * @returns the ids of the labels to show
 * @example labelsPlaced([{ id: 'a', x: 10, y: 10, width: 40, height: 14 }, { id: 'b', x: 20, y: 12, width: 40, height: 14 }]) // Set { 'a' }
 */
export function labelsPlaced(boxes: readonly LabelBox[], padding = 2): Set<string> {
  const kept: Array<[number, number, number, number]> = [];
  const shown = new Set<string>();
  for (const box of boxes) {
    const rect: [number, number, number, number] = [box.x - box.width / 2 - padding, box.y - padding, box.x + box.width / 2 + padding, box.y + box.height + padding];
    const hits = kept.some(([l, t, r, b]) => rect[0] < r && rect[2] > l && rect[1] < b && rect[3] > t);
    if (hits) continue;
    kept.push(rect);
    shown.add(box.id);
  }
  return shown;
}

/**
 * Approximate width of a label in the 11 px map font when the browser cannot measure it (not laid out yet).
 * @param text the label text
 * @returns pixels
 * @example labelWidthEstimate('Quay corner') // 68.2
 */
export function labelWidthEstimate(text: string): number {
  return text.length * 6.2;
}
