#!/usr/bin/env node
// Runs the TypeScript command line directly (no build step): tsx compiles the sources as they load.
import { register } from "tsx/esm/api";

register();
const { main } = await import("../server/cli/main.ts");
const code = await main(process.argv.slice(2));
// serve keeps running (-1); every other command ends with its status.
if (code >= 0) process.exitCode = code;
