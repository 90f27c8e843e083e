import { describe, expect, test } from "vitest";
import { prepareJob } from "../../../core/check-job.js";
import { designMember } from "../../../core/design-member.js";
import type { JobInput } from "../../../core/schema/job.js";
import { expectClose } from "../../expect-close.js";
import { weldedGirder } from "../connector/connector-jobs.js";

// Welded plate girder of REFERENCES §1.3: q = 752.63 N/mm at the flange–web plane for V = 500 kN [D]
// (a central 1000 kN load on 6 m). EN 1993-1-8 §4.5.3.3 simplified method: F_w,Rd = a·f_u/(√3·β_w·γ_M2),
// with f_u = 430 MPa (S275), β_w = 0.85 (Table 4.1) [M], γ_M2 = 1.25 [V].
const fwRd = (a: number) => (a * 430) / (Math.sqrt(3) * 0.85 * 1.25);

function girder(connector: Record<string, unknown>, P = 1000): JobInput {
  const job = weldedGirder({ kind: "fillet-weld", standard: "EN1993-1-8", ...connector });
  job.beam = { spans: [6], loads: [{ type: "point", category: "dead", P, at: 3 }], selfWeight: false };
  return job;
}

const run = (job: JobInput) => {
  const p = prepareJob(job);
  if (!p.ok) throw new Error(JSON.stringify(p.issues));
  return designMember(p.core);
};

describe("weld schedules", () => {
  test("a continuous 4 mm throat on both sides of the web: utilisation q/(2·F_w,Rd) = 752.63/(2 × 934.5)", () => {
    const weld = run(girder({ throat: 4 })).welds[0]!;
    expectClose(weld.resistance[0]!.value, fwRd(4), { rel: 1e-9 }, "F_w,Rd per fillet");
    expectClose(weld.utilisation, 752.63 / (2 * fwRd(4)), { rel: 1e-4 });
    expect(weld.zones).toEqual([expect.objectContaining({ pattern: "continuous", from: 0, to: 6000 })]);
    expectClose(weld.weldLength, 2 * 6000, { rel: 1e-12 }, "two fillets over the length");
  });

  test("an intermittent weld is zoned: every segment carries its tributary flow, pitches stay within the limits, less weld than continuous", () => {
    const weld = run(girder({ throat: 4, pattern: "intermittent", segmentLength: 40, pitch: 110 })).welds[0]!;
    expect(weld.passes).toBe(true);
    for (const z of weld.zones) {
      expect(z.utilisation).toBeLessThanOrEqual(1 + 1e-9);
      if (z.pattern === "intermittent") {
        expect(z.segmentLength).toBe(40);
        expect(z.pitch! - 40).toBeLessThanOrEqual(75 + 1e-9); // EN 1993-1-8 §4.3.2.2: gap ≤ 0.25·b = 75 mm here [M]
        // Fraction of the line welded must carry q: L_s/p ≥ q/(2·F_w,Rd) = 0.403.
        expect(40 / z.pitch!).toBeGreaterThanOrEqual(752.63 / (2 * fwRd(4)) - 1e-9);
      }
    }
    expect(weld.weldLength).toBeLessThan(2 * 6000 * 0.6);
  });

  test("where even a continuous weld is too weak, the result fails and names the leg size that would do", () => {
    const result = run(girder({ throat: 4 }, 2600));
    const weld = result.welds[0]!;
    const ratio = (2.6 * 752.63) / (2 * fwRd(4));
    expectClose(weld.utilisation, ratio, { rel: 1e-4 });
    // Throat 4 mm ⇒ leg 5.66 mm; the leg needed is 5.66 × ratio, rounded up to the next millimetre.
    expect(weld.sizeNeeded).toBe(Math.ceil(4 * Math.SQRT2 * ratio));
    expect(result.status.failures.join(" ")).toMatch(/a leg of \d+ mm is needed/);
  });
});
