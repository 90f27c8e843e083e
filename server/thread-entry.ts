import { createHash } from "node:crypto";
import { mkdirSync, readFileSync, renameSync, statSync, writeFileSync } from "node:fs";
import { readFile } from "node:fs/promises";
import { createRequire } from "node:module";
import { dirname, join, relative } from "node:path";
import { fileURLToPath, pathToFileURL } from "node:url";
import { Worker, type ResourceLimits } from "node:worker_threads";
import { build, version as esbuildVersion, type Plugin } from "esbuild";

/** Entry URL → the entry and everything it imports, bundled into one module (a data: URL). */
const bundled = new Map<string, string>();

/**
 * Bundles a thread's TypeScript entry once, so that its threads start in a tenth of a second instead of
 * about one (no tsx in each thread) and run the code as written: tsx compiles with esbuild's keepNames,
 * which wraps every function made in a loop in a call that names it, and runs its module hooks beside
 * each thread (measured on a design thread, in turns with the sources through tsx: 0.72 to 0.85 × the
 * time per design, the answer's hop included). Packages other than zod stay outside the bundle, imported from their own files (pdfkit and
 * fontkit read their data next to them); each module's `import.meta.url` is its own file's. A failure
 * leaves the threads on tsx, as before. Nothing to do when the program runs as JavaScript.
 */
export async function bundleThread(entry: URL): Promise<void> {
  if (!import.meta.url.endsWith(".ts") || bundled.has(entry.href)) return;
  try {
    const code = storedBundle(entry) ?? (await freshBundle(entry));
    // sourceURL names the bundle in stack traces and profiles instead of the whole data: URL.
    bundled.set(entry.href, `data:text/javascript;base64,${Buffer.from(`${code}\n//# sourceURL=${entry.href.replace(/\.ts$/, ".bundle.js")}\n`).toString("base64")}`);
  } catch {
    // Threads then load the sources through tsx, slower but the same code.
  }
}

const projectRoot = fileURLToPath(new URL("../", import.meta.url));
/** Bundles made before, kept between runs (a batch or a server start saves about a quarter of a second). */
const BUNDLE_CACHE = join(projectRoot, "node_modules/.cache/stitchplan");

interface StoredBundle {
  /**
   * What else shapes the bundle: esbuild's version, the project's folder (the bundle names its own files
   * and the packages' by absolute path, so a store copied or left behind with node_modules is not used
   * from another folder), this file (the options and plugin), tsconfig.json, package.json and package-lock.json.
   */
  builder: string;
  /** Every file esbuild read for it, from the project's folder → sha256 of its bytes. */
  inputs: Record<string, string>;
  code: string;
}

const digest = (bytes: string | Buffer) => createHash("sha256").update(bytes).digest("base64");
const fileDigest = (file: string) => {
  try {
    return digest(readFileSync(file));
  } catch {
    return "none";
  }
};
export const builderKey = (root = projectRoot) =>
  digest([esbuildVersion, root, ...[fileURLToPath(import.meta.url), join(root, "tsconfig.json"), join(root, "package.json"), join(root, "package-lock.json")].map(fileDigest)].join(" "));
export const storedFile = (entry: URL) => join(BUNDLE_CACHE, `${relative(projectRoot, fileURLToPath(entry)).replaceAll(/[\\/]/g, "~")}.json`);

/** The bundle stored by an earlier run, when every file it was made from is byte for byte the same today; else undefined. */
export function storedBundle(entry: URL): string | undefined {
  try {
    const stored = JSON.parse(readFileSync(storedFile(entry), "utf8")) as StoredBundle;
    if (stored.builder !== builderKey() || typeof stored.code !== "string") return undefined;
    for (const [path, hash] of Object.entries(stored.inputs)) if (digest(readFileSync(join(projectRoot, path))) !== hash) return undefined;
    return stored.code;
  } catch {
    return undefined;
  }
}

/**
 * Bundles `entry` with esbuild and stores the bundle for the next run, unless a file it was made from
 * changed since a little before the bundling began (it may have been read before or after the change:
 * the next run bundles again). Stored by renaming a whole file into place, so no reader sees half of one.
 */
export async function freshBundle(entry: URL): Promise<string> {
  const began = Date.now();
  const out = await build({
    entryPoints: [fileURLToPath(entry)],
    absWorkingDir: projectRoot,
    bundle: true,
    write: false,
    metafile: true,
    format: "esm",
    platform: "node",
    target: "node20",
    logLevel: "silent",
    plugins: [ownFiles],
  });
  const code = out.outputFiles[0]!.text;
  try {
    const inputs: Record<string, string> = {};
    for (const path of Object.keys(out.metafile.inputs)) {
      const file = join(projectRoot, path);
      if (statSync(file).mtimeMs >= began - 2000) return code;
      inputs[path] = digest(readFileSync(file));
    }
    const stored: StoredBundle = { builder: builderKey(), inputs, code };
    const file = storedFile(entry);
    mkdirSync(BUNDLE_CACHE, { recursive: true });
    const partial = `${file}.${process.pid}.${Math.random().toString(36).slice(2)}.tmp`;
    writeFileSync(partial, JSON.stringify(stored));
    renameSync(partial, file);
  } catch {
    // Not stored (a read-only folder, say): the next run bundles again.
  }
  return code;
}

const ownFiles: Plugin = {
  name: "stitchplan-thread",
  setup(build) {
    build.onResolve({ filter: /^[^./]/ }, async (args) => {
      if (args.path.startsWith("node:") || args.path === "zod" || args.path.startsWith("zod/") || args.pluginData === "inner") return undefined;
      // Where Node would load it from (the package's ESM entry), as an absolute URL a data: module can import.
      const found = await build.resolve(args.path, { kind: args.kind, resolveDir: args.resolveDir, importer: args.importer, pluginData: "inner" });
      if (found.errors.length > 0) return { errors: found.errors };
      return { path: pathToFileURL(found.path).href, external: true };
    });
    // Only server/ code asks for its own file's URL (core/ does no I/O); leaving core's files to esbuild's own loader saves about a sixth of the bundling (median 0.30 → 0.26 s).
    build.onLoad({ filter: /[\\/]server[\\/].*\.ts$/ }, async (args) => ({
      contents: (await readFile(args.path, "utf8")).replaceAll("import.meta.url", JSON.stringify(pathToFileURL(args.path).href)),
      loader: "ts",
    }));
  },
};

/** The module `entry` from its bundle (made now if need be), or undefined when the program runs as JavaScript or the bundle failed. */
export async function importBundled<T>(entry: URL): Promise<T | undefined> {
  await bundleThread(entry);
  const bundle = bundled.get(entry.href);
  return bundle ? ((await import(bundle)) as T) : undefined;
}

/**
 * A worker thread on a module of this program, given as its `.ts` source URL: the bundle `bundleThread`
 * made of it, or else the source itself. Node 20 does not apply a loader given with --import to a
 * worker's entry, so from source the worker first registers tsx itself.
 */
export function startThread(entry: URL, resourceLimits?: ResourceLimits): Worker {
  const options = resourceLimits ? { resourceLimits } : {};
  if (!import.meta.url.endsWith(".ts")) return new Worker(new URL(entry.href.replace(/\.ts$/, ".js")), options);
  const bundle = bundled.get(entry.href);
  if (bundle) return new Worker(`import(${JSON.stringify(bundle)});`, { ...options, eval: true });
  // tsx/esm/api's ESM file (require.resolve would pick its CommonJS twin).
  const tsxApi = pathToFileURL(join(dirname(createRequire(import.meta.url).resolve("tsx/package.json")), "dist/esm/api/index.mjs")).href;
  const code = `import(${JSON.stringify(tsxApi)}).then((tsx) => { tsx.register(); return import(${JSON.stringify(entry.href)}); });`;
  return new Worker(code, { ...options, eval: true });
}
