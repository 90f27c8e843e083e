/** Rough advance of DejaVu Sans per character, as a share of the font size (digits are 0.64 em). */
const ADVANCE = { regular: 0.62, bold: 0.74 } as const;

/** Estimated width of a label in drawing units; painters measure exactly, this only keeps labels apart. */
export const labelWidth = (text: string, size: number, bold = false) => text.length * size * ADVANCE[bold ? "bold" : "regular"];

export interface TierLabel {
  /** Where the label points to. */
  x: number;
  width: number;
}

export interface PlacedLabel {
  /** Tier 0 is nearest the drawing; higher tiers stand further off. */
  tier: number;
  /** Left edge of the label. */
  left: number;
  anchor: "start" | "middle" | "end";
  /** x of the label's anchor point. */
  textX: number;
}

/**
 * Places labels along a line in tiers so that none overlaps another: each label goes in the nearest
 * tier where it clears the labels already there, centred on its point and kept within [lo, hi].
 */
export function placeInTiers(labels: TierLabel[], lo: number, hi: number, gap = 4, blocked: { left: number; right: number }[] = []): PlacedLabel[] {
  const rightEdges: number[] = [];
  // Something already drawn in the nearest tier (a load arrow): a label there must clear it.
  const clearsBlocked = (left: number, width: number) => blocked.every((b) => left + width + gap <= b.left || left >= b.right + gap);
  return labels.map((label) => {
    let left = label.x - label.width / 2;
    let anchor: PlacedLabel["anchor"] = "middle";
    if (left < lo) {
      left = lo;
      anchor = "start";
    } else if (left + label.width > hi) {
      left = hi - label.width;
      anchor = "end";
    }
    let tier = 0;
    while (left < (rightEdges[tier] ?? -Infinity) + gap || (tier === 0 && !clearsBlocked(left, label.width))) tier++;
    rightEdges[tier] = left + label.width;
    const textX = anchor === "start" ? left : anchor === "end" ? left + label.width : label.x;
    return { tier, left, anchor, textX };
  });
}
