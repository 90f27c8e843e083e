import { analyseMember, type BeamAnalysis } from "../../../core/beam/analyse-beam.js";
import type { SupportCondition } from "../../../core/beam/beam-model.js";
import { Beam, type Load } from "../../../core/schema/beam.js";
import type { Combination } from "../../../core/schema/result.js";

/** A beam in core units (mm, N, N/mm, N·mm), written as the job schema writes it. */
export function coreBeam(spans: number[], supports: SupportCondition[] | undefined, loads: Partial<Load>[], extra: Record<string, unknown> = {}): Beam {
  return Beam.parse({ spans, ...(supports ? { supports } : {}), loads, selfWeight: false, ...extra });
}

/** Every load as entered (factor 1), one combination. */
export const asEntered = (categories: string[] = ["dead", "live"]): Combination => ({
  id: "U",
  name: "as entered",
  factors: Object.fromEntries(categories.map((c) => [c, 1])),
  duration: "unspecified",
  categories,
});

export function analyse(beam: Beam, combinations: Combination[] = [asEntered()], flexuralRigidity = 1e12): BeamAnalysis {
  return analyseMember({ beam, combinations, selfWeight: 0, flexuralRigidity, serviceLoads: true });
}
