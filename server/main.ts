import { parseArgs } from "node:util";
import { serve } from "./serve.js";

const { values } = parseArgs({
  options: {
    port: { type: "string", default: process.env.PORT ?? "4318" },
    host: { type: "string", default: "127.0.0.1" },
    data: { type: "string" },
    threads: { type: "string" },
  },
});
const code = await serve(values);
if (code !== undefined) process.exit(code);
