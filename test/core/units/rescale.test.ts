// The schema-driven converter: every number that carries a quantity kind is rescaled, by the option of a
// union that the value belongs to. Conversion factors: NIST SP 811 Appendix B (1 in = 25.4 mm exactly).
import { z } from "zod";
import { describe, expect, test } from "vitest";
import { quantity } from "../../../core/schema/quantity.js";
import { rescale, toCoreUnits } from "../../../core/units/convert.js";

const Item = z.discriminatedUnion("type", [
  z.object({ type: z.literal("plate"), b: quantity("length"), note: z.number() }),
  z.object({ type: z.enum(["bar", "rod"]), d: quantity("length") }),
]);
const Doc = z.object({ items: z.array(Item), span: quantity("span") });

describe("rescale", () => {
  test("each member of a discriminated union by its own option, whether its tag is a literal or one of an enum", () => {
    const doc = { items: [{ type: "plate", b: 2, note: 7 }, { type: "rod", d: 0.5 }, { type: "bar", d: 1 }], span: 10 };
    const core = toCoreUnits(Doc, Doc.parse(doc), "us");
    expect(core.items).toEqual([{ type: "plate", b: 50.8, note: 7 }, { type: "rod", d: 12.7 }, { type: "bar", d: 25.4 }]);
    // 10 ft = 3048 mm.
    expect(core.span).toBeCloseTo(3048, 9);
  });

  test("a value whose tag matches no option is left as it is", () => {
    const odd = { type: "tube", d: 3 } as unknown as z.infer<typeof Item>;
    expect(rescale(Item, odd, (v) => v * 2)).toEqual({ type: "tube", d: 3 });
  });
});
