// The units shown (kips for steel, pounds for timber in US units) rescale a number and relabel it together:
// a value shown times what its label means, written out here from the definitions (1 kip = 1000 lbf,
// 1 ksi = 1000 psi [V] AISC 360-16 nomenclature), is the value in the job's units. A scale without its label,
// or a label without its scale, would misstate a force or a stress a thousandfold.
import { readdirSync, readFileSync } from "node:fs";
import { join } from "node:path";
import fc from "fast-check";
import { describe, expect, test } from "vitest";
import { prepareJob } from "../../../core/check-job.js";
import { designMember } from "../../../core/design-member.js";
import { DesignResult } from "../../../core/schema/result.js";
import { toDisplayUnits } from "../../../core/units/convert.js";
import { shownResult } from "../../../core/units/shown-units.js";

const folder = join(import.meta.dirname, "../../../fixtures/examples");
const examples = readdirSync(folder).filter((f) => f.endsWith(".us.json"));
const results = new Map(
  examples.map((f) => {
    const prepared = prepareJob(JSON.parse(readFileSync(join(folder, f), "utf8")));
    if (!prepared.ok) throw new Error(`${f} does not prepare`);
    return [f, { job: prepared.job, result: toDisplayUnits(DesignResult, designMember(prepared.core), "us") }] as const;
  }),
);

/** Pounds-force (or psi, lbf/in, lbf·ft …) in one unit of each label, from the definitions. */
const POUNDS_IN: Record<string, number> = { kips: 1000, ksi: 1000, "kip/in": 1000, "kip/ft": 1000, "kip·ft": 1000, "kip·in²": 1000, lb: 1, "lb/in": 1, "lb/ft": 1, "lb·ft": 1, "lb·in²": 1, psi: 1, lbf: 1, in: 1, ft: 1, "in⁴": 1, "in³": 1, "in²": 1 };

describe("shown units: scale and label go together", () => {
  test("property: every check, resistance, shear and moment shown × its label's meaning = the job-unit value, whatever the materials (fast-check, fixed seed)", () => {
    fc.assert(
      fc.property(fc.constantFrom(...examples), fc.constantFrom("as-is", "all-steel", "all-timber"), (file, families) => {
        const { job, result } = results.get(file)!;
        const materials = job.materials.map((m) => ({ id: m.id, family: families === "as-is" ? m.family : families === "all-steel" ? "steel" : "sawn-timber" }));
        const shown = shownResult(result, materials);
        const same = (original: number, value: number, label: string | undefined) => {
          expect(POUNDS_IN[label ?? ""], `a label with no meaning: ${label}`).toBeDefined();
          expect(value * POUNDS_IN[label!]!).toBeCloseTo(original, 6);
        };
        result.checks.forEach((k, i) => {
          if (k.quantity === "ratio") return;
          const labels = shown.labels(shown.owners.check(k));
          same(k.demand, shown.result.checks[i]!.demand, labels[k.quantity]);
          same(k.capacity, shown.result.checks[i]!.capacity, labels[k.quantity]);
        });
        result.schedules.forEach((s, i) => {
          const labels = shown.labels(shown.owners.joint(s.joint));
          same(s.resistance[0]!.value, shown.result.schedules[i]!.resistance[0]!.value, labels.connectorForce);
          s.shearFlow.forEach((q, k) => same(q ?? 0, shown.result.schedules[i]!.shearFlow[k] ?? 0, labels.shearFlow));
        });
        result.welds.forEach((w, i) => same(w.maxShearFlow, shown.result.welds[i]!.maxShearFlow, shown.labels(shown.owners.joint(w.joint)).shearFlow));
        result.beam.perCombination.forEach((p, i) => {
          same(p.maxShear.value, shown.result.beam.perCombination[i]!.maxShear.value, shown.result.unitLabels.force);
          same(p.maxMoment.value, shown.result.beam.perCombination[i]!.maxMoment.value, shown.result.unitLabels.moment);
        });
        // Steel in kips when every material is steel; never kips for a member with timber in it.
        if (families === "all-steel") expect(shown.result.unitLabels.force).toBe("kips");
        if (families === "all-timber") expect(shown.result.unitLabels.force).toBe("lb");
      }),
      { numRuns: 40 },
    );
  });
});
