/** Median and 95th percentile of `runs` timed calls, ms, after a warm-up. */
export function timeIt(fn: () => void, runs: number): { median: number; p95: number } {
  for (let i = 0; i < Math.min(20, runs); i++) fn();
  const t: number[] = [];
  for (let i = 0; i < runs; i++) {
    const t0 = performance.now();
    fn();
    t.push(performance.now() - t0);
  }
  t.sort((a, b) => a - b);
  return { median: t[Math.floor(runs / 2)]!, p95: t[Math.floor(runs * 0.95)]! };
}

/** The same for an asynchronous call. */
export async function timeAsync(fn: () => Promise<unknown>, runs: number, warmUp = 2): Promise<{ median: number; p95: number; all: number[] }> {
  for (let i = 0; i < warmUp; i++) await fn();
  const t: number[] = [];
  for (let i = 0; i < runs; i++) {
    const t0 = performance.now();
    await fn();
    t.push(performance.now() - t0);
  }
  const all = [...t];
  t.sort((a, b) => a - b);
  return { median: t[Math.floor(runs / 2)]!, p95: t[Math.min(runs - 1, Math.floor(runs * 0.95))]!, all };
}
