import type { FastifyInstance } from "fastify";
import { z } from "zod";
import { convertJob, gradeMaterial, grades, JobDocument, prepareJob, PROGRAM, quantityOf } from "../../core/index.js";
import { bytesOf } from "../design-tasks.js";
import type { TaskRunner } from "../design-threads.js";
import { ApiError } from "../errors.js";
import type { Example } from "../examples.js";
import { ResultCache } from "../result-cache.js";

/** The JSON API: every route parses, calls core through the design service, and returns. */
export async function apiRoutes(app: FastifyInstance, options: { examples: Example[]; designs: TaskRunner; cache: ResultCache }) {
  const { designs, cache } = options;
  // Each number carries its quantity kind ("length", "span", "force" …) so a client can label and convert it.
  const jobSchema = z.toJSONSchema(JobDocument, { io: "input", unrepresentable: "any", metadata: quantityOf });

  app.get("/api/health", async () => ({ status: "ok", program: PROGRAM.name, version: PROGRAM.version }));

  app.get("/api/examples", async () => options.examples.map(({ id, title, units }) => ({ id, title, units })));

  app.get<{ Params: { id: string } }>("/api/examples/:id", async (request) => {
    const example = options.examples.find((e) => e.id === request.params.id);
    if (!example) throw new ApiError("ERR_EXAMPLE_NOT_FOUND", `There is no example "${request.params.id}"; GET /api/examples lists them.`);
    return example.document;
  });

  app.get("/api/schema/job", async () => jobSchema);

  app.get<{ Querystring: { units?: string; basis?: string } }>("/api/materials", async (request) => {
    const units = request.query.units ?? "si";
    const basis = request.query.basis ?? "allowable";
    if (units !== "si" && units !== "us") throw new ApiError("ERR_INPUT_INVALID", undefined, [{ path: "units", message: `must be "si" or "us", not ${JSON.stringify(units)}` }]);
    if (basis !== "allowable" && basis !== "factored") throw new ApiError("ERR_INPUT_INVALID", undefined, [{ path: "basis", message: `must be "allowable" or "factored", not ${JSON.stringify(basis)}` }]);
    return grades.map((g) => ({ grade: g.id, name: g.name, family: g.family, material: gradeMaterial(g, basis, units) }));
  });

  // Designs under way, by the same key as the cache: the same job sent again before its answer is ready
  // (a double click, a reload, many clients) waits for that design instead of queueing another.
  const underWay = new Map<string, Promise<Buffer>>();
  app.post("/api/designs", async (request, reply) => {
    const key = ResultCache.key("design", request.body);
    let json = cache.get(key);
    if (json === undefined) {
      let pending = key === undefined ? undefined : underWay.get(key);
      if (pending === undefined) {
        // Encoded once, on the design thread, and moved here; never again at a send from the cache.
        pending = designs.run({ kind: "result-json", input: request.body }).then(bytesOf);
        if (key !== undefined) {
          underWay.set(key, pending);
          const forget = () => underWay.delete(key);
          pending.then(forget, forget);
        }
      }
      json = await pending;
      cache.set(key, json);
    }
    return reply.type("application/json; charset=utf-8").send(json);
  });

  app.post<{ Querystring: { to?: string } }>("/api/conversions", async (request) => {
    const to = request.query.to;
    if (to !== "si" && to !== "us") throw new ApiError("ERR_INPUT_INVALID", undefined, [{ path: "to", message: `must be "si" or "us", not ${JSON.stringify(to ?? null)}` }]);
    const prepared = prepareJob(request.body);
    if (!prepared.ok) throw new ApiError("ERR_INPUT_INVALID", undefined, prepared.issues);
    return convertJob(prepared.job, to);
  });

  app.post("/api/worksheets", async (request, reply) => {
    const sheet = await designs.run({ kind: "worksheet", input: request.body });
    return reply
      .type("application/pdf")
      .header("content-disposition", `attachment; filename="${sheet.fileName}"`)
      .send(bytesOf(sheet.pdf));
  });
}
