import type { DesignResult } from "../schema/result.js";
import { extremeFibre, firstMomentAbove, widthAt, type SectionModel } from "./section-model.js";
import type { stressProfile } from "./stress-profile.js";

/** The section part of the result: properties, parts, the τ profile, material moduli and the shear-stress summary. */
export function sectionResult(section: SectionModel, profile: ReturnType<typeof stressProfile>): DesignResult["section"] {
  const { bounds } = section;
  return {
    referenceModulus: section.referenceModulus,
    area: section.area,
    transformedArea: section.transformedArea,
    centroidY: section.centroidY,
    secondMoment: section.secondMoment,
    depth: bounds.y1 - bounds.y0,
    width: bounds.x1 - bounds.x0,
    bounds,
    firstMomentAtNeutralAxis: Math.abs(firstMomentAbove(section, section.centroidY)),
    widthAtNeutralAxis: widthAt(section, section.centroidY, "at") || widthAt(section, section.centroidY, "above"),
    parts: section.parts.map((p) => {
      const f = extremeFibre(section, p);
      return { id: p.id, name: p.name, material: p.material.id, materialName: p.material.name, modularRatio: p.n, area: p.area, rects: p.rects, topFibre: f.top, bottomFibre: f.bottom };
    }),
    stressProfile: profile.map(({ y, firstMoment, width, factor }) => ({ y, firstMoment, width, factor })),
    materialModuli: materialModuli(section),
    shearStress: shearStressSummary(section, profile),
  };
}

function materialModuli(section: SectionModel): DesignResult["section"]["materialModuli"] {
  const byMaterial = new Map<string, SectionModel["parts"]>();
  for (const p of section.parts) byMaterial.set(p.material.id, [...(byMaterial.get(p.material.id) ?? []), p]);
  return [...byMaterial.values()].map((parts) => {
    const first = parts[0]!;
    const top = Math.max(...parts.flatMap((p) => p.rects.map((r) => r.y1))) - section.centroidY;
    const bottom = section.centroidY - Math.min(...parts.flatMap((p) => p.rects.map((r) => r.y0)));
    const modulus = (c: number) => (c > 0 ? section.secondMoment / (first.n * c) : null);
    return { material: first.material.id, name: first.material.name, modularRatio: first.n, topFibre: top, bottomFibre: bottom, topModulus: modulus(top), bottomModulus: modulus(bottom) };
  });
}

function shearStressSummary(section: SectionModel, profile: ReturnType<typeof stressProfile>): DesignResult["section"]["shearStress"] {
  const peak = profile.reduce((a, b) => (b.factor > a.factor ? b : a));
  const single = section.parts.length === 1 && section.parts[0]!.rects.length === 1;
  const webApproximations = section.parts.flatMap((p) => {
    const rects = [...p.rects].sort((a, b) => a.y0 - b.y0);
    const web = rects[1];
    if (rects.length !== 3 || !web) return [];
    const d = rects[2]!.y1 - rects[0]!.y0;
    const tw = web.x1 - web.x0;
    const hw = web.y1 - web.y0;
    return [
      { part: p.id, label: "V/(d·t_w), AISC 360 §G2.1 shear area", factor: 1 / (d * tw) },
      { part: p.id, label: "V/(h_w·t_w), web between flanges", factor: 1 / (hw * tw) },
    ];
  });
  return { maxFactor: peak.factor, atY: peak.y, rectangleClosedForm: single ? 1.5 / section.area : null, webApproximations };
}
