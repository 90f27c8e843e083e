import { describe, expect, test } from "vitest";
import { firstMomentAbove, widthAt } from "../../../core/section/section-model.js";
import { stressProfile } from "../../../core/section/stress-profile.js";
import { expectClose } from "../../expect-close.js";
import { material, rect, sectionOf } from "../../section-builders.js";

// Closed forms of section properties: Gere & Goodno, Mechanics of Materials, ch. 5 (§5.8–5.11);
// values from ../shared/REFERENCES.md §1–2, flag [D] (derived, computed twice) unless noted.
const shearFlow = (V: number, Q: number, I: number) => (V * Q) / I;

describe("buildSection on single rectangles", () => {
  test("2x12 (1.5 × 11.25 in): A, centroid, I = bh³/12, S, Q_max = bh²/8, q and τ_max = 1.5V/A (REFERENCES §1.1 [D])", () => {
    const { section } = sectionOf([rect("board", 1.5, 11.25, 0, 0)]);
    expectClose(section.area, 16.875, { rel: 1e-9 }, "A");
    expectClose(section.centroidY, 5.625, { rel: 1e-9 }, "ȳ");
    expectClose(section.secondMoment, 177.979, { rel: 1e-5 }, "I");
    expectClose(section.secondMoment / 5.625, 31.6406, { rel: 1e-5 }, "S");
    const qMax = firstMomentAbove(section, section.centroidY);
    expectClose(qMax, 23.7305, { rel: 1e-5 }, "Q_max");
    expectClose(shearFlow(1000, qMax, section.secondMoment), 133.333, { rel: 1e-5 }, "q at NA, V = 1000 lb");
    expectClose(shearFlow(1000, qMax, section.secondMoment) / 1.5, 88.889, { rel: 1e-5 }, "τ_max");
    expectClose(shearFlow(1000, qMax, section.secondMoment) / 1.5, (1.5 * 1000) / 16.875, { rel: 1e-12 }, "τ_max = 1.5V/A");
  });

  test("100 × 200 mm: I, Q at the NA and 50 mm above it (REFERENCES §1.2 [D])", () => {
    const { section } = sectionOf([rect("r", 100, 200, 0, 0)]);
    expectClose(section.area, 20_000, { rel: 1e-12 });
    expectClose(section.secondMoment, 66.667e6, { rel: 1e-5 });
    expectClose(firstMomentAbove(section, 100), 500_000, { rel: 1e-12 });
    expectClose(firstMomentAbove(section, 150), 375_000, { rel: 1e-12 });
  });

  test("τ(y) = 3V/(2A)(1 − y²/c²) over a 100 × 200 rectangle, V = 10 kN (REFERENCES §2.1 [D])", () => {
    const { section } = sectionOf([rect("r", 100, 200, 0, 0)]);
    const tau = (yFromNa: number) => (10_000 * firstMomentAbove(section, 100 + yFromNa)) / (section.secondMoment * widthAt(section, 100 + yFromNa));
    const expected: [number, number][] = [[0, 0.75], [25, 0.70313], [50, 0.5625], [75, 0.32813]];
    for (const [y, t] of expected) expectClose(tau(y), t, { rel: 1e-4 }, `τ at ${y} mm`);
    expect(firstMomentAbove(section, 200)).toBe(0);
    // The computed profile against the rectangle closed form at every sampled level.
    for (const p of stressProfile(section)) {
      const c = 100;
      const y = p.y - 100;
      expectClose(p.factor * 10_000, (3 * 10_000) / (2 * 20_000) * (1 - (y * y) / (c * c)), { abs: 1e-9 }, `profile at y = ${p.y}`);
    }
  });
});

describe("buildSection on built-up sections", () => {
  test("welded plate girder 300×20 flanges, 10×560 web: A, I, Q, q and τ (REFERENCES §1.3, §2.3 [D])", () => {
    const { section, joints } = sectionOf([rect("bf", 300, 20, 0, 0), rect("web", 10, 560, 145, 20), rect("tf", 300, 20, 0, 580)]);
    expectClose(section.area, 17_600, { rel: 1e-12 });
    expectClose(section.centroidY, 300, { rel: 1e-12 });
    expectClose(section.secondMoment, 1155.95e6, { rel: 1e-5 });
    const top = joints.find((j) => j.id === "tf")!;
    expectClose(top.firstMoment, 1.74e6, { rel: 1e-9 }, "Q at flange–web plane");
    expectClose(top.contactWidth, 10, { rel: 1e-12 }, "t");
    expectClose(firstMomentAbove(section, 300), 2.132e6, { rel: 1e-4 }, "Q at NA");
    expectClose(shearFlow(500_000, top.firstMoment, section.secondMoment), 752.63, { rel: 1e-4 }, "q at flange–web plane");
    expectClose(shearFlow(500_000, firstMomentAbove(section, 300), section.secondMoment) / 10, 92.22, { rel: 1e-4 }, "τ at NA");
    expectClose(shearFlow(500_000, top.firstMoment, section.secondMoment) / 10, 75.26, { rel: 1e-4 }, "τ in web at junction");
  });

  test("timber I from 2x6 flanges and a 2x10 web: I, Q at the nail planes and NA, q, τ (REFERENCES §1.4 [D])", () => {
    const { section, joints } = sectionOf([rect("bottom", 5.5, 1.5, 0, 0), rect("web", 1.5, 9.25, 2, 1.5), rect("top", 5.5, 1.5, 0, 10.75)]);
    expectClose(section.area, 30.375, { rel: 1e-12 });
    expectClose(section.centroidY, 6.125, { rel: 1e-12 });
    expectClose(section.secondMoment, 578.721, { rel: 1e-5 });
    expect(joints.map((j) => j.id).sort()).toEqual(["bottom", "top"]);
    for (const j of joints) expectClose(j.firstMoment, 44.3438, { rel: 1e-5 }, `Q at ${j.id} nail plane`);
    expectClose(firstMomentAbove(section, section.centroidY), 60.3867, { rel: 1e-5 }, "Q at NA");
    expectClose(shearFlow(2000, joints[0]!.firstMoment, section.secondMoment), 153.247, { rel: 1e-5 }, "q, V = 2000 lb");
    expectClose(shearFlow(2000, firstMomentAbove(section, section.centroidY), section.secondMoment) / 1.5, 139.13, { rel: 1e-4 }, "τ at NA");
  });

  test("T from two 2x8: centroid, I, Q at the joint and NA, q (REFERENCES §1.5 [D])", () => {
    const { section, joints } = sectionOf([rect("web", 1.5, 7.25, 2.875, 0), rect("flange", 7.25, 1.5, 0, 7.25)]);
    expectClose(section.centroidY, 5.8125, { rel: 1e-12 });
    expectClose(section.secondMoment, 153.751, { rel: 1e-5 });
    expect(joints).toHaveLength(1);
    expectClose(joints[0]!.firstMoment, 23.7891, { rel: 1e-5 }, "Q at joint");
    expectClose(firstMomentAbove(section, section.centroidY), 25.3389, { rel: 1e-5 }, "Q at NA");
    expectClose(shearFlow(1500, joints[0]!.firstMoment, section.secondMoment), 232.087, { rel: 1e-5 }, "q, V = 1500 lb");
    expectClose((1500 * firstMomentAbove(section, section.centroidY)) / (section.secondMoment * 1.5), 164.81, { rel: 1e-4 }, "τ at NA");
  });

  test("T, SI (200×50 flange on a 50×200 web): centroid, I, Q, q (REFERENCES §1.6 [D])", () => {
    const { section, joints } = sectionOf([rect("web", 50, 200, 75, 0), rect("flange", 200, 50, 0, 200)]);
    expectClose(section.centroidY, 162.5, { rel: 1e-12 });
    expectClose(section.secondMoment, 113.542e6, { rel: 1e-5 });
    expectClose(joints[0]!.firstMoment, 625_000, { rel: 1e-12 });
    expectClose(firstMomentAbove(section, section.centroidY), 660_156, { rel: 1e-6 });
    expectClose(shearFlow(10_000, joints[0]!.firstMoment, section.secondMoment), 55.046, { rel: 1e-4 });
  });

  test("box from four planks, webs between the flanges: I, Q of a flange over two nail lines (Gere 7e Prob. 5.11-4; REFERENCES §1.7 [V]/[D])", () => {
    const { section, joints } = sectionOf([
      rect("bottom", 260, 25, 0, 0),
      rect("web-l", 50, 260, 0, 25),
      rect("web-r", 50, 260, 210, 25),
      rect("top", 260, 25, 0, 285),
    ]);
    expectClose(section.area, 39_000, { rel: 1e-12 });
    expectClose(section.secondMoment, (260 * 310 ** 3 - 160 * 260 ** 3) / 12, { rel: 1e-12 }, "I = (bh³ − b₁h₁³)/12");
    expectClose(section.secondMoment, 411.125e6, { rel: 1e-6 });
    expect(joints.map((j) => j.id).sort()).toEqual(["bottom", "top"]);
    const top = joints.find((j) => j.id === "top")!;
    expect(top.lines).toHaveLength(2);
    expectClose(top.contactWidth, 100, { rel: 1e-12 }, "t = two 50 mm webs");
    expectClose(top.firstMoment, 926_250, { rel: 1e-12 });
    expectClose(firstMomentAbove(section, section.centroidY), 1.77125e6, { rel: 1e-6 }, "Q at NA");
  });

  test("box with the webs outside the flanges: each flange is one joint over two vertical lines", () => {
    const { joints } = sectionOf([
      rect("web-l", 18, 400, 0, 0),
      rect("bottom", 95, 70, 18, 0),
      rect("top", 95, 70, 18, 330),
      rect("web-r", 18, 400, 113, 0),
    ]);
    expect(joints.map((j) => j.id).sort()).toEqual(["bottom", "top"]);
    for (const j of joints) {
      expect(j.lines.map((l) => l.orientation)).toEqual(["vertical", "vertical"]);
      expectClose(j.contactWidth, 140, { rel: 1e-12 }, "t = 2 × 70 mm of contact depth");
      // Q of a 95 × 70 flange whose centroid is 165 mm from the NA.
      expectClose(j.firstMoment, 95 * 70 * 165, { rel: 1e-12 });
    }
  });

  test("two stacked boards: I, Q at the joint (the NA), q and the bond-line stress q/b = 1.5V/A (REFERENCES §1.8 [D])", () => {
    const { section, joints } = sectionOf([rect("lower", 100, 50, 0, 0), rect("upper", 100, 50, 0, 50)]);
    expectClose(section.secondMoment, 8.3333e6, { rel: 1e-4 });
    expect(joints).toHaveLength(1);
    expect(joints[0]!.held).toEqual(["upper"]);
    expectClose(joints[0]!.firstMoment, 125_000, { rel: 1e-12 });
    const q = shearFlow(10_000, joints[0]!.firstMoment, section.secondMoment);
    expectClose(q, 150, { rel: 1e-9 });
    expectClose(q / joints[0]!.contactWidth, 1.5, { rel: 1e-9 }, "bond-line stress");
  });

  test("three stacked boards: I, Q at each joint and at the NA, q and τ (REFERENCES §1.9 [D])", () => {
    const { section, joints } = sectionOf([rect("a", 100, 40, 0, 0), rect("b", 100, 40, 0, 40), rect("c", 100, 40, 0, 80)]);
    expectClose(section.secondMoment, 14.4e6, { rel: 1e-9 });
    expect(joints.map((j) => j.held)).toEqual([["c"], ["a"]]);
    for (const j of joints) {
      expectClose(j.firstMoment, 160_000, { rel: 1e-12 });
      expectClose(shearFlow(10_000, j.firstMoment, section.secondMoment), 111.111, { rel: 1e-5 });
    }
    expectClose(firstMomentAbove(section, 60), 180_000, { rel: 1e-12 });
    expectClose(shearFlow(10_000, 180_000, section.secondMoment) / 100, 1.25, { rel: 1e-9 });
  });

  test("W18x50 as three rectangles: A, I, Q at the junction and NA, τ and q (REFERENCES §2.2: dimensions [V] AISC Manual / Beer & Johnston appendix, values [D])", () => {
    const d = 17.99;
    const bf = 7.495;
    const tf = 0.57;
    const tw = 0.355;
    const hw = d - 2 * tf;
    const { section } = sectionOf([rect("bf", bf, tf, 0, 0), rect("web", tw, hw, (bf - tw) / 2, tf), rect("tf", bf, tf, 0, d - tf)]);
    expectClose(section.area, 14.526, { rel: 1e-4 });
    expectClose(section.secondMoment, 789.97, { rel: 1e-5 });
    // Fillets ignored: the handbook I of 800 in⁴ is 1.3 % larger, which the fillet area explains.
    expectClose(section.secondMoment, 800, { rel: 0.015 }, "I against the tabulated 800 in⁴ [V]");
    const qJunction = firstMomentAbove(section, d - tf);
    const qNa = firstMomentAbove(section, d / 2);
    expectClose(qJunction, 37.21, { rel: 1e-4 });
    expectClose(qNa, 49.81, { rel: 1e-4 });
    expectClose((100 * qJunction) / (section.secondMoment * tw), 13.27, { rel: 1e-3 }, "τ web at junction, ksi");
    expectClose((100 * qNa) / (section.secondMoment * tw), 17.76, { rel: 1e-3 }, "τ at NA, ksi");
    expectClose(shearFlow(100, qJunction, section.secondMoment), 4.71, { rel: 1e-3 }, "q at junction, kip/in");
    expectClose(100 / (d * tw), 15.66, { rel: 1e-3 }, "V/(d·t_w), AISC 360 §G2.1 shear area");
  });
});

describe("buildSection with mixed materials", () => {
  test("a steel plate under a timber beam by modular ratio against a hand calculation", () => {
    // Hand calculation (transformed section, Gere & Goodno ch. 6 "composite beams"):
    // timber 100 × 200 (E = 10 000), steel plate 100 × 10 (E = 200 000) below it; n = 20 for the plate.
    // Transformed areas: timber 20 000 at y = 110; plate 20 × 1000 = 20 000 at y = 5 → ȳ = 57.5.
    // I = 100·200³/12 + 20 000·52.5² + 20·(100·10³/12) + 20 000·52.5² = 66.6667e6 + 2·55.125e6 + 0.166667e6 = 177.0833e6.
    // Joint above the plate, held group the plate (smaller area): |Q| = 20 000 × 52.5 = 1.05e6 (transformed).
    const { section, joints } = sectionOf(
      [rect("timber", 100, 200, 0, 10, "T"), rect("plate", 100, 10, 0, 0, "S")],
      [material("T", 10_000), material("S", 200_000)],
    );
    expectClose(section.referenceModulus, 10_000, { rel: 0 });
    expectClose(section.centroidY, 57.5, { rel: 1e-12 });
    expectClose(section.secondMoment, 177.0833e6, { rel: 1e-6 });
    expect(joints[0]!.held).toEqual(["plate"]);
    expectClose(joints[0]!.firstMoment, 1.05e6, { rel: 1e-12 });
    // The real shear flow does not depend on the reference chosen: repeat with the steel as reference.
    const asSteel = sectionOf(
      [rect("plate", 100, 10, 0, 0, "S"), rect("timber", 100, 200, 0, 10, "T")],
      [material("T", 10_000), material("S", 200_000)],
    );
    expectClose(asSteel.joints[0]!.firstMoment / asSteel.section.secondMoment, joints[0]!.firstMoment / section.secondMoment, { rel: 1e-12 }, "Q/I");
  });
});

describe("stressProfile", () => {
  test("τ jumps at a width change by the ratio of the widths: T of REFERENCES §1.6 at the flange underside", () => {
    const { section } = sectionOf([rect("web", 50, 200, 75, 0), rect("flange", 200, 50, 0, 200)]);
    const atJunction = stressProfile(section).filter((p) => Math.abs(p.y - 200) < 1e-9);
    expect(atJunction.map((p) => p.side)).toEqual(["below", "above"]);
    expectClose(atJunction[0]!.width, 50, { rel: 0 });
    expectClose(atJunction[1]!.width, 200, { rel: 0 });
    expectClose(atJunction[0]!.factor / atJunction[1]!.factor, 4, { rel: 1e-12 }, "τ below / τ above = 200/50");
    // τ in the web just below the flange: V·Q/(I·t) with Q = 625 000 mm³ (REFERENCES §1.6 [D]).
    expectClose(atJunction[0]!.factor * 10_000, (10_000 * 625_000) / (113.542e6 * 50), { rel: 1e-5 });
  });
});
