import { describe, expect, test } from "vitest";
import { ownerOfFamilies, resultOwners, shownLabels, shownUnit, shownValue } from "../../../core/units/shown-units.js";

describe("shownUnit: US steel in kips and ksi, timber in pounds and psi, SI as it is", () => {
  test("a kip is 1000 lbf and a ksi 1000 psi [V] (AISC 360-16, Symbols and Nomenclature: kip, ksi)", () => {
    expect(shownValue(9492, "connectorForce", "us", "steel")).toBeCloseTo(9.492, 12);
    expect(shownValue(44149, "stress", "us", "steel")).toBeCloseTo(44.149, 12);
    expect(shownValue(747.3, "shearFlow", "us", "steel")).toBeCloseTo(0.7473, 12);
    expect(shownValue(354155, "moment", "us", "steel")).toBeCloseTo(354.155, 12);
    expect(shownUnit("shearFlow", "us", "steel").label).toBe("kip/in");
    expect(shownUnit("stress", "us", "steel").label).toBe("ksi");
    expect(shownUnit("force", "us", "steel").label).toBe("kips");
  });

  test("timber keeps pounds and psi (NDS practice), written lb, lb/in", () => {
    expect(shownValue(522.1, "connectorForce", "us", "timber")).toBe(522.1);
    expect(shownValue(1000, "stress", "us", "timber")).toBe(1000);
    expect(shownLabels("us", "timber")).toMatchObject({ connectorForce: "lb", force: "lb", shearFlow: "lb/in", stress: "psi", length: "in", span: "ft" });
  });

  test("SI is not rescaled for either", () => {
    for (const owner of ["steel", "timber"] as const) {
      expect(shownValue(12.5, "force", "si", owner)).toBe(12.5);
      expect(shownLabels("si", owner)).toMatchObject({ force: "kN", stress: "MPa", shearFlow: "N/mm", connectorForce: "N" });
    }
  });

  test("what a quantity belongs to: steel only when every material is steel", () => {
    expect(ownerOfFamilies(["steel", "steel"])).toBe("steel");
    expect(ownerOfFamilies(["steel", "sawn-timber"])).toBe("timber");
    expect(ownerOfFamilies([])).toBe("timber");
    const parts = [
      { id: "ply-left", material: "DFL1" },
      { id: "plate", material: "A36" },
    ];
    const owners = resultOwners(
      { section: { parts } as never, joints: [{ id: "plate", lines: [{ between: ["ply-left", "plate"] }] }] as never },
      [
        { id: "DFL1", family: "sawn-timber" },
        { id: "A36", family: "steel" },
      ],
    );
    expect(owners.member).toBe("timber");
    expect(owners.joint("plate")).toBe("timber");
    // A check names its part (bending-ply-plate) or its material (bending-A36).
    expect(owners.check({ id: "bending-ply-plate" })).toBe("steel");
    expect(owners.check({ id: "bending-A36" })).toBe("steel");
    expect(owners.check({ id: "bending-ply-ply-left" })).toBe("timber");
    expect(owners.check({ id: "deflection-total" })).toBe("timber");
  });
});
