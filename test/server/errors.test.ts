import { readFileSync } from "node:fs";
import { describe, expect, test } from "vitest";
import { errorBody, errors } from "../../server/errors.js";

describe("server/errors", () => {
  test("every error code has a status and a sentence, and errorBody uses them", () => {
    for (const [code, e] of Object.entries(errors)) {
      expect(e.statusCode).toBeGreaterThanOrEqual(400);
      expect(e.message.length).toBeGreaterThan(10);
      expect(errorBody(code as keyof typeof errors)).toMatchObject({ statusCode: e.statusCode, code, issues: [] });
    }
  });

  test("the README's error table lists exactly the codes and statuses in server/errors.ts", () => {
    const readme = readFileSync(new URL("../../README.md", import.meta.url), "utf8");
    const rows = [...readme.matchAll(/^\| `(ERR_[A-Z_]+)` \| (\d{3}) \|/gm)].map((m) => [m[1], Number(m[2])]);
    expect(Object.fromEntries(rows)).toEqual(Object.fromEntries(Object.entries(errors).map(([code, e]) => [code, e.statusCode])));
  });
});
