import type { DesignResult } from "../../../core/schema/result.js";

/**
 * What a joint's connectors carry, in the words a reviewer expects: the shear flow q = V·Q/I along a
 * joint plane, or, between side-by-side plies, the force a load on one face passes across the interface.
 */
export const isSideLoad = (result: Pick<DesignResult, "joints">, joint: string) => result.joints.find((j) => j.id === joint)?.demand === "side-load";

/** "shear flow" or "force passed across the interface", for a caption or a sentence. */
export const demandName = (result: Pick<DesignResult, "joints">, joint: string) => (isSideLoad(result, joint) ? "force passed across the interface" : "shear flow");

/** The symbol used for the demand per length in formulas beside it. */
export const demandSymbol = (result: Pick<DesignResult, "joints">, joint: string) => (isSideLoad(result, joint) ? "f" : "q");

/** A part as a person named it, or its id. */
export const partName = (result: Pick<DesignResult, "section">, id: string) => {
  const part = result.section.parts.find((p) => p.id === id);
  return part?.name || id;
};
