// A worker thread of jit-tuning-child.ts: the examples' digest from a thread started after the flags were set.
import { parentPort } from "node:worker_threads";
import { examplesDigest } from "./jit-tuning-digest.js";

parentPort!.postMessage(examplesDigest(3));
