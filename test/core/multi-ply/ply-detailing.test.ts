import { describe, expect, test } from "vitest";
import { fastenerReach } from "../../../core/multi-ply/ply-detailing.js";

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
