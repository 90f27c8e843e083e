// Security of the local service: where it listens, its headers, the Host check, what static serving
// can reach, and names people type kept as text in the API, the PDF and its file name.
import { execFileSync } from "node:child_process";
import { readFileSync, writeFileSync } from "node:fs";
import { connect } from "node:net";
import { networkInterfaces } from "node:os";
import { join } from "node:path";
import type { FastifyInstance } from "fastify";
import { afterAll, beforeAll, describe, expect, test } from "vitest";
import { startServer } from "../../bench/loopback.js";
import { buildApp } from "../../server/app.js";
import { hardeningHeaders } from "../../server/security-headers.js";
import { JobStore } from "../../server/store/job-store.js";
import { example, tempFolder } from "./store/store-fixtures.js";

let app: FastifyInstance;
let port = 0;
beforeAll(async () => {
  app = await buildApp();
  await app.listen({ port: 0, host: "127.0.0.1" });
  port = (app.server.address() as { port: number }).port;
});
afterAll(() => app.close());

/** One request written byte for byte (no client tidies the path), the whole answer read back. */
function rawGet(path: string, host = `127.0.0.1:${port}`): Promise<{ status: number; headers: string; body: string }> {
  return new Promise((resolve, reject) => {
    const socket = connect(port, "127.0.0.1", () => socket.write(`GET ${path} HTTP/1.1\r\nHost: ${host}\r\nConnection: close\r\n\r\n`));
    let text = "";
    socket.setEncoding("latin1");
    socket.on("data", (chunk) => (text += chunk));
    socket.on("end", () => {
      const [head = "", ...rest] = text.split("\r\n\r\n");
      resolve({ status: Number(head.split(" ")[1]), headers: head, body: rest.join("\r\n\r\n") });
    });
    socket.on("error", reject);
  });
}

/** A non-loopback IPv4 address of this machine, if it has one. */
const outsideAddress = () =>
  Object.values(networkInterfaces())
    .flat()
    .find((a) => a && a.family === "IPv4" && !a.internal)?.address;

function canConnect(host: string, to: number): Promise<boolean> {
  return new Promise((resolve) => {
    const socket = connect({ host, port: to, timeout: 3000 }, () => {
      socket.destroy();
      resolve(true);
    });
    socket.on("error", () => resolve(false));
    socket.on("timeout", () => {
      socket.destroy();
      resolve(false);
    });
  });
}

describe("where the service listens", () => {
  test("npm start listens on 127.0.0.1 only, without a warning; other addresses of the machine refuse the connection", { timeout: 120_000 }, async () => {
    const server = await startServer();
    try {
      expect(server.url).toMatch(/^http:\/\/127\.0\.0\.1:\d+$/);
      expect(server.output()).not.toMatch(/Warning/);
      const serverPort = Number(new URL(server.url).port);
      expect(await canConnect("127.0.0.1", serverPort)).toBe(true);
      const outside = outsideAddress();
      if (outside) expect(await canConnect(outside, serverPort)).toBe(false);
    } finally {
      await server.stop();
    }
  });

  test("--host 0.0.0.0 must be asked for, prints a warning that the service has no login, and answers under any host name", { timeout: 120_000 }, async () => {
    const server = await startServer({ args: ["--host", "0.0.0.0"] });
    try {
      expect(server.output()).toMatch(/Warning: listening on 0\.0\.0\.0 makes the service reachable from other machines/);
      const res = await fetch(`http://127.0.0.1:${new URL(server.url).port}/api/health`, { headers: { host: "workshop-pc.local" } });
      expect(res.status).toBe(200);
    } finally {
      await server.stop();
    }
  });
});

describe("headers", () => {
  test("the page comes with a strict content security policy and the usual hardening headers", async () => {
    const res = await rawGet("/");
    expect(res.status).toBe(200);
    const csp = /content-security-policy: (.*)/i.exec(res.headers)?.[1] ?? "";
    for (const directive of ["default-src 'self'", "script-src 'self'", "script-src-attr 'none'", "style-src 'self'", "object-src 'none'", "base-uri 'none'", "frame-ancestors 'none'", "connect-src 'self'"]) {
      expect(csp).toContain(directive);
    }
    expect(csp).not.toMatch(/unsafe-inline|unsafe-eval|\*/);
    expect(res.headers).toMatch(/x-content-type-options: nosniff/i);
    expect(res.headers).toMatch(/x-frame-options: SAMEORIGIN/i);
    expect(res.headers).toMatch(/referrer-policy: no-referrer/i);
    expect(res.headers).toMatch(/cross-origin-opener-policy: same-origin/i);
    expect(res.headers).not.toMatch(/x-powered-by/i);
    // Plain HTTP on this machine: HSTS would only confuse a browser.
    expect(res.headers).not.toMatch(/strict-transport-security/i);
  });

  test("API answers and errors carry the same headers", async () => {
    for (const path of ["/api/health", "/api/nothing"]) {
      const res = await rawGet(path);
      expect(res.headers, path).toMatch(/content-security-policy: default-src 'self'/i);
      expect(res.headers, path).toMatch(/x-content-type-options: nosniff/i);
    }
  });
});

describe("the Host check (DNS rebinding)", () => {
  test("a request addressed to another host name is refused with a 403 naming the header", async () => {
    const res = await rawGet("/api/health", "attacker.example:4318");
    expect(res.status).toBe(403);
    expect(JSON.parse(res.body)).toMatchObject({ code: "ERR_HOST_NOT_ALLOWED", issues: [{ path: "(headers).host" }] });
    expect((await rawGet("/", "attacker.example")).status).toBe(403);
  });

  test("the loopback names are answered, with any port", async () => {
    for (const host of [`127.0.0.1:${port}`, "localhost:4318", "LOCALHOST", "[::1]:4318"]) expect((await rawGet("/api/health", host)).status, host).toBe(200);
  });
});

describe("static files", () => {
  const secrets = /"name": "stitchplan"|buildApp|root:x:0:0|from "\.\/|import \{/;

  test("the page, its style sheet and icon are served", async () => {
    for (const path of ["/", "/index.html", "/style.css", "/favicon.svg", "/app.js"]) expect((await rawGet(path)).status, path).toBe(200);
  });

  test.each([
    "/../package.json",
    "/..%2fpackage.json",
    "/%2e%2e/package.json",
    "/%2e%2e%2fpackage.json",
    "/.%2e/package.json",
    "/%252e%252e%252fpackage.json",
    "/..%252f..%252fetc%252fpasswd",
    "/%2e%2e/%2e%2e/%2e%2e/etc/passwd",
    "/..%5cpackage.json",
    "/index.html/../../package.json",
    "/favicon.svg/..%2f..%2fpackage.json",
    "/style.css%2f..%2f..%2fserver%2fapp.ts",
    "/%00",
    "/index.html%00.txt",
  ])("%s does not reach outside web/", async (path) => {
    const res = await rawGet(path);
    expect([400, 403, 404]).toContain(res.status);
    expect(res.body).not.toMatch(secrets);
  });

  test.each(["/src/main.ts", "/src/", "/src", "/src%2fmain.ts", "/src%2Fmain.ts", "/%73rc/main.ts", "/%2573rc/main.ts", "/./src/main.ts", "//src/main.ts", "/src/../src/main.ts", "/src/form/../main.ts", "/src;/main.ts", "/src%5cmain.ts", "/SRC/main.ts"])(
    "%s: web/src is not served",
    async (path) => {
      const res = await rawGet(path);
      expect([400, 403, 404]).toContain(res.status);
      expect(res.body).not.toMatch(secrets);
    },
  );
});

describe("names people type", () => {
  const hostile = {
    project: `<script>alert("p")</script> O'Brien & "Sons" — Δοκός Балка`,
    mark: `B-1 "</title><img src=x onerror=1>`,
    // Control and text-direction characters (a line break, U+202E) are refused at the field: see below.
    description: "evil ≤ τ ≥ σ; Set-Cookie: x=1",
    number: `../../etc/passwd X-Injected: 1`,
  };

  function hostileJob() {
    const job = example("workshop-box-beam.si");
    job.project.name = hostile.project;
    job.project.number = hostile.number;
    job.member.mark = hostile.mark;
    job.member.description = hostile.description;
    return job;
  }

  test("the API returns them as JSON strings, unchanged", async () => {
    const res = await app.inject({ method: "POST", url: "/api/designs", payload: hostileJob() });
    expect(res.statusCode).toBe(200);
    expect(res.headers["content-type"]).toBe("application/json; charset=utf-8");
    expect(res.json().project.name).toBe(hostile.project);
    expect(res.json().member.mark).toBe(hostile.mark);
  });

  test("the worksheet prints them literally (pdftotext), and its file name header holds only safe characters", { timeout: 120_000 }, async () => {
    const res = await app.inject({ method: "POST", url: "/api/worksheets", payload: hostileJob() });
    expect(res.statusCode).toBe(200);
    const disposition = String(res.headers["content-disposition"]);
    expect(disposition).toMatch(/^attachment; filename="[A-Za-z0-9._-]+\.pdf"$/);
    expect(Object.keys(res.headers)).not.toContain("x-injected");
    expect(Object.keys(res.headers)).not.toContain("set-cookie");
    const folder = tempFolder("security-pdf");
    try {
      const file = join(folder.dir, "sheet.pdf");
      writeFileSync(file, res.rawPayload);
      const text = execFileSync("pdftotext", ["-enc", "UTF-8", file, "-"], { encoding: "utf8" }).replace(/\s+/g, " ");
      expect(text).toContain(`<script>alert("p")</script> O'Brien & "Sons" — Δοκός Балка`);
      expect(text).toContain(`B-1 "</title><img src=x onerror=1>`);
      expect(text).toContain("≤ τ ≥ σ");
    } finally {
      folder.remove();
    }
  });
});

describe("requests from other sites, and bodies that are not JSON", () => {
  const changing = [
    { method: "POST" as const, url: "/api/designs" },
    { method: "POST" as const, url: "/api/conversions?to=us" },
    { method: "POST" as const, url: "/api/worksheets" },
  ];

  test("a state-changing request with another site's Origin or Sec-Fetch-Site is a 403 ERR_CROSS_SITE with the hardening headers; GETs and this site's own requests are answered", async () => {
    const job = JSON.stringify(example("workshop-box-beam.si"));
    for (const { method, url } of changing) {
      for (const headers of [{ origin: "https://elsewhere.example" }, { origin: "null" }, { "sec-fetch-site": "cross-site" }, { "sec-fetch-site": "same-site" }]) {
        const res = await app.inject({ method, url, payload: job, headers: { "content-type": "application/json", ...headers } });
        expect(res.statusCode, `${url} ${JSON.stringify(headers)}`).toBe(403);
        expect(res.json()).toMatchObject({ statusCode: 403, code: "ERR_CROSS_SITE", error: "Forbidden" });
        expect(res.headers["content-security-policy"]).toContain("default-src 'self'");
      }
    }
    const own = await app.inject({ method: "POST", url: "/api/designs", payload: job, headers: { "content-type": "application/json", origin: "http://127.0.0.1", host: "127.0.0.1", "sec-fetch-site": "same-origin" } });
    expect(own.statusCode).toBe(200);
    expect((await app.inject({ method: "GET", url: "/api/health", headers: { origin: "https://elsewhere.example" } })).statusCode).toBe(200);
  });

  test("only application/json bodies are taken: text/plain, a form, or an empty POST with no type is a 415 with the documented body", async () => {
    for (const { method, url } of changing) {
      for (const [type, payload] of [["text/plain", "{}"], ["application/x-www-form-urlencoded", "a=1"], ["multipart/form-data; boundary=x", "--x--"], [undefined, ""]] as const) {
        const res = await app.inject({ method, url, payload, headers: type ? { "content-type": type } : {} });
        expect(res.statusCode, `${url} ${type}`).toBe(415);
        expect(res.json()).toMatchObject({ statusCode: 415, code: "ERR_UNSUPPORTED_MEDIA_TYPE", error: "Unsupported Media Type", issues: [{ path: "(headers).content-type", message: "must be application/json" }] });
        expect(res.headers["x-content-type-options"]).toBe("nosniff");
      }
    }
  });

  test("the page's requests send JSON: every fetch with a method other than GET in web/src names application/json", () => {
    const sources = ["web/src/api.ts", "web/src/store/store-api.ts"].map((f) => readFileSync(join(import.meta.dirname, "../..", f), "utf8"));
    for (const source of sources) {
      for (const call of source.match(/fetch\([^;]*method[^;]*/g) ?? []) expect(call).toMatch(/content-type": "application\/json"/);
    }
    // A POST without a body (issuing a worksheet) sends {} as JSON.
    expect(sources[1]).toMatch(/if \(method !== "GET" && body === undefined\) body = \{\};/);
  });
});

describe("every answer has the documented body and the hardening headers", () => {
  test("a malformed URL, a path with .., a refused host and a missing page: documented code and body, and the CSP", async () => {
    for (const path of ["/%zz", "/../", "/..%2f", "/%2e%2e/package.json", "/api/../api/health", "/no-such-page"]) {
      const res = await rawGet(path);
      expect(res.status, path).toBe(404);
      expect(JSON.parse(res.body), path).toEqual({ statusCode: 404, code: "ERR_NOT_FOUND", error: "Not Found", message: "There is nothing at this address.", issues: [] });
      expect(res.headers.toLowerCase(), path).toContain("content-security-policy: default-src 'self'");
      expect(res.headers.toLowerCase(), path).toContain("x-content-type-options: nosniff");
    }
    const host = await rawGet("/api/health", "rebound.example");
    expect(host.status).toBe(403);
    expect(JSON.parse(host.body)).toMatchObject({ statusCode: 403, code: "ERR_HOST_NOT_ALLOWED", error: "Forbidden" });
    expect(host.headers.toLowerCase()).toContain("content-security-policy: default-src 'self'");
  });

  test("a request Node cannot parse gets the documented 400 with the same hardening headers helmet sets on every other answer", async () => {
    const res = await new Promise<string>((resolve, reject) => {
      const socket = connect(port, "127.0.0.1", () => socket.write("GET /api/health HTTP/1.1\r\nHost: 127.0.0.1\r\nBad Header Line\r\n\r\n"));
      let text = "";
      socket.setEncoding("latin1");
      socket.on("data", (chunk) => (text += chunk));
      socket.on("end", () => resolve(text));
      socket.on("error", reject);
    });
    const [head = "", body = ""] = res.split("\r\n\r\n");
    expect(head.split("\r\n")[0]).toBe("HTTP/1.1 400 Bad Request");
    expect(JSON.parse(body)).toMatchObject({ statusCode: 400, code: "ERR_INPUT_INVALID", error: "Bad Request", issues: [{ path: "(request)" }] });
    const health = await app.inject("/api/health");
    for (const [name, value] of Object.entries(hardeningHeaders)) {
      expect(health.headers[name], name).toBe(value);
      expect(head.toLowerCase()).toContain(`${name}: ${value}`.toLowerCase());
    }
  });

  test("a body nested deeper than any job is a 400 on every JSON route, conversions and the store included", async () => {
    const folder = tempFolder("security");
    const withStore = await buildApp({ dataDir: folder.dir });
    try {
      const deep = `{"job":${"[".repeat(100_000)}${"]".repeat(100_000)}}`;
      for (const url of ["/api/designs", "/api/conversions?to=si", "/api/worksheets", "/api/projects", "/api/projects/import"]) {
        const res = await withStore.inject({ method: "POST", url, payload: deep, headers: { "content-type": "application/json" } });
        expect(res.statusCode, url).toBe(400);
        expect(res.json(), url).toMatchObject({ code: "ERR_INPUT_INVALID", issues: [{ path: "(body)", message: "must nest at most 64 levels deep" }] });
      }
    } finally {
      await withStore.close();
      folder.remove();
    }
  });
});

describe("control and text-direction characters in names", () => {
  const json = { "content-type": "application/json" };
  const hidden = ["\u202e", "\u2066", "\u200f", "\u0007", "\u0085", "\u061c"];

  test("are refused at the field that holds them, naming the character and where it is", async () => {
    for (const c of hidden) {
      const job = example("workshop-box-beam.si");
      job.member.mark = `MB${c}2`;
      job.project.name = `Harbour ${c}Lane`;
      const res = await app.inject({ method: "POST", url: "/api/designs", payload: JSON.stringify(job), headers: json });
      expect(res.statusCode).toBe(400);
      const code = `U+${c.codePointAt(0)!.toString(16).toUpperCase().padStart(4, "0")}`;
      expect(res.json().issues).toEqual(
        expect.arrayContaining([
          { path: "member.mark", message: `must not hold control or text-direction characters (${code} at character 3)` },
          { path: "project.name", message: `must not hold control or text-direction characters (${code} at character 9)` },
        ]),
      );
    }
    const plain = example("workshop-box-beam.si");
    plain.member.mark = "MB-2 ÄÖ 北 שלום";
    expect((await app.inject({ method: "POST", url: "/api/designs", payload: JSON.stringify(plain), headers: json })).statusCode).toBe(200);
  });

  test("a store project name is refused the same way; a member saved before the rule lists with the character shown as ⟨U+202E⟩", async () => {
    const folder = tempFolder("hidden");
    const withStore = await buildApp({ dataDir: folder.dir });
    try {
      const refused = await withStore.inject({ method: "POST", url: "/api/projects", payload: JSON.stringify({ name: "Level\u202e 2" }), headers: json });
      expect(refused.statusCode).toBe(400);
      expect(refused.json().issues).toEqual([{ path: "name", message: "must not hold control or text-direction characters (U+202E at character 6)" }]);
      const project = (await withStore.inject({ method: "POST", url: "/api/projects", payload: JSON.stringify({ name: "Level 2" }), headers: json })).json();
      const saved = (await withStore.inject({ method: "POST", url: `/api/projects/${project.id}/members`, payload: JSON.stringify({ job: example("workshop-box-beam.si") }), headers: json })).json();
      // As an older program could have stored it: straight into the file.
      const store = JobStore.open(folder.dir);
      store.db.prepare("UPDATE members SET mark = ?, description = ? WHERE id = ?").run("MB\u202e-2", "left\u2066right", saved.memberId);
      store.close();
      const members = await withStore.inject({ method: "GET", url: `/api/projects/${project.id}/members` });
      expect(members.statusCode).toBe(200);
      expect(members.json()[0]).toMatchObject({ mark: "MB⟨U+202E⟩-2", description: "left⟨U+2066⟩right" });
    } finally {
      await withStore.close();
      folder.remove();
    }
  });
});
