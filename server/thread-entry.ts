import { readFile } from "node:fs/promises";
import { createRequire } from "node:module";
import { dirname, join } from "node:path";
import { pathToFileURL } from "node:url";
import { Worker, type ResourceLimits } from "node:worker_threads";
import { build, type Plugin } from "esbuild";

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
    const out = await build({
      entryPoints: [entry.pathname],
      bundle: true,
      write: false,
      format: "esm",
      platform: "node",
      target: "node20",
      logLevel: "silent",
      plugins: [ownFiles],
    });
    // sourceURL names the bundle in stack traces and profiles instead of the whole data: URL.
    const code = `${out.outputFiles[0]!.text}\n//# sourceURL=${entry.href.replace(/\.ts$/, ".bundle.js")}\n`;
    bundled.set(entry.href, `data:text/javascript;base64,${Buffer.from(code).toString("base64")}`);
  } catch {
    // Threads then load the sources through tsx, slower but the same code.
  }
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
