import { describe, expect, test } from "vitest";
import { verifyBands } from "../../../core/spacing/verify-rows.js";
import { expectClose } from "../../expect-close.js";

// A force handed across within d/2 each side of a concentrated load is carried by the rows within that band only
// (the concentrated-load rule, [CP]). Band 2000 ± 143 mm (d = 286 mm, a 2x12, REFERENCES §10 [V]); T = 2/3 × 10 kN
// = 6667 N (three equal plies, load on the left face, interface 1 [D]); 2 nails per row at R = 600 N (round rated value).
describe("rows within a band (verifyBands)", () => {
  const band = { from: 1857, to: 2143, forces: [{ combination: "U", force: 20_000 / 3 }] };
  const resistances = [{ id: "U", resistance: 600 }];
  test("rows at 50 mm from 50 mm: 1900…2100 stand within, 5 rows × 2 × 600 = 6000 N, utilisation 6667/6000 = 1.111 [D]", () => {
    const rows = Array.from({ length: 79 }, (_, k) => 50 + 50 * k);
    const [check] = verifyBands(rows, [band], resistances, 2);
    expect(check!.rows).toBe(5);
    expectClose(check!.carried, 6000, { rel: 1e-12 });
    expectClose(check!.utilisation, 20_000 / 3 / 6000, { rel: 1e-12 });
  });
  test("the same spacing from 1857 mm: 1857…2107 stand within (the edges count), 6 rows, 7200 N, utilisation 0.926 [D]", () => {
    const rows = Array.from({ length: 6 }, (_, k) => 1857 + 50 * k);
    const [check] = verifyBands([1700, 1800, ...rows, 2200], [band], resistances, 2);
    expect(check!.rows).toBe(6);
    expectClose(check!.utilisation, 20_000 / 3 / 7200, { rel: 1e-12 });
  });
  test("no row within: the band cannot be carried (utilisation infinite), whatever the rows beside it", () => {
    const [check] = verifyBands([1800, 2200], [band], resistances, 2);
    expect(check!.rows).toBe(0);
    expect(check!.utilisation).toBe(Infinity);
  });
  test("a combination not among the resistances is not counted; the worst of the others governs", () => {
    const two = { ...band, forces: [{ combination: "U", force: 3000 }, { combination: "W", force: 5000 }, { combination: "X", force: 9e9 }] };
    const [check] = verifyBands([1900, 2000, 2100], [two], [{ id: "U", resistance: 600 }, { id: "W", resistance: 900 }], 2);
    expect(check!.combination).toBe("W");
    expectClose(check!.utilisation, 5000 / (3 * 2 * 900), { rel: 1e-12 });
  });
});
