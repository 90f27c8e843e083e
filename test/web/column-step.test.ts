import { describe, expect, test } from "vitest";
import { columnEnds } from "../../core/schema/column.js";
import { endsK } from "../../web/src/form/column-step.js";

describe("the column step's words", () => {
  test("each end condition offered names the K_e the design takes", () => {
    expect(endsK).toEqual(columnEnds);
  });
});
