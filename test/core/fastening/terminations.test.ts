import { describe, expect, test } from "vitest";
import { prepareJob } from "../../../core/check-job.js";
import { designMember } from "../../../core/design-member.js";
import type { JobInput } from "../../../core/schema/job.js";
import { expectClose } from "../../expect-close.js";

// W18x50 (three rectangles, fillets ignored; dimensions REFERENCES §2.2 [V]) with an 8 × 1/2 in bottom
// cover plate over the middle half of a 26 ft span, UDL w. Hand calculation in inches and pounds:
const d = 17.99;
const bf = 7.495;
const tf = 0.57;
const tw = 0.355;
const hw = d - 2 * tf;
const IW = (bf * d ** 3 - (bf - tw) * hw ** 3) / 12; // 789.97 in⁴ (REFERENCES §2.2 [D])
const bp = 8;
const tp = 0.5;
const Ap = bp * tp;
const AW = 2 * bf * tf + tw * hw;
const yW = tp + d / 2; // the beam sits on the plate
const yP = tp / 2;
const yFull = (AW * yW + Ap * yP) / (AW + Ap);
const IFull = IW + AW * (yW - yFull) ** 2 + (bp * tp ** 3) / 12 + Ap * (yFull - yP) ** 2; // parallel-axis theorem
const Qp = Ap * (yFull - yP);
const fb = 30_000; // psi, the job's allowable bending stress for both parts (demo value)
const L = 26 * 12;
const w = 3000 / 12; // lbf/in

function coverPlated(extent: { from: number; to: number } | null): JobInput {
  return {
    format: "stitchplan-job",
    version: 1,
    units: "us",
    basis: "allowable",
    project: { name: "Cover plate test" },
    member: { mark: "CP-1" },
    materials: [{ id: "S", name: "steel", family: "steel", E: 29_000_000, density: 0, yieldStrength: 50_000, tensileStrength: 65_000, strength: { bending: fb } }],
    parts: [
      { id: "plate", material: "S", shape: { type: "rectangle", b: bp, h: tp }, x: (bf - bp) / 2, y: 0, ...(extent ? { extent } : {}) },
      { id: "beam", material: "S", shape: { type: "i-section", d, tw, bf, tf }, x: 0, y: tp },
    ],
    connectors: [{ id: "B", kind: "rated", label: "3/4 in bolt, rated 8 kip", resistance: 8000, minSpacing: 3, maxSpacing: 12, endDistance: 1.5 }],
    fastening: { default: { connector: "B", rows: 2 } },
    beam: { spans: [26], loads: [{ type: "uniform", w: 3000 }], selfWeight: false },
    spacing: { module: 0.5, minZoneLength: 12, maxZonesPerSpan: 5, symmetric: true },
  };
}

const run = (job: JobInput) => {
  const p = prepareJob(job);
  if (!p.ok) throw new Error(JSON.stringify(p.issues));
  return designMember(p.core);
};

describe("parts that run over part of the member (cover plates)", () => {
  test("a plate over the whole span gives the same result as a plate with no extent", () => {
    const a = run(coverPlated(null));
    const b = run(coverPlated({ from: 0, to: 26 }));
    expect(b.stretches).toEqual([]);
    expect(b.schedules.map((s) => s.count)).toEqual(a.schedules.map((s) => s.count));
    expect(b.section.secondMoment).toBe(a.section.secondMoment);
    expect(b.terminations).toEqual([]);
  });

  test("over the middle half: the joint runs only there, its rows stay on the plate, and I steps at the plate's ends", () => {
    const result = run(coverPlated({ from: 6.5, to: 19.5 }));
    expect(result.stretches.map((s) => [s.from / 304.8, s.to / 304.8])).toEqual([[0, 6.5], [6.5, 19.5], [19.5, 26]].map(([x, y]) => [expect.closeTo(x!, 9), expect.closeTo(y!, 9)]));
    expectClose(result.stretches[0]!.secondMoment / 25.4 ** 4, IW, { rel: 1e-9 }, "I of the W alone");
    expectClose(result.stretches[1]!.secondMoment / 25.4 ** 4, IFull, { rel: 1e-9 }, "I with the plate");
    const s = result.schedules[0]!;
    expect(s.positions.every((x) => x >= 6.5 * 304.8 - 1e-6 && x <= 19.5 * 304.8 + 1e-6)).toBe(true);
    expectClose(s.positions[0]!, 6.5 * 304.8 + 1.5 * 25.4, { rel: 1e-9 }, "first row at the end distance from the plate's end");
    expect(result.joints[0]!.extent).not.toBeNull();
  });

  test("the termination: cut-off where w·x(L − x)/2 = f_b·I_W/(d/2), and the plate force M·Q_p/I there (AISC 360-16 §F13.3 [M]; hand calculation [D])", () => {
    const result = run(coverPlated({ from: 6.5, to: 19.5 }));
    const mCap = (fb * IW) / (d / 2);
    const xc = L / 2 - Math.sqrt(L ** 2 / 4 - (2 * mCap) / w);
    const force = ((w * xc * (L - xc)) / 2) * (Qp / IFull);
    const left = result.terminations.find((t) => t.end === "left")!;
    expectClose(left.cutoff! / 25.4, xc, { rel: 1e-6 }, "cut-off, in");
    expectClose(left.force / 4.4482216152605, force, { rel: 1e-6 }, "plate force, lbf");
    const rows = result.schedules[0]!.positions.filter((x) => x >= 6.5 * 304.8 - 1e-6 && x <= left.cutoff! + 1e-6).length;
    expectClose(left.capacity / 4.4482216152605, rows * 2 * 8000, { rel: 1e-9 }, "rows between the end and the cut-off × 2 bolts × 8 kip");
    expect(left.passes).toBe(left.force <= left.capacity);
    expect(result.terminations).toHaveLength(2);
    // Design mode adds rows near the plate's ends until those between each end and its cut-off develop the force.
    expect(result.terminations.every((t) => t.passes)).toBe(true);
  });

  test("a plate too short for the moment is reported at its end, in red", () => {
    const result = run(coverPlated({ from: 11, to: 15 }));
    const left = result.terminations.find((t) => t.end === "left")!;
    expect(left.passes).toBe(false);
    expect(left.note).toMatch(/over its bending strength at the part's end/);
    expect(result.status.passes).toBe(false);
  });

  test("a part that starts beyond the member's end is refused at its field", () => {
    const p = prepareJob(coverPlated({ from: 6.5, to: 30 }));
    expect(p.ok).toBe(false);
    if (!p.ok) expect(p.issues.map((i) => i.path)).toContain("parts[0].extent.to");
  });
});
