import { describe, expect, test } from "vitest";
import { prepareJob } from "../../../core/check-job.js";
import { designMember } from "../../../core/design-member.js";
import type { JobInput } from "../../../core/schema/job.js";
import { expectClose } from "../../expect-close.js";

// Hand calculation: n equal plies deflect together, so each takes 1/n of the load (share by E·I [D]).
// A load w hung on the left face arrives on ply 1; interface k must pass the shares of the plies beyond
// it: (n − k)/n · w. Three plies: 2/3 w and 1/3 w. Four plies: 3/4, 1/2, 1/4 w.
function plies(n: number, loads: JobInput["beam"]["loads"], flitch = false): JobInput {
  return {
    format: "stitchplan-job",
    version: 1,
    units: "us",
    basis: "allowable",
    project: { name: "Multi-ply test" },
    member: { mark: "H-1" },
    materials: [
      { id: "SPF", name: "SPF No. 2", E: 1_400_000, density: 0 },
      { id: "STEEL", name: "Flitch plate", E: 29_000_000, density: 0 },
    ],
    parts: Array.from({ length: n }, (_, i) => {
      const steel = flitch && i === 1;
      return { id: `p${i + 1}`, material: steel ? "STEEL" : "SPF", shape: steel ? { type: "rectangle" as const, b: 0.5, h: 9.25 } : { type: "lumber" as const, nominal: "2x10", orientation: "edge" as const }, ...(i === 0 ? { x: 0, y: 0 } : { place: { on: `p${i}`, side: "right" as const } }) };
    }),
    connectors: [{ id: "N", kind: "rated", label: "nail rated 100 lbf", resistance: 100, minSpacing: 2, maxSpacing: 24 }],
    fastening: { default: { connector: "N", rows: 2 } },
    beam: { spans: [10], loads, selfWeight: false },
    spacing: { module: 0.25, minZoneLength: 12, maxZonesPerSpan: 5, symmetric: true },
  };
}

const run = (job: JobInput) => {
  const p = prepareJob(job);
  if (!p.ok) throw new Error(JSON.stringify(p.issues));
  return designMember(p.core);
};
const lbfPerIn = 25.4 / 4.4482216152605;

describe("side-by-side plies loaded from one face", () => {
  test("three equal plies, 120 lbf/ft on the left face: the interfaces pass 2/3 and 1/3 of it, and the spacing follows n·R/T", () => {
    const result = run(plies(3, [{ type: "uniform", w: 120, face: "left" }]));
    expect(result.multiPly!.plies.map((p) => p.share)).toEqual([1 / 3, 1 / 3, 1 / 3].map((x) => expect.closeTo(x, 12)));
    const byJoint = new Map(result.schedules.map((s) => [s.joint, s]));
    const [first, second] = result.multiPly!.interfaces;
    expectClose(first!.fromLeftFace, 2 / 3, { rel: 1e-12 });
    expectClose(second!.fromLeftFace, 1 / 3, { rel: 1e-12 });
    const w = 120 / 12; // lbf/in
    const t1 = Math.max(...byJoint.get(first!.joint!)!.shearFlow) * lbfPerIn;
    const t2 = Math.max(...byJoint.get(second!.joint!)!.shearFlow) * lbfPerIn;
    expectClose(t1, (2 / 3) * w, { rel: 1e-9 }, "interface 1, lbf/in");
    expectClose(t2, (1 / 3) * w, { rel: 1e-9 }, "interface 2, lbf/in");
    // Required spacing with 2 nails per row at 100 lbf: s = 2 × 100 / T.
    const s1 = byJoint.get(first!.joint!)!.requiredSpacing.find((v) => v !== null)! / 25.4;
    expectClose(s1, 200 / ((2 / 3) * w), { rel: 1e-9 }, "s at interface 1, in");
    expect(result.joints.every((j) => j.demand === "side-load")).toBe(true);
  });

  test("four equal plies loaded on both faces: the middle interface passes nothing, the outer ones ½ (hand calculation [D])", () => {
    const result = run(plies(4, [{ type: "uniform", w: 120, face: "left" }, { type: "uniform", w: 120, face: "right" }]));
    const flows = result.multiPly!.interfaces.map((i) => Math.max(...result.schedules.find((s) => s.joint === i.joint)!.shearFlow) * lbfPerIn);
    expectClose(flows[0]!, 0.5 * 10, { rel: 1e-9 });
    expectClose(flows[1]!, 0, { abs: 1e-9 });
    expectClose(flows[2]!, 0.5 * 10, { rel: 1e-9 });
  });

  test("a steel flitch between two 2x10s takes most of a top load, so the timber plies pass theirs across by the stiffness shares", () => {
    const result = run(plies(3, [{ type: "uniform", w: 120 }], true));
    // E·I: 2x10 = 1.4e6 × 1.5 × 9.25³/12; plate = 29e6 × 0.5 × 9.25³/12 ⇒ shares ∝ 2.1 : 14.5 : 2.1 (the depth cancels).
    const timber = 1.4e6 * 1.5;
    const steel = 29e6 * 0.5;
    const share = timber / (2 * timber + steel);
    expectClose(result.multiPly!.plies[0]!.share, share, { rel: 1e-12 });
    // On top, the load bears by thickness: ply 1 receives 1.5/3.5 of it and keeps `share`; the rest crosses interface 1.
    expectClose(result.multiPly!.interfaces[0]!.fromTop, 1.5 / 3.5 - share, { rel: 1e-12 });
  });

  test("a concentrated load hung on a face is carried by the connectors within half the depth each side of it", () => {
    const result = run(plies(3, [{ type: "point", P: 900, at: 5, face: "left" }]));
    const s = result.schedules.find((x) => x.joint === result.multiPly!.interfaces[0]!.joint)!;
    // 2/3 of 900 lbf spread over the depth 9.25 in: 64.86 lbf/in, only within 4.625 in of the load.
    expectClose(Math.max(...s.shearFlow) * lbfPerIn, ((2 / 3) * 900) / 9.25, { rel: 1e-9 });
    const within = s.positions.filter((x) => Math.abs(x - 1524) <= (9.25 * 25.4) / 2 + 1e-9).length;
    expect(within * 2 * 100).toBeGreaterThanOrEqual((2 / 3) * 900 - 1e-6);
    expect(s.passes).toBe(true);
    // 1500 lbf needs 1000 lbf across interface 1 within 9.25 in: rows of two 100 lbf nails at the 2 in minimum cannot.
    const heavy = run(plies(3, [{ type: "point", P: 1500, at: 5, face: "left" }]));
    expect(heavy.schedules.find((x) => x.joint === heavy.multiPly!.interfaces[0]!.joint)!.infeasible).not.toBeNull();
  });

  // 16d common nail: L = 3.5 in, D = 0.162 in (REFERENCES §10, §5.3 [V]); least penetration 6D = 0.972 in
  // (NDS, REFERENCES §10 [M]); 2x plies 1.5 in thick (PS 20 [V]). From an outer face a nail reaches interface k
  // after k plies: interface 1 needs 1.5 + 0.972 = 2.472 in ≤ 3.5 in; the middle interface of four plies
  // needs 3.0 + 0.972 = 3.972 in > 3.5 in from either face [D].
  const nailed = (n: number): JobInput => {
    const job = plies(n, [{ type: "uniform", w: 120, face: "left" }]);
    job.materials[0] = { ...job.materials[0]!, family: "sawn-timber", specificGravity: 0.42 };
    job.connectors = [{ id: "N", kind: "nail", standard: "NDS-2018", size: "16d common", sideAngleToGrainDeg: 90, mainAngleToGrainDeg: 90 }];
    return job;
  };

  test("face-driven nails reach every interface of three plies from one face or the other", () => {
    const result = run(nailed(3));
    for (const s of result.schedules) expect(s.detailingProblems, s.joint).toEqual([]);
  });

  test("16d nails cannot reach the middle interface of four 2x plies from either face: that joint fails and says why [D]", () => {
    const result = run(nailed(4));
    const middle = result.multiPly!.interfaces[1]!.joint!;
    const s = result.schedules.find((x) => x.joint === middle)!;
    expect(s.passes).toBe(false);
    expect(s.detailingProblems.join(" ")).toContain("does not reach interface 2");
    // In the job's units: the nail's 3.5 in against the 3.972 in it would need.
    expect(s.detailingProblems.join(" ")).toContain("3.5 in long");
    expect(s.detailingProblems.join(" ")).toContain("needs 3.972 in");
    expect(result.status.passes).toBe(false);
    for (const k of [0, 2]) expect(result.schedules.find((x) => x.joint === result.multiPly!.interfaces[k]!.joint)!.detailingProblems).toEqual([]);
  });

  test("a face load on a section that is not side-by-side plies is refused at the field", () => {
    const job = plies(3, [{ type: "uniform", w: 120, face: "left" }]);
    job.parts[2] = { id: "p3", material: "SPF", shape: { type: "lumber", nominal: "2x6", orientation: "flat" }, place: { on: "p2", side: "top" } };
    const p = prepareJob(job);
    expect(p.ok).toBe(false);
    if (!p.ok) expect(p.issues.map((i) => i.path)).toContain("beam.loads[0].face");
  });
});
