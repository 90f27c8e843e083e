// The real server killed (SIGKILL) while clients save revisions over HTTP, then started again on the
// same data folder: the database opens, passes integrity_check, and holds every save that was
// acknowledged (201) with the job that was sent, numbered without gaps.
import { join } from "node:path";
import Database from "better-sqlite3";
import { afterEach, beforeEach, describe, expect, test } from "vitest";
import { startServer, type RunningServer } from "../../../bench/loopback.js";
import { canonicalJson, prepareJob } from "../../../core/index.js";
import { fingerprintOf } from "../../../server/fingerprint.js";
import { DATABASE_FILE } from "../../../server/store/open-database.js";
import { example, tempFolder } from "./store-fixtures.js";

let folder: ReturnType<typeof tempFolder>;
const servers: RunningServer[] = [];
beforeEach(() => {
  folder = tempFolder("http-crash");
});
afterEach(async () => {
  for (const server of servers.splice(0)) await server.stop();
  folder.remove();
});

async function post(url: string, body: unknown): Promise<{ status: number; json: any }> {
  const res = await fetch(url, { method: "POST", headers: { "content-type": "application/json" }, body: JSON.stringify(body) });
  return { status: res.status, json: await res.json() };
}

describe("job store: the server killed during saves over HTTP", () => {
  test("every acknowledged save survives kill -9; the database opens, integrity ok; the restarted server saves on", { timeout: 180_000 }, async () => {
    const first = await startServer({ dataDir: folder.dir });
    servers.push(first);
    const project = await post(`${first.url}/api/projects`, { name: "Crash over HTTP" });
    expect(project.status).toBe(201);
    const member = await post(`${first.url}/api/projects/${project.json.id}/members`, { job: example("workshop-box-beam.si") });
    expect(member.status).toBe(201);
    const revisions = `/api/projects/${project.json.id}/members/${member.json.memberId}/revisions`;

    // Four clients save in a loop; each 201 is an acknowledged save, kept with the fingerprint of what was sent.
    const acknowledged = new Map<number, string>([[1, member.json.revision.fingerprint]]);
    let killed = false;
    let inFlight = 0;
    const client = async (c: number) => {
      for (let i = 0; !killed; i++) {
        const job = example("workshop-box-beam.si");
        job.beam.loads[0].w = Number((1 + c / 10 + i / 1000).toFixed(4));
        job.member.description = `saved by client ${c}, save ${i}`;
        try {
          inFlight++;
          const res = await post(first.url + revisions, { job, note: `client ${c} #${i}` }).finally(() => inFlight--);
          if (res.status !== 201) throw new Error(`save answered ${res.status}: ${JSON.stringify(res.json).slice(0, 300)}`);
          const prepared = prepareJob(job);
          expect(res.json.revision.fingerprint).toBe(prepared.ok ? fingerprintOf(prepared.job) : "");
          acknowledged.set(res.json.revision.revision, res.json.revision.fingerprint);
        } catch (error) {
          if (killed) return; // the connection died with the server: not acknowledged
          throw error;
        }
      }
    };
    const clients = Promise.all([0, 1, 2, 3].map(client));
    const enough = (async () => {
      for (const deadline = Date.now() + 90_000; acknowledged.size < 20; await new Promise((resolve) => setTimeout(resolve, 20))) {
        if (Date.now() > deadline) throw new Error(`only ${acknowledged.size} saves acknowledged in 90 s`);
      }
    })();
    await Promise.race([enough, clients.then(() => Promise.reject(new Error("the clients stopped before the kill")))]);
    killed = true;
    const inFlightAtKill = inFlight;
    first.kill();
    await first.exited;
    await clients;
    // The kill came while saves were on their way, not between them.
    expect(inFlightAtKill).toBeGreaterThan(0);

    const db = new Database(join(folder.dir, DATABASE_FILE));
    try {
      expect(db.pragma("integrity_check", { simple: true })).toBe("ok");
      const rows = db.prepare("SELECT number, fingerprint, job FROM revisions WHERE member_id = ? ORDER BY number").all(member.json.memberId) as { number: number; fingerprint: string; job: string }[];
      expect(rows.map((r) => r.number)).toEqual(rows.map((_, i) => i + 1));
      const stored = new Map(rows.map((r) => [r.number, r.fingerprint]));
      for (const [number, fingerprint] of acknowledged) expect(stored.get(number), `acknowledged revision ${number}`).toBe(fingerprint);
      // At most the saves in flight at the kill (one per client) are stored without their answer.
      expect(rows.length - acknowledged.size).toBeLessThanOrEqual(4);
      for (const row of rows) {
        const prepared = prepareJob(JSON.parse(row.job));
        expect(prepared.ok).toBe(true);
        if (prepared.ok) expect(canonicalJson(prepared.job)).toBe(row.job);
      }
    } finally {
      db.close();
    }

    const second = await startServer({ dataDir: folder.dir });
    servers.push(second);
    expect(second.output()).not.toMatch(/error|refus/i);
    const listed = await (await fetch(second.url + revisions)).json();
    const count = (listed as unknown[]).length;
    expect(count).toBeGreaterThanOrEqual(acknowledged.size);
    const again = await post(second.url + revisions, { job: example("workshop-box-beam.si"), note: "after the restart" });
    expect(again.status).toBe(201);
    expect(again.json.revision.revision).toBe(count + 1);
  });
});
