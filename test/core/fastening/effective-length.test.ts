import { describe, expect, test } from "vitest";
import { prepareJob } from "../../../core/check-job.js";
import { designMember } from "../../../core/design-member.js";
import type { JobInput } from "../../../core/schema/job.js";
import { expectClose } from "../../expect-close.js";
import { clone, nailedIJob } from "../../job-builders.js";

// EN 1995-1-1 Annex B [M]: γ_i = 1/(1 + π² E_i A_i s_i/(K_i l²)) (B.5), derived for a simply supported span l;
// the Annex's note: continuous beams l = 0.8 × the span, cantilevers l = 2 × the cantilever length [M].
// A span with a fixed end is read as continuous (the kind's stated reading). The member is the REFERENCES
// §6.6 nailed I: flange A = 120 × 45 = 5400 mm², E = 11 000 MPa, s = 50 mm, K_ser = 709.32 N/mm.
const gamma = (l: number) => 1 / (1 + (Math.PI ** 2 * 11_000 * 5400 * 50) / (709.32 * l ** 2));

function supported(spans: number[], supports: JobInput["beam"]["supports"]): JobInput {
  const job = clone(nailedIJob("slip-aware"));
  job.beam = { ...job.beam, spans, supports };
  const total = spans.reduce((a, b) => a + b, 0);
  job.fastening.default = { ...job.fastening.default, provided: { type: "zones", zones: [{ from: 0, to: total, spacing: 50 }] } };
  return job;
}

const composite = (job: JobInput) => {
  const p = prepareJob(job);
  if (!p.ok) throw new Error(JSON.stringify(p.issues));
  const r = designMember(p.core);
  return { c: r.composite!, assumptions: r.assumptions };
};

describe("γ-method effective length by support condition (EN 1995-1-1 Annex B)", () => {
  test("simply supported 5 m: l = 5000 mm, γ = 0.376931 [D]", () => {
    const { c, assumptions } = composite(supported([5], ["pinned", "roller"]));
    expect(c.effectiveLength).toBe(5000);
    expect(c.effectiveLengthRule).toMatch(/simply supported/);
    expectClose(c.joints[0]!.gammaServiceability, gamma(5000), { rel: 1e-9 });
    expectClose(gamma(5000), 0.376931, { rel: 1e-5 });
    expect(assumptions.join(" ")).toContain("l = 5 m used in γ");
  });
  test("fixed at both ends, 5 m: not labelled simply supported; l = 0.8 × 5000 = 4000 mm, γ = 0.279110 [D]", () => {
    const { c, assumptions } = composite(supported([5], ["fixed", "fixed"]));
    expect(c.effectiveLength).toBe(4000);
    expect(c.effectiveLengthRule).not.toMatch(/simply supported\)/);
    expect(c.effectiveLengthRule).toMatch(/fixed end/);
    expectClose(c.joints[0]!.gammaServiceability, gamma(4000), { rel: 1e-9 });
    expectClose(gamma(4000), 0.27911, { rel: 1e-5 });
    expect(assumptions.join(" ")).toContain("l = 4 m used in γ");
  });
  test("fixed at one end and pinned at the other: also l = 0.8 × span", () => {
    expect(composite(supported([5], ["fixed", "roller"])).c.effectiveLength).toBe(4000);
  });
  test("two continuous spans of 4 and 5 m: l = 0.8 × 5000 = 4000 mm", () => {
    const { c } = composite(supported([4, 5], ["pinned", "roller", "roller"]));
    expect(c.effectiveLength).toBe(4000);
    expect(c.effectiveLengthRule).toMatch(/continuous/);
  });
  test("a 2 m cantilever: l = 2 × 2000 = 4000 mm", () => {
    const { c } = composite(supported([2], ["fixed", "free"]));
    expect(c.effectiveLength).toBe(4000);
    expect(c.effectiveLengthRule).toMatch(/cantilever/);
  });
});
