import { readFileSync } from "node:fs";
import { expect, test } from "vitest";
import { PROGRAM } from "../../core/version.js";

test("PROGRAM.version equals the version in package.json", () => {
  const pkg = JSON.parse(readFileSync(new URL("../../package.json", import.meta.url), "utf8")) as { name: string; version: string };
  expect(PROGRAM).toEqual({ name: pkg.name, version: pkg.version });
});
