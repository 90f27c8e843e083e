import { parseArgs } from "node:util";
import { buildApp } from "./app.js";

const { values } = parseArgs({
  options: {
    port: { type: "string", default: process.env.PORT ?? "4318" },
    host: { type: "string", default: "127.0.0.1" },
  },
});
const port = Number(values.port);
if (!Number.isInteger(port) || port < 0 || port > 65535) {
  console.error(`--port must be a whole number from 0 to 65535, not "${values.port}"`);
  process.exit(2);
}
if (values.host !== "127.0.0.1" && values.host !== "localhost" && values.host !== "::1") {
  console.warn(`Warning: listening on ${values.host} makes the service reachable from other machines. It has no login; use only on a trusted network.`);
}
const app = await buildApp();
await app.listen({ port, host: values.host });
const address = app.server.address();
const shown = typeof address === "object" && address ? address.port : port;
console.log(`stitchplan is running at http://${values.host === "::1" ? "[::1]" : values.host}:${shown}/  (Ctrl+C stops it)`);
for (const signal of ["SIGINT", "SIGTERM"] as const) process.on(signal, () => void app.close().then(() => process.exit(0)));
