import { describe, expect, test } from "vitest";
import { pathInWords, plainMessage } from "../../web/src/form/issue-words.js";

describe("issues in the form's own words", () => {
  test("paths read as the form names them", () => {
    expect(pathInWords("parts[2].shape.b")).toBe("Part 3 shape b");
    expect(pathInWords("beam.loads[0].w")).toBe("Load 1 w");
    expect(pathInWords("fastening.default.rows")).toBe("Side by side in a row");
    expect(pathInWords("connectors[1].minSpacing")).toBe("Connector 2 Minimum spacing");
    expect(pathInWords("(document)")).toBe("The job file");
    expect(pathInWords("member.mark")).toBe("Member mark");
    expect(pathInWords("compression.loads[1].P")).toBe("Axial load 2 P");
    expect(pathInWords("compression.loads[0].category")).toBe("Axial load 1 category");
    expect(pathInWords("compression.x.bracedAt[0]")).toBe("Buckling about x Brace point 1");
    expect(pathInWords("compression.y.K")).toBe("Buckling about y K_e");
    expect(pathInWords("compression.spaced.packSpacing")).toBe("Spaced column Pack spacing l_1");
    expect(pathInWords("compression.packing[0]")).toBe("Packing part 1");
  });

  test("no schema words: never 'expected an object'", () => {
    expect(plainMessage("is required (expected an object)")).toBe("is missing: fill it in");
    expect(plainMessage("is required (expected a number)")).toBe("is required");
    expect(plainMessage("must be an object, not a string")).not.toMatch(/object/);
    expect(plainMessage("must be a boolean, not the text \"x\"")).toBe('must be yes or no, not the text "x"');
    expect(plainMessage("must be greater than 0 (got -3)")).toBe("must be greater than 0 (got -3)");
    expect(plainMessage('"roof" is not a load category: use one of dead, live, or define it in beam.categories')).not.toContain("beam.categories");
    expect(plainMessage("a spaced column (compression.spaced) needs its packs or gussets listed here")).not.toContain("compression.spaced");
  });
});

describe("a job file that cannot be opened says why in the form's words", () => {
  test("lists and groups named as the form names them, with the file's key beside", async () => {
    const { openableJob } = await import("../../web/src/job-state.js");
    const opened = openableJob({ format: "stitchplan-job", parts: {}, fastening: "x", beam: { loads: [3] } });
    expect(opened.ok).toBe(false);
    if (opened.ok) return;
    expect(opened.problems).toEqual([
      "Parts (“parts” in the file) must be a list of entries in brackets […]",
      "each entry of Loads (“beam.loads” in the file) must be a group of fields in braces {…}, not a single value",
      "Joints (“fastening” in the file) must be a group of fields in braces {…}, not a single value",
    ]);
    expect(opened.problems.join(" ")).not.toMatch(/an object|expected/);
    const column = openableJob({ format: "stitchplan-job", compression: { loads: 5 } });
    expect(column.ok ? [] : column.problems).toEqual(["Axial loads (“compression.loads” in the file) must be a list of entries in brackets […]"]);
  });
});
