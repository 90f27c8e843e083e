import { describe, expect, test } from "vitest";
import { jointName } from "../../web/src/results/joint-names.js";

const box = [
  { id: "web-left", name: "Left web" },
  { id: "bottom", name: "Bottom flange" },
  { id: "top", name: "Top flange" },
  { id: "web-right", name: "Right web" },
];

describe("a joint named by what it joins", () => {
  test("a box beam's flange to both webs", () => {
    expect(jointName({ held: ["top"], lines: [{ between: ["web-left", "top"] }, { between: ["top", "web-right"] }] }, box)).toBe("Top flange to both webs");
  });
  test("one part to one, and parts without names by their ids", () => {
    expect(jointName({ held: ["ply-3"], lines: [{ between: ["ply-2", "ply-3"] }] }, [{ id: "ply-2", name: "Ply 2" }, { id: "ply-3", name: "Ply 3" }])).toBe("Ply 3 to ply 2");
    expect(jointName({ held: ["lam-5", "lam-6"], lines: [{ between: ["lam-4", "lam-5"] }] }, [])).toBe("Lam-5 and lam-6 to lam-4");
    expect(jointName({ held: ["plate"], lines: [{ between: ["plate", "beam"] }] }, [{ id: "beam", name: "W18x50" }, { id: "plate", name: "Cover plate" }])).toBe("Cover plate to W18x50");
  });
  test("two parts of different sorts are listed, not called both", () => {
    expect(jointName({ held: ["web"], lines: [{ between: ["bottom", "web"] }, { between: ["web", "top"] }] }, [{ id: "web", name: "Web" }, { id: "bottom", name: "Bottom flange" }, { id: "top", name: "Top chord" }])).toBe("Web to bottom flange and top chord");
  });
});
