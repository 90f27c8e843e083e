import { readFileSync } from "node:fs";
import { join } from "node:path";
import { describe, expect, test } from "vitest";
import { csvNumber, csvText, positionsCsv, scheduleCsv, weldsCsv } from "../../../core/export/schedule-csv.js";
import { runDesign } from "../../../server/design-service.js";

const example = (name: string) => JSON.parse(readFileSync(join(import.meta.dirname, "../../../fixtures/examples", `${name}.json`), "utf8"));
const rowsOf = (csv: string) => csv.trimEnd().split("\r\n").map((line) => line.split(","));

describe("scheduleCsv", () => {
  test("scheduleCsv(si result) names m and mm in the header and has one row per zone per joint", () => {
    const { result } = runDesign(example("workshop-box-beam.si"));
    const [header, ...rows] = rowsOf(scheduleCsv(result));
    expect(header).toEqual(["member", "joint", "zone", "from (m)", "to (m)", "spacing (mm)", "rows", "count", "utilisation"]);
    expect(rows).toHaveLength(result.schedules.reduce((n, s) => n + s.zones.length, 0));
    for (const s of result.schedules) {
      const mine = rows.filter((r) => r[1] === s.joint);
      expect(mine.map((r) => r[2])).toEqual(s.zones.map((_, i) => String(i + 1)));
      expect(mine.reduce((n, r) => n + Number(r[7]), 0)).toBe(s.count);
      expect(Number(mine[0]![3])).toBe(0);
      expect(Number(mine[mine.length - 1]![4])).toBeCloseTo(result.beam.length, 6);
    }
    expect(rows.every((r) => r[0] === result.member.mark)).toBe(true);
  });

  test("scheduleCsv(us result) names ft and in", () => {
    const { result } = runDesign(example("loft-beam-16d.us"));
    expect(rowsOf(scheduleCsv(result))[0]).toEqual(["member", "joint", "zone", "from (ft)", "to (ft)", "spacing (in)", "rows", "count", "utilisation"]);
  });

  test("a glued member has a header and no rows", () => {
    const { result } = runDesign(example("glued-lintel.si"));
    expect(scheduleCsv(result, { lineEnding: "\n" }).split("\n").filter(Boolean)).toHaveLength(1);
  });
});

describe("positionsCsv", () => {
  test("positionsCsv(result) lists every row of every joint, numbered from 1, x increasing", () => {
    const { result } = runDesign(example("loft-beam-16d.us"));
    const [header, ...rows] = rowsOf(positionsCsv(result));
    expect(header).toEqual(["joint", "row", "x (ft)"]);
    expect(rows).toHaveLength(result.schedules.reduce((n, s) => n + s.positions.length, 0));
    const top = rows.filter((r) => r[0] === "top");
    expect(top.map((r) => Number(r[1]))).toEqual(top.map((_, i) => i + 1));
    expect(top.every((r, i) => i === 0 || Number(r[2]) > Number(top[i - 1]![2]))).toBe(true);
  });
});

describe("weldsCsv", () => {
  test("weldsCsv(welded girder) has one row per weld zone per joint with leg size and pitch in inches; null without welds", () => {
    const { result } = runDesign(example("girder-intermittent-welds.us"));
    const [header, ...rows] = rowsOf(weldsCsv(result)!);
    expect(header).toEqual(["member", "joint", "zone", "from (ft)", "to (ft)", "pattern", "segment (in)", "pitch (in)", "leg size (in)", "fillets", "utilisation"]);
    expect(rows).toHaveLength(result.welds.reduce((n, w) => n + w.zones.length, 0));
    expect(rows.every((r) => r[5] === "continuous" || (r[5] === "intermittent" && Number(r[7]) >= Number(r[6])))).toBe(true);
    expect(weldsCsv(runDesign(example("loft-beam-16d.us")).result)).toBeNull();
  });
});

describe("csv fields", () => {
  test("csvNumber drops floating-point noise and keeps whole numbers whole", () => {
    expect(csvNumber(0.1 + 0.2)).toBe("0.3");
    expect(csvNumber(1234)).toBe("1234");
    expect(csvNumber(2.0000000001)).toBe("2");
    expect(csvNumber(0.98765432, 4)).toBe("0.9877");
    expect(csvNumber(Number.NaN)).toBe("");
  });

  test("csvText quotes commas, quotes and line breaks, and defuses spreadsheet formulas", () => {
    expect(csvText("B-1")).toBe("B-1");
    expect(csvText('2x10, "No. 2"')).toBe('"2x10, ""No. 2"""');
    expect(csvText("line\nbreak")).toBe('"line\nbreak"');
    expect(csvText("=HYPERLINK(1)")).toBe("'=HYPERLINK(1)");
    expect(csvText("-1+2")).toBe("'-1+2");
  });
});
