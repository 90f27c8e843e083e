// The threads' bundle kept between runs (server/thread-entry.ts) is used only while every file it was
// made from is byte for byte the same: a changed source is never run from an old bundle.
import { existsSync, mkdirSync, readFileSync, rmSync, utimesSync, writeFileSync } from "node:fs";
import { join } from "node:path";
import { pathToFileURL } from "node:url";
import { afterAll, describe, expect, test } from "vitest";
import { builderKey, freshBundle, storedBundle, storedFile } from "../../server/thread-entry.js";

// Inside the project, as the threads' entries are (the store names its inputs from the project's folder).
const folder = join(new URL("./", import.meta.url).pathname, `.bundle-cache-${process.pid}`);
const entry = pathToFileURL(join(folder, "entry.ts"));
const dep = join(folder, "dep.ts");
const lastHour = new Date(Date.now() - 3600_000);

/** Writes a file dated an hour ago, or now when `when` is null. */
function write(file: string, text: string, when: Date | null = lastHour): void {
  writeFileSync(file, text);
  if (when) utimesSync(file, when, when);
}

afterAll(() => {
  rmSync(folder, { recursive: true, force: true });
  rmSync(storedFile(entry), { force: true });
});

describe("bundles kept between runs", () => {
  test("stored after bundling, used again, and dropped when a source changes", async () => {
    mkdirSync(folder, { recursive: true });
    write(entry.pathname, 'import { answer } from "./dep.js";\nexport const doubled: number = answer * 2;\n');
    write(dep, "export const answer = 21;\n");
    expect(storedBundle(entry)).toBeUndefined();
    const code = await freshBundle(entry);
    expect(code).toContain("21");
    expect(storedBundle(entry)).toBe(code);

    write(dep, "export const answer = 22;\n");
    expect(storedBundle(entry)).toBeUndefined();
    const again = await freshBundle(entry);
    expect(again).toContain("22");
    expect(storedBundle(entry)).toBe(again);
  });

  test("not stored when a source changed while it was bundled (or just before)", async () => {
    mkdirSync(folder, { recursive: true });
    rmSync(storedFile(entry), { force: true });
    write(entry.pathname, 'import { answer } from "./dep.js";\nexport const doubled: number = answer * 2;\n');
    write(dep, "export const answer = 23;\n", null);
    const code = await freshBundle(entry);
    expect(code).toContain("23");
    expect(existsSync(storedFile(entry))).toBe(false);
    expect(storedBundle(entry)).toBeUndefined();
  });

  test("a bundle stored by a copy of the project in another folder is not used here", async () => {
    // Found when a second checkout sharing node_modules stored a bundle with its own absolute paths, which this
    // checkout then ran: its worksheets failed with "Cannot find module 'pdfkit'" once that checkout was removed.
    mkdirSync(folder, { recursive: true });
    write(entry.pathname, 'export const answer: number = 24;\n');
    const code = await freshBundle(entry);
    expect(storedBundle(entry)).toBe(code);
    const stored = JSON.parse(readFileSync(storedFile(entry), "utf8")) as { builder: string };
    expect(stored.builder).toBe(builderKey());
    writeFileSync(storedFile(entry), JSON.stringify({ ...stored, builder: builderKey("/another/checkout/") }));
    expect(storedBundle(entry)).toBeUndefined();
  });

  test("a stored file that is not a bundle is ignored", () => {
    mkdirSync(join(storedFile(entry), ".."), { recursive: true });
    writeFileSync(storedFile(entry), "{ not json");
    expect(storedBundle(entry)).toBeUndefined();
  });
});
