import { describe, expect, test } from "vitest";
import { GlueLine, glueKind } from "../../../core/connector/glue-line.js";
import { RatedConnector, ratedKind } from "../../../core/connector/rated.js";
import { expectClose } from "../../expect-close.js";
import { context, ec5Timber, member } from "./contexts.js";

const c24 = ec5Timber(350, 420);
const at = (options: Parameters<typeof context>[2]) => context(member("a", c24, 50, 100), member("b", c24, 50, 100), options);

describe("ratedKind: the user's rating on its basis", () => {
  const rated = (fields: Record<string, unknown>) => RatedConnector.parse({ id: "r", kind: "rated", label: "screw", resistance: 1000, minSpacing: 50, ...fields });

  test("a characteristic rating becomes k_mod R_k/γ_M: 0.8 × 1000/1.3 = 615.38 N [D] (EN 1995-1-1 §2.4.3 [M])", () => {
    const r = ratedKind.resistance(rated({ resistanceBasis: "characteristic", partialFactor: 1.3, modificationFactor: 0.8 }), at({ basis: "factored" }));
    expectClose(r.value, 615.385, { rel: 1e-5 });
    expect(r.steps.map((s) => s.symbol)).toEqual(["R_k", "k_mod", "γ_M", "R_d"]);
  });
  test("a slip modulus given is carried with K_u = 2/3 K_ser unless given", () => {
    expect(ratedKind.resistance(rated({ slipModulus: 900 }), at({})).slip).toMatchObject({ serviceability: 900, ultimate: 600 });
    expect(ratedKind.resistance(rated({ slipModulus: 900, ultimateSlipModulus: 700 }), at({})).slip).toMatchObject({ ultimate: 700 });
  });
  test("a rating on another basis than the job's is refused with its field", () => {
    expect(ratedKind.problems!(rated({ resistanceBasis: "allowable" }), at({ basis: "factored" }))[0]).toMatchObject({ field: "resistanceBasis" });
    expect(ratedKind.problems!(rated({ resistanceBasis: "design" }), at({ basis: "allowable" }))[0]).toMatchObject({ field: "resistanceBasis" });
    expect(ratedKind.problems!(rated({}), at({ basis: "factored" }))).toEqual([]);
  });
  test("a characteristic rating needs its partial factor", () => {
    const r = RatedConnector.safeParse({ id: "r", kind: "rated", label: "x", resistance: 1000, minSpacing: 50, resistanceBasis: "characteristic" });
    expect(r.error!.issues[0]!.path).toEqual(["partialFactor"]);
  });
});

describe("glueKind: the weaker of the adhesive and the adherends, rolling shear where cross-layers meet", () => {
  test("the adherend's shear strength governs when lower than the adhesive's", () => {
    const s = glueKind.shearStrength(GlueLine.parse({ id: "g", kind: "glue", label: "PRF", shearStrength: 6 }), at({ adherends: [{ material: "GL24h", shearStrength: 2.24, rollingShear: undefined }] }));
    expect(s.value).toBe(2.24);
    expect(s.governing).toBe("adherend GL24h");
  });
  test("a panel with a rolling shear strength is checked in rolling shear (glulam rolling shear 1.2 MPa characteristic [M])", () => {
    const s = glueKind.shearStrength(GlueLine.parse({ id: "g", kind: "glue", label: "PUR" }), at({ adherends: [{ material: "LVL", shearStrength: 3.5, rollingShear: 1.2 }, { material: "C24", shearStrength: 4.0, rollingShear: undefined }] }));
    expect(s.value).toBe(1.2);
    expect(s.governing).toBe("rolling shear in LVL");
  });
  test("with no strength anywhere the glue line is refused", () => {
    expect(glueKind.problems!(GlueLine.parse({ id: "g", kind: "glue", label: "PUR" }), at({ adherends: [{ material: "C24", shearStrength: undefined, rollingShear: undefined }] }))[0]).toMatchObject({ field: "shearStrength" });
  });
});
