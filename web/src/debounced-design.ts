/**
 * Runs the design a while after the last edit; a newer run aborts an older one still in flight,
 * so an answer never lands on top of a newer input.
 */
export class DebouncedDesign {
  #timer: number | undefined;
  #inFlight: AbortController | undefined;

  constructor(
    private readonly run: (signal: AbortSignal) => Promise<void>,
    private readonly delayMs = 400,
  ) {}

  schedule(): void {
    clearTimeout(this.#timer);
    this.#timer = window.setTimeout(() => void this.now(), this.delayMs);
  }

  async now(): Promise<void> {
    clearTimeout(this.#timer);
    this.#inFlight?.abort();
    const controller = new AbortController();
    this.#inFlight = controller;
    try {
      await this.run(controller.signal);
    } catch (error) {
      if (!controller.signal.aborted) throw error;
    } finally {
      if (this.#inFlight === controller) this.#inFlight = undefined;
    }
  }
}
