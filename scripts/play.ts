// Scratch file for trying core functions: `npm run play`. Keep it runnable; change freely.
import { readFileSync } from "node:fs";
import { designMember, formatNumber, prepareJob } from "../core/index.js";

const prepared = prepareJob(JSON.parse(readFileSync(new URL("../fixtures/examples/workshop-box-beam.si.json", import.meta.url), "utf8")));
if (!prepared.ok) throw new Error(JSON.stringify(prepared.issues, null, 2));
const result = designMember(prepared.core);
for (const s of result.schedules) {
  console.log(`joint ${s.joint}: ${s.count} connectors`);
  for (const z of s.zones) console.log(`  ${formatNumber(z.from)}–${formatNumber(z.to)} mm at ${formatNumber(z.spacing)} mm, utilisation ${z.utilisation.toFixed(2)}`);
}
