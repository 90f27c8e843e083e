import type { Worker } from "node:worker_threads";
import { fromWire, type DesignTask, type TaskAnswer, type WireError } from "./design-tasks.js";
import { ApiError } from "./errors.js";
import { bundleThread, startThread } from "./thread-entry.js";

export interface DesignThreadsOptions {
  /** Worker threads; designs beyond that wait their turn. */
  threads: number;
  /** How long one task may run before its thread is stopped, ms. */
  timeLimitMs: (task: DesignTask) => number;
  /** A thread's heap, MiB: a task that needs more stops that thread (422), not the service. */
  memoryMb: number;
  /** Tasks that may wait for a thread; one more is refused with 503 and Retry-After. */
  queueLength: number;
  /** What the tasks are, for messages ("design", "worksheet"). */
  name: string;
}

/** What runs tasks: the routes see only this. */
export interface TaskRunner {
  /** `unbounded`: the task waits even when the queue is full (an import's own designs, already admitted). */
  run<T extends DesignTask>(task: T, options?: { unbounded?: boolean }): Promise<TaskAnswer<T>>;
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

/** Bundles the design threads' code once per process, before the first thread starts (see bundleThread). */
export const prepareDesignThreads = () => bundleThread(WORKER_ENTRY);

const seconds = (ms: number) => `${Number((ms / 1000).toPrecision(2))} s`;

/**
 * Designs and worksheets on worker threads, one task per thread at a time, so that the HTTP thread
 * stays free to answer and any task that runs past its time limit is stopped with its thread.
 * Threads start on the first task and are replaced when one is stopped or fails.
 */
export class DesignThreads implements TaskRunner {
  private readonly slots: Slot[] = [];
  private readonly queue: Pending[] = [];
  private nextId = 1;
  private closed = false;

  constructor(private readonly options: DesignThreadsOptions) {}

  run<T extends DesignTask>(task: T, options: { unbounded?: boolean } = {}): Promise<TaskAnswer<T>> {
    if (this.closed) return Promise.reject(new ApiError("ERR_INTERNAL", "The server is stopping; send the request again once it has restarted."));
    if (!options.unbounded && this.queue.length >= this.options.queueLength) {
      const retryAfter = Math.max(1, Math.ceil(this.options.timeLimitMs(task) / 1000 / 10));
      return Promise.reject(
        new ApiError("ERR_BUSY", `${this.queue.length} ${this.options.name}s are already waiting for a thread (the limit); send the request again in ${retryAfter} s. Nothing was stored or changed.`, [], { retryAfterSeconds: retryAfter }),
      );
    }
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
    const slot: Slot = { worker: startThread(WORKER_ENTRY, { maxOldGenerationSizeMb: this.options.memoryMb }), ready: false, current: null };
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
    let outOfMemory = false;
    slot.worker.on("error", (error) => {
      failure = error.message;
      outOfMemory ||= (error as NodeJS.ErrnoException).code === "ERR_WORKER_OUT_OF_MEMORY";
    });
    slot.worker.on("exit", () => {
      const index = this.slots.indexOf(slot);
      if (index < 0) return;
      this.slots.splice(index, 1);
      if (slot.current) {
        clearTimeout(slot.current.timer);
        if (outOfMemory) slot.current.reject(tooLarge(this.options.memoryMb, this.options.name));
        else slot.current.reject(new ApiError("ERR_INTERNAL", `The design thread failed on this job${failure ? ` (${failure})` : ""}; please report the job. Nothing was stored or changed.`));
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

function tooLarge(memoryMb: number, name: string): ApiError {
  return new ApiError("ERR_DESIGN_MEMORY_LIMIT", `The ${name} needed more than the memory limit of ${memoryMb} MiB and was stopped; nothing was stored or changed.`, [
    { path: "(document)", message: `needs more than ${memoryMb} MiB to ${name === "worksheet" ? "print" : "design"}; fewer spans, loads, patterned load categories or combinations make it smaller` },
  ]);
}

function tooLong(limitMs: number): ApiError {
  return new ApiError("ERR_DESIGN_TIME_LIMIT", `The design took longer than the limit of ${seconds(limitMs)} and was stopped; nothing was stored or changed.`, [
    {
      path: "(document)",
      message: `takes longer than ${seconds(limitMs)} to design; fewer spans, loads, patterned load categories or combinations shorten it`,
    },
  ]);
}

/**
 * Designs and worksheets on separate threads with separate queues, so a long worksheet never holds the
 * designs (nor a burst of designs the worksheets).
 */
export class DesignQueues implements TaskRunner {
  constructor(
    readonly designs: DesignThreads,
    readonly worksheets: DesignThreads,
  ) {}

  run<T extends DesignTask>(task: T, options?: { unbounded?: boolean }): Promise<TaskAnswer<T>> {
    return (task.kind === "worksheet" ? this.worksheets : this.designs).run(task, options);
  }

  warm(): void {
    this.designs.warm();
    this.worksheets.warm();
  }

  async close(): Promise<void> {
    await Promise.all([this.designs.close(), this.worksheets.close()]);
  }
}
