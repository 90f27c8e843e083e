import type { Worker } from "node:worker_threads";
import { fromWire, type DesignTask, type TaskAnswer, type WireError } from "./design-tasks.js";
import { ApiError } from "./errors.js";
import { startThread } from "./thread-entry.js";

export interface DesignThreadsOptions {
  /** Worker threads; designs beyond that wait their turn. */
  threads: number;
  /** How long one task may run before its thread is stopped, ms. */
  timeLimitMs: (task: DesignTask) => number;
}

interface Pending {
  task: DesignTask;
  resolve: (answer: unknown) => void;
  reject: (error: Error) => void;
}

interface Slot {
  worker: Worker;
  ready: boolean;
  current: (Pending & { id: number; timer: NodeJS.Timeout }) | null;
}

const WORKER_ENTRY = new URL("./design-worker.ts", import.meta.url);
/** A thread's heap: a result of tens of megabytes fits; a runaway stops that thread, not the service. */
const HEAP_MB = 1536;

const seconds = (ms: number) => `${Number((ms / 1000).toPrecision(2))} s`;

/**
 * Designs and worksheets on worker threads, one task per thread at a time, so that the HTTP thread
 * stays free to answer and any task that runs past its time limit is stopped with its thread.
 * Threads start on the first task and are replaced when one is stopped or fails.
 */
export class DesignThreads {
  private readonly slots: Slot[] = [];
  private readonly queue: Pending[] = [];
  private nextId = 1;
  private closed = false;

  constructor(private readonly options: DesignThreadsOptions) {}

  run<T extends DesignTask>(task: T): Promise<TaskAnswer<T>> {
    if (this.closed) return Promise.reject(new ApiError("ERR_INTERNAL", "The server is stopping; send the request again once it has restarted."));
    return new Promise<TaskAnswer<T>>((resolve, reject) => {
      this.queue.push({ task, resolve: resolve as (answer: unknown) => void, reject });
      this.dispatch();
    });
  }

  /** Starts the threads now rather than on the first task. */
  warm(): void {
    while (this.slots.length < this.options.threads) this.slots.push(this.start());
  }

  async close(): Promise<void> {
    this.closed = true;
    for (const pending of this.queue.splice(0)) pending.reject(new ApiError("ERR_INTERNAL", "The server stopped before this design was done."));
    await Promise.all(this.slots.splice(0).map((slot) => slot.worker.terminate()));
  }

  private dispatch(): void {
    if (this.closed) return;
    this.warm();
    for (const slot of this.slots) {
      if (this.queue.length === 0) return;
      if (!slot.ready || slot.current) continue;
      const pending = this.queue.shift()!;
      const id = this.nextId++;
      const limit = this.options.timeLimitMs(pending.task);
      const timer = setTimeout(() => this.stop(slot, tooLong(limit)), limit);
      slot.current = { ...pending, id, timer };
      try {
        slot.worker.postMessage({ id, task: pending.task });
      } catch (error) {
        // Input that cannot be copied to the thread (nested too deeply for the copier).
        clearTimeout(timer);
        slot.current = null;
        pending.reject(new ApiError("ERR_INPUT_INVALID", undefined, [{ path: "(document)", message: `cannot be read (${(error as Error).message}); is it nested too deeply?` }]));
      }
    }
  }

  private start(): Slot {
    const slot: Slot = { worker: startThread(WORKER_ENTRY, { maxOldGenerationSizeMb: HEAP_MB }), ready: false, current: null };
    slot.worker.on("message", (message: "ready" | { id: number; answer?: unknown; error?: WireError }) => {
      if (message === "ready") {
        slot.ready = true;
      } else if (slot.current?.id === message.id) {
        const { resolve, reject, timer } = slot.current;
        clearTimeout(timer);
        slot.current = null;
        if (message.error) reject(fromWire(message.error));
        else resolve(message.answer);
      }
      this.dispatch();
    });
    let failure = "";
    slot.worker.on("error", (error) => (failure = error.message));
    slot.worker.on("exit", () => {
      const index = this.slots.indexOf(slot);
      if (index < 0) return;
      this.slots.splice(index, 1);
      if (slot.current) {
        clearTimeout(slot.current.timer);
        slot.current.reject(new ApiError("ERR_INTERNAL", `The design thread failed on this job${failure ? ` (${failure})` : ""}; please report the job. Nothing was stored or changed.`));
      } else if (!slot.ready) {
        // A thread that cannot start would fail every task: answer those waiting instead of retrying forever.
        for (const pending of this.queue.splice(0)) pending.reject(new ApiError("ERR_INTERNAL", `The design thread did not start${failure ? ` (${failure})` : ""}.`));
        return;
      }
      this.dispatch();
    });
    return slot;
  }

  /** Stops a thread that is past its time limit; the task fails with `error`, the others carry on. */
  private stop(slot: Slot, error: ApiError): void {
    const index = this.slots.indexOf(slot);
    if (index >= 0) this.slots.splice(index, 1);
    slot.current?.reject(error);
    slot.current = null;
    void slot.worker.terminate();
    this.dispatch();
  }
}

function tooLong(limitMs: number): ApiError {
  return new ApiError("ERR_DESIGN_TIME_LIMIT", `The design took longer than the limit of ${seconds(limitMs)} and was stopped; nothing was stored or changed.`, [
    {
      path: "(document)",
      message: `takes longer than ${seconds(limitMs)} to design; fewer spans, loads, patterned load categories or combinations shorten it`,
    },
  ]);
}
