import { describe, expect, test } from "vitest";
import { fastenerReach, rowsAcrossDepth, staggeredOffsets } from "../../../core/multi-ply/ply-detailing.js";
import { expectClose } from "../../expect-close.js";

describe("rowsAcrossDepth", () => {
  test("M12 bolts in a 2x12 (38 × 286): loaded edge a_4,t = max((2 + 2 sin 90°)d; 3d) = 48 mm, rows 190 mm apart ≥ a_2 = 4d = 48 mm (EN 1995-1-1 Table 8.4, REFERENCES §6.5 [V] rule, [D] numbers)", () => {
    const r = rowsAcrossDepth({ depth: 286, rows: 2, edgeDistanceTop: 48, edgeDistanceBottom: 48, minRowSpacing: 48 });
    expect(r.positions).toEqual([48, 238]);
    expect(r.rowSpacing).toBe(190);
    expect(r.fits).toBe(true);
    expect(r.effectiveDepth).toEqual({ fromBottom: 238, fromTop: 238 });
  });

  test("3.1 mm nails in a 2x10 (235 mm), four rows: a_4,t at 90° = (5 + 2 sin α)d = 21.7 mm, a_2 = 5d = 15.5 mm (EN 1995-1-1 Table 8.2, REFERENCES §6.5 [V] rule, [D] numbers)", () => {
    const r = rowsAcrossDepth({ depth: 235, rows: 4, edgeDistanceTop: 21.7, edgeDistanceBottom: 21.7, minRowSpacing: 15.5 });
    expectClose(r.rowSpacing, (235 - 43.4) / 3, { rel: 1e-12 });
    expectClose(r.positions[3]!, 213.3, { rel: 1e-12 });
    expect(r.fits).toBe(true);
  });

  test("rows that do not fit the depth are reported with the reason", () => {
    const tooMany = rowsAcrossDepth({ depth: 89, rows: 3, edgeDistanceTop: 30, edgeDistanceBottom: 30, minRowSpacing: 48 });
    expect(tooMany.fits).toBe(false);
    expect(tooMany.reasons[0]).toMatch(/less than the 48 mm/);
    const tooShallow = rowsAcrossDepth({ depth: 89, rows: 2, edgeDistanceTop: 48, edgeDistanceBottom: 48, minRowSpacing: 48 });
    expect(tooShallow.reasons[0]).toMatch(/less than the two edge distances/);
  });

  test("one row sits at mid-depth", () => {
    expect(rowsAcrossDepth({ depth: 286, rows: 1, edgeDistanceTop: 48, edgeDistanceBottom: 48, minRowSpacing: 48 }).positions).toEqual([143]);
  });

  test("staggered rows: alternate rows shifted by half the spacing [CP]", () => {
    expect(staggeredOffsets(3, 300)).toEqual([0, 150, 0]);
  });
});

describe("fastenerReach", () => {
  // 16d common nail: L = 3.5 in = 88.9 mm (REFERENCES §10 [V]), D = 0.162 in (REFERENCES §5.3 [V]);
  // minimum penetration 6D = 24.69 mm (NDS, REFERENCES §10 [M]); 2x plies 1.5 in = 38.1 mm (PS 20 [V]).
  const nail = { length: 88.9, minPenetration: 6 * 0.162 * 25.4 };

  test("three plies: nails from the left reach interface 1, from the right interface 2; both interfaces are covered [D]", () => {
    const r = fastenerReach({ thicknesses: [38.1, 38.1, 38.1], ...nail });
    expect(r.interfaces).toEqual([
      { interface: 1, fromLeft: true, fromRight: false },
      { interface: 2, fromLeft: false, fromRight: true },
    ]);
    expect(r.unreachable).toEqual([]);
  });

  test("four plies: the middle interface needs 76.2 + 24.7 = 100.9 mm > 88.9 mm from either face, so through-bolts or longer screws [D]", () => {
    const r = fastenerReach({ thicknesses: [38.1, 38.1, 38.1, 38.1], ...nail });
    expect(r.unreachable).toEqual([2]);
  });
});
