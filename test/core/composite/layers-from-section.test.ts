import { describe, expect, test } from "vitest";
import { jointedResponse } from "../../../core/composite/gamma-method.js";
import { layersFromSection } from "../../../core/composite/layers-from-section.js";
import { expectClose } from "../../expect-close.js";
import { material, rect, sectionOf } from "../../section-builders.js";

// Section properties by closed form, REFERENCES §1 (Gere & Goodno, Mechanics of Materials ch. 5) [D] unless noted;
// at γ = 1 the layers must give back E·I of the whole section.
const layered = (parts: Parameters<typeof sectionOf>[0], materials = [material("M", 11_000)]) => {
  const { section } = sectionOf(parts, materials);
  return layersFromSection(section);
};
const rigidEI = (r: ReturnType<typeof layersFromSection>) => {
  if (!r.covered) throw new Error(r.reason);
  return jointedResponse(r.section, { top: 1, bottom: 1 }).effectiveStiffness;
};

describe("layersFromSection: sections Annex B covers", () => {
  test("nailed I of REFERENCES §6.6 (120×45 flanges, 45×200 web): three layers, E·I = 2.132790e12 N·mm² [D]", () => {
    const r = layered([rect("bf", 120, 45, 0, 0), rect("web", 45, 200, 37.5, 45), rect("tf", 120, 45, 0, 245)]);
    expect(r.covered).toBe(true);
    if (!r.covered) return;
    expect(r.parts).toEqual({ web: ["web"], top: ["tf"], bottom: ["bf"] });
    expect(r.jointLines.top!.map((l) => l.level)).toEqual([245]);
    expectClose(rigidEI(r), 2.132790e12, { rel: 1e-6 });
  });

  test("four-plank box of Gere 7e Prob. 5.11-4: the two webs act as one layer b_2 = 100 mm; I = 411.125e6 mm⁴ (REFERENCES §1.7 [V])", () => {
    const r = layered([rect("bf", 260, 25, 0, 0), rect("w1", 50, 260, 0, 25), rect("w2", 50, 260, 210, 25), rect("tf", 260, 25, 0, 285)]);
    if (!r.covered) throw new Error(r.reason);
    expect(r.parts.web).toEqual(["w1", "w2"]);
    expect(r.section.web.width).toBe(100);
    expectClose(rigidEI(r), 11_000 * 411.125e6, { rel: 1e-9 });
  });

  test("box with plywood webs nailed to the sides of the flanges: flanges beside the web, joints on vertical planes", () => {
    const r = layered(
      [rect("w1", 15, 300, 0, 0, "P"), rect("bf", 90, 45, 15, 0), rect("tf", 90, 45, 15, 255), rect("w2", 15, 300, 105, 0, "P")],
      [material("M", 11_000), material("P", 9000)],
    );
    if (!r.covered) throw new Error(r.reason);
    expect(r.parts.web).toEqual(["w1", "w2"]);
    expect(r.jointLines.top!.every((l) => l.orientation === "vertical")).toBe(true);
    // Parallel-axis theorem [D].
    expectClose(rigidEI(r), 9000 * 30 * 300 ** 3 / 12 + 2 * 11_000 * (90 * 45 ** 3 / 12 + 90 * 45 * 127.5 ** 2), { rel: 1e-12 });
  });

  test("tee, web 50×200 under a 200×50 flange: two layers, the deeper is the web; I = 113.542e6 mm⁴ (REFERENCES §1.6 [D])", () => {
    const r = layered([rect("web", 50, 200, 75, 0), rect("flange", 200, 50, 0, 200)]);
    if (!r.covered) throw new Error(r.reason);
    expect(r.parts).toEqual({ web: ["web"], top: ["flange"] });
    expectClose(rigidEI(r), 11_000 * 113.542e6, { rel: 1e-5 });
  });

  test("three stacked 100×40 laminations: the middle is the web; I = 14.4e6 mm⁴ (REFERENCES §1.9 [D])", () => {
    const r = layered([rect("a", 100, 40, 0, 0), rect("b", 100, 40, 0, 40), rect("c", 100, 40, 0, 80)]);
    if (!r.covered) throw new Error(r.reason);
    expect(r.parts).toEqual({ web: ["b"], top: ["c"], bottom: ["a"] });
    expectClose(rigidEI(r), 11_000 * 14.4e6, { rel: 1e-9 });
  });

  test("two stacked 100×50 boards: equally deep, the lower is the web; I = 8.3333e6 mm⁴ (REFERENCES §1.8 [D])", () => {
    const r = layered([rect("a", 100, 50, 0, 0), rect("b", 100, 50, 0, 50)]);
    if (!r.covered) throw new Error(r.reason);
    expect(r.parts).toEqual({ web: ["a"], top: ["b"] });
    expectClose(rigidEI(r), 11_000 * 8.3333e6, { rel: 1e-5 });
  });
});

describe("layersFromSection: sections it says it does not cover", () => {
  test("one part", () => {
    const r = layered([rect("a", 100, 200, 0, 0)]);
    expect(r).toEqual({ covered: false, reason: expect.stringMatching(/one part/) });
  });

  test("side-by-side plies of one depth: a multi-ply member", () => {
    const r = layered([rect("a", 38, 286, 0, 0), rect("b", 38, 286, 38, 0), rect("c", 38, 286, 76, 0)]);
    expect(r).toEqual({ covered: false, reason: expect.stringMatching(/multi-ply/) });
  });

  test("four stacked laminations", () => {
    const r = layered([0, 1, 2, 3].map((k) => rect(`l${k}`, 100, 30, 0, 30 * k)));
    expect(r).toEqual({ covered: false, reason: expect.stringMatching(/4 layers/) });
  });

  test("two moduli at one level", () => {
    const r = layered(
      [rect("bf", 120, 45, 0, 0), rect("w1", 20, 200, 0, 45), rect("w2", 20, 200, 100, 45, "S"), rect("tf", 120, 45, 0, 245)],
      [material("M", 11_000), material("S", 200_000)],
    );
    expect(r).toEqual({ covered: false, reason: expect.stringMatching(/different moduli/) });
  });

  test("a shaped part (rolled I) inside a layer", () => {
    const { section } = sectionOf([
      { id: "i", name: "i", material: "M", shape: { type: "i-section", d: 200, bf: 100, tf: 10, tw: 6 }, x: 0, y: 0 },
      rect("cap", 100, 40, 0, 200),
    ] as Parameters<typeof sectionOf>[0], [material("M", 11_000)]);
    const r = layersFromSection(section);
    expect(r).toEqual({ covered: false, reason: expect.stringMatching(/not a full-depth rectangle/) });
  });
});
