import { describe, expect, test } from "vitest";
import { FilletWeld, filletWeldKind } from "../../../core/connector/fillet-weld.js";
import { aiscMaximumEdgeFilletIn, aiscMinimumFilletIn, aiscMinimumSegmentIn } from "../../../core/connector/steel/fillet-weld-strength.js";
import { expectClose } from "../../expect-close.js";
import { context, IN, KIP, member, steel } from "./contexts.js";

// Sources via /work/shared/REFERENCES.md §7.2: AISC 360-16 §J2.4 (F_nw = 0.60 F_EXX, φ 0.75, Ω 2.00) [V],
// Table J2.4 and §J2.2b [V]; EN 1993-1-8 §4.5.3.3 [M] (formula corroborated by secondary pages).

const KIP_PER_IN = KIP / IN;
/** Flange 3/4 in on a web 1/2 in thick standing on edge: a T-joint, the weld in the corner. */
const tee = (basis: "allowable" | "factored") => context(member("web", steel(400, 250), 20 * IN, 0.5 * IN), member("flange", steel(400, 250), 0.75 * IN, 12 * IN), { basis, units: "us" });
const aisc = (legIn: number, fields: Record<string, unknown> = {}) => FilletWeld.parse({ id: "w", kind: "fillet-weld", standard: "AISC-360-16", leg: legIn * IN, electrode: "E70", ...fields });
const perInch = (legIn: number, basis: "allowable" | "factored") => filletWeldKind.resistancePerLength(aisc(legIn), tee(basis)).value / KIP_PER_IN;

describe("AISC 360-16 §J2.4, E70 fillet per inch of weld (REFERENCES §7.2)", () => {
  test("per sixteenth of leg: φR_n = 0.75 × 0.6 × 70 × 0.7071/16 = 1.392 kip/in, the classic value [V] (1.3921 [D]); R_n/Ω 0.9281 [D]", () => {
    expectClose(perInch(1 / 16, "factored"), 1.392, { abs: 5e-4 });
    expectClose(perInch(1 / 16, "allowable"), 0.9281, { rel: 1e-4 });
  });
  test.each([
    [3 / 16, 4.1764, 2.7842],
    [1 / 4, 5.5685, 3.7123],
    [5 / 16, 6.9606, 4.6404],
  ])("leg %s in: φR_n %s kip/in, R_n/Ω %s kip/in [D]", (leg, lrfd, asd) => {
    expectClose(perInch(leg, "factored"), lrfd, { rel: 1e-4 });
    expectClose(perInch(leg, "allowable"), asd, { rel: 1e-4 });
  });
  test("3/8 in: 8.3527 and 1/2 in: 11.1370 kip/in φR_n [D]", () => {
    expectClose(perInch(3 / 8, "factored"), 8.3527, { rel: 1e-4 });
    expectClose(perInch(1 / 2, "factored"), 11.137, { rel: 1e-4 });
  });
  test("the shear flow runs along the weld (θ = 0): no directional increase 1 + 0.5 sin^1.5 θ (eq. J2-5), so a 3/16 in fillet stays at 4.1764 kip/in, not 1.5 × that = 6.2646 [D]", () => {
    expectClose(perInch(3 / 16, "factored"), 4.1764, { rel: 1e-4 });
    expect(filletWeldKind.resistancePerLength(aisc(3 / 16), tee("factored")).steps.find((s) => s.symbol === "R_n")!.description).toContain("no directional increase");
  });
});

describe("AISC 360-16 fillet size and length limits (REFERENCES §7.2)", () => {
  test("least fillet by the thinner part, Table J2.4 [V]: to 1/4 in → 1/8; to 1/2 → 3/16; to 3/4 → 1/4; over 3/4 → 5/16", () => {
    expect([0.25, 0.5, 0.75, 1].map(aiscMinimumFilletIn)).toEqual([1 / 8, 3 / 16, 1 / 4, 5 / 16]);
    expect([0.1875, 0.375, 0.625].map(aiscMinimumFilletIn)).toEqual([1 / 8, 3 / 16, 1 / 4]);
  });
  test("largest fillet along an edge, §J2.2b [V]: t below 1/4 in, t − 1/16 otherwise", () => {
    expect(aiscMaximumEdgeFilletIn(3 / 16)).toBe(3 / 16);
    expect(aiscMaximumEdgeFilletIn(1 / 2)).toBe(7 / 16);
  });
  test("shortest intermittent segment 4w and 1-1/2 in [V]: 1.5 in for 3/16, 1/4, 5/16 in; 2.0 in for 1/2 in [D]", () => {
    expect([3 / 16, 1 / 4, 5 / 16, 1 / 2].map(aiscMinimumSegmentIn)).toEqual([1.5, 1.5, 1.5, 2]);
  });
  test("the kind's detailing for a 3/16 in fillet on a 1/2 in web: least 3/16 in, segment 1-1/2 in, pitch at most 24t = 12 in", () => {
    const d = filletWeldKind.detailing(aisc(3 / 16), tee("factored"));
    expectClose(d.minSize / IN, 3 / 16, { rel: 1e-12 });
    expectClose(d.minSegmentLength / IN, 1.5, { rel: 1e-12 });
    expectClose(d.maxPitch! / IN, 12, { rel: 1e-12 });
  });
});

describe("fillet-weld problems", () => {
  test("a 5/16 in fillet along the edge of a 1/4 in cover plate is larger than the plate allows (t − 1/16 = 3/16 in) and is refused with the field", () => {
    const cover = context(member("cover", steel(400), 0.25 * IN, 10 * IN), member("flange", steel(400), 0.75 * IN, 12 * IN), { units: "us" });
    const problems = filletWeldKind.problems!(aisc(5 / 16), cover);
    expect(problems).toHaveLength(1);
    expect(problems[0]).toMatchObject({ on: "connector", field: "leg" });
    expect(problems[0]!.message).toContain("larger than the thinner part allows");
    expect(problems[0]!.message).toContain("0.1875 in");
  });
  test("a 1/8 in fillet on a 1/2 in web is below the Table J2.4 minimum and is refused", () => {
    expect(filletWeldKind.problems!(aisc(1 / 8), tee("factored"))[0]!.message).toContain("below the least size");
  });
  test("an intermittent segment shorter than 1-1/2 in is refused", () => {
    const w = aisc(3 / 16, { pattern: "intermittent", segmentLength: 1 * IN, pitch: 6 * IN });
    expect(filletWeldKind.problems!(w, tee("factored")).map((p) => p.field)).toEqual(["segmentLength"]);
  });
  test("an unknown electrode is refused by the schema with the field path", () => {
    const r = FilletWeld.safeParse({ id: "w", kind: "fillet-weld", standard: "AISC-360-16", leg: 0.1875, electrode: "E75" });
    expect(r.success).toBe(false);
    expect(r.error!.issues[0]!.path).toEqual(["electrode"]);
  });
});

describe("EN 1993-1-8 §4.5.3.3 simplified method (formula [M], numbers [D])", () => {
  const plates = (fu: number, fy: number) => context(member("web", steel(fu, fy), 560, 10), member("flange", steel(fu, fy), 20, 300), { basis: "factored" });
  const weld = (throat: number) => FilletWeld.parse({ id: "w", kind: "fillet-weld", standard: "EN1993-1-8", throat });
  test("a5 on S275 (f_u 430, β_w 0.85): f_vw,d = 430/√3/(0.85 × 1.25) = 233.66 MPa, F_w,Rd = 1168.3 N/mm", () => {
    const r = filletWeldKind.resistancePerLength(weld(5), plates(430, 275));
    expectClose(r.steps.find((s) => s.symbol === "f_vw,d")!.value, 233.66, { rel: 1e-4 });
    expectClose(r.value, 1168.3, { rel: 1e-4 });
  });
  test("a4 on S235 (f_u 360, β_w 0.80): F_w,Rd = 831.4 N/mm", () => {
    expectClose(filletWeldKind.resistancePerLength(weld(4), plates(360, 235)).value, 831.38, { rel: 1e-4 });
  });
  test("an allowable-basis job cannot use EN 1993-1-8 welds", () => {
    const problems = filletWeldKind.problems!(weld(5), { ...plates(430, 275), basis: "allowable" });
    expect(problems[0]).toMatchObject({ on: "connector", field: "standard" });
  });
});
