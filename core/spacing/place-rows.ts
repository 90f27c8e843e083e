/** A zone as row placement needs it: where it lies and its spacing, mm. */
export interface SpacedZone {
  from: number;
  to: number;
  spacing: number;
}

/**
 * Positions of the connector rows along the member, mm from the left end, no two closer than
 * `minGap` (the connector's minimum spacing).
 *
 * The end rows sit at the end distance. The zones left of the sparsest zone (the central zone of a
 * mirrored plan) are stepped from the left end at their spacings, those right of it from the right
 * end, so each end zone keeps its own spacing up to its end row. Where a zone takes over, its first
 * row comes at the zone's start or at the minimum spacing from the last row, whichever is further.
 * The two runs meet in the sparsest zone, whose rows stop at its end (a row is put at its end where the
 * gap left would be longer than its spacing): a last gap shorter than the minimum is shared with the gap
 * before it (the row between moves to the middle), or, where that would still be short, the row
 * between is left out.
 */
export function placeRows(zones: SpacedZone[], length: number, endDistance: number, mirrored: boolean, minGap = 0): number[] {
  const e = endDistance;
  const L = length;
  const eps = 1e-9 * L;
  if (L <= 2 * e + eps || zones.length === 0) return [L / 2];
  const m = zones.length;
  const meet = mirrored ? centreZone(zones, L, eps) : sparsestZone(zones, L);
  const left: number[] = [e];
  for (let i = 0; i < meet; i++) {
    const z = zones[i]!;
    const start = i === 0 ? e : Math.max(z.from, left[left.length - 1]! + minGap);
    for (let x = start, k = 0; x < z.to - eps; x = start + ++k * z.spacing) if (x > left[left.length - 1]! + eps) left.push(x);
  }
  if (mirrored) return withoutShortGaps(centreRows(left, zones[meet]!, meet === 0, L, e, minGap, eps), minGap, eps);
  const right: number[] = [L - e];
  for (let i = m - 1; i > meet; i--) {
    const z = zones[i]!;
    const start = i === m - 1 ? L - e : Math.min(z.to, right[right.length - 1]! - minGap);
    for (let x = start, k = 0; x > z.from + eps; x = start - ++k * z.spacing) if (x < right[right.length - 1]! - eps) right.push(x);
  }
  const z = zones[meet]!;
  const lastLeft = left[left.length - 1]!;
  const firstRight = right[right.length - 1]!;
  const p = meet === 0 ? e : Math.max(z.from, lastLeft + minGap);
  const middle: number[] = [];
  const stop = Math.min(firstRight, meet === m - 1 ? L - e : z.to);
  for (let x = p, k = 0; x < stop - eps; x = p + ++k * z.spacing) if (x > lastLeft + eps) middle.push(x);
  // A gap longer than this zone's spacing left before the next zone's first row gets a row at the zone's end.
  const lastMiddle = middle.length > 0 ? middle[middle.length - 1]! : lastLeft;
  if (firstRight - lastMiddle > z.spacing + eps && z.to - lastMiddle >= minGap * (1 - 1e-9) && firstRight - z.to >= minGap * (1 - 1e-9) && z.to < firstRight - eps) middle.push(z.to);
  const rows = [...left, ...middle, ...right.reverse()];
  return withoutShortGaps(rows, minGap, eps);
}

/** The zone with the largest spacing, the one nearest midspan among equals: where the leftover gap does least harm. */
function sparsestZone(zones: SpacedZone[], L: number): number {
  let best = 0;
  const distance = (z: SpacedZone) => Math.abs((z.from + z.to) / 2 - L / 2);
  zones.forEach((z, i) => {
    const b = zones[best]!;
    if (z.spacing > b.spacing * (1 + 1e-12) || (z.spacing >= b.spacing * (1 - 1e-12) && distance(z) < distance(b))) best = i;
  });
  return best;
}

function centreZone(zones: SpacedZone[], L: number, eps: number): number {
  const i = zones.findIndex((z) => z.from <= L / 2 + eps && z.to >= L / 2 - eps);
  return i >= 0 ? i : sparsestZone(zones, L);
}

/**
 * The central zone of a mirrored plan, stepped from its start to midspan and mirrored. A central gap
 * longer than the spacing gets a row at midspan; one shorter than the minimum moves the two rows
 * beside it apart to the minimum, or becomes one row at midspan where that would crowd the rows before.
 */
function centreRows(left: number[], z: SpacedZone, first: boolean, L: number, e: number, minGap: number, eps: number): number[] {
  const s = z.spacing;
  const lastLeft = left[left.length - 1]!;
  const p = first ? e : Math.max(z.from, lastLeft + minGap);
  const half = [...left];
  for (let x = p, k = 0; x <= L / 2 + eps; x = p + ++k * s) if (x > half[half.length - 1]! + eps) half.push(x);
  const last = half[half.length - 1]!;
  const mirror = (xs: number[]) => xs.map((x) => L - x).reverse();
  if (Math.abs(last - L / 2) <= eps) return [...half, ...mirror(half.slice(0, -1))];
  const G = L - 2 * last;
  if (G >= minGap * (1 - 1e-9)) {
    if (G > s * (1 + 1e-9) && G / 2 >= minGap * (1 - 1e-9)) return [...half, L / 2, ...mirror(half)];
    return [...half, ...mirror(half)];
  }
  const before = half.length > 1 ? half[half.length - 2]! : null;
  const moved = L / 2 - minGap / 2;
  if (before !== null && moved - before >= minGap * (1 - 1e-9) && half.length > 1) {
    const shifted = [...half.slice(0, -1), moved];
    return [...shifted, ...mirror(shifted)];
  }
  const rest = half.slice(0, -1);
  if (rest.length === 0) return [L / 2];
  return [...rest, L / 2, ...mirror(rest)];
}

/**
 * Removes every gap shorter than the minimum, keeping the end rows: the row beside the short gap moves
 * to the middle of its neighbours where both new gaps reach the minimum, or else is left out.
 */
function withoutShortGaps(rows: number[], minGap: number, eps: number): number[] {
  const out = [...rows];
  const short = (g: number) => g < minGap * (1 - 1e-9) - eps;
  for (let k = 0; k + 1 < out.length; ) {
    if (!short(out[k + 1]! - out[k]!)) {
      k++;
      continue;
    }
    if (out.length === 2) return [(out[0]! + out[1]!) / 2];
    // Candidates: the left row of the pair (not the first row) or the right one (not the last row).
    const options: { index: number; at: number | null; worst: number }[] = [];
    for (const index of [k, k + 1]) {
      if (index === 0 || index === out.length - 1) continue;
      const a = out[index - 1]!;
      const b = out[index + 1]!;
      const mid = (a + b) / 2;
      options.push(short(mid - a) ? { index, at: null, worst: b - a } : { index, at: mid, worst: (b - a) / 2 });
    }
    const pick = options.reduce((best, o) => (o.worst < best.worst ? o : best));
    if (pick.at === null) out.splice(pick.index, 1);
    else out[pick.index] = pick.at;
    k = Math.max(0, pick.index - 1);
  }
  return out;
}

/**
 * The far side of a staggered intermittent weld: a segment at each end, as on the near side, and one
 * midway between each two near-side segments. (The ends get a segment on both sides, so the far side
 * never reaches half a pitch further than the near side for the flow it carries.)
 */
export function staggeredSide(near: number[]): number[] {
  if (near.length < 2) return [...near];
  return [near[0]!, ...near.slice(1).map((x, i) => (near[i]! + x) / 2), near[near.length - 1]!];
}
