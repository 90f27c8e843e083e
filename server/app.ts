import { dirname, join } from "node:path";
import { fileURLToPath } from "node:url";
import fastifyStatic from "@fastify/static";
import { build } from "esbuild";
import Fastify, { type FastifyError, type FastifyInstance } from "fastify";
import { ApiError, errorBody, type ErrorCode } from "./errors.js";
import { loadExamples } from "./examples.js";
import { apiRoutes } from "./routes/api.js";
import { storeRoutes } from "./routes/store.js";
import type { StoreOptions } from "./store/job-store.js";

export const projectRoot = join(dirname(fileURLToPath(import.meta.url)), "..");

export interface AppOptions {
  /** Folder of example job documents. */
  examplesDir?: string;
  /** Largest accepted request body, bytes. */
  bodyLimit?: number;
  /** Folder of the job store's database; without it the store's routes are not served. */
  dataDir?: string;
  /** The store's clock and test hooks. */
  store?: StoreOptions;
}

/** The page's script, bundled once from web/src when the app is built. */
async function bundlePage(): Promise<string> {
  const out = await build({
    entryPoints: [join(projectRoot, "web/src/main.ts")],
    bundle: true,
    write: false,
    format: "esm",
    target: "es2022",
    minify: true,
    sourcemap: false,
    logLevel: "silent",
  });
  return out.outputFiles[0]!.text;
}

/** Builds the HTTP app without listening: tests inject requests or listen on port 0. */
export async function buildApp(options: AppOptions = {}): Promise<FastifyInstance> {
  const app = Fastify({ logger: false, bodyLimit: options.bodyLimit ?? 1024 * 1024 });
  const examples = loadExamples(options.examplesDir ?? join(projectRoot, "fixtures/examples"));
  const pageScript = await bundlePage();

  app.setErrorHandler((error: FastifyError | ApiError, _request, reply) => {
    if (error instanceof ApiError) return reply.status(errorBody(error.code).statusCode).send(errorBody(error.code, error.message, error.issues));
    const code = fastifyCode(error as FastifyError);
    if (code) return reply.status(errorBody(code).statusCode).send(errorBody(code));
    return reply.status(500).send(errorBody("ERR_INTERNAL"));
  });
  app.setNotFoundHandler((_request, reply) => reply.status(404).send(errorBody("ERR_NOT_FOUND")));

  await app.register(apiRoutes, { examples });
  if (options.dataDir) await app.register(storeRoutes, { dataDir: options.dataDir, store: options.store });
  app.get("/app.js", (_request, reply) => reply.type("text/javascript; charset=utf-8").header("cache-control", "no-cache").send(pageScript));
  await app.register(fastifyStatic, { root: join(projectRoot, "web"), index: ["index.html"], allowedPath: (path) => !path.startsWith("/src/") });
  return app;
}

function fastifyCode(error: FastifyError): ErrorCode | undefined {
  switch (error.code) {
    case "FST_ERR_CTP_INVALID_JSON_BODY":
      return "ERR_JSON_MALFORMED";
    case "FST_ERR_CTP_EMPTY_JSON_BODY":
      return "ERR_BODY_EMPTY";
    case "FST_ERR_CTP_BODY_TOO_LARGE":
      return "ERR_BODY_TOO_LARGE";
    case "FST_ERR_CTP_INVALID_MEDIA_TYPE":
      return "ERR_UNSUPPORTED_MEDIA_TYPE";
    default:
      return error.statusCode === 404 ? "ERR_NOT_FOUND" : error.statusCode && error.statusCode < 500 ? "ERR_INPUT_INVALID" : undefined;
  }
}
