// Timing helpers shared by every bench section.

export interface Timing {
  samples: number[];
  median: number;
  p95: number;
}

/** Wall time of `fn` in milliseconds (high-resolution clock). */
export async function timeOnce(fn: () => Promise<unknown> | unknown): Promise<number> {
  const start = process.hrtime.bigint();
  await fn();
  return Number(process.hrtime.bigint() - start) / 1e6;
}

/** Runs `fn` `warmup` times untimed, then `repeats` times timed. */
export async function timeRepeated(fn: (i: number) => Promise<unknown> | unknown, repeats: number, warmup = 1): Promise<Timing> {
  for (let i = 0; i < warmup; i++) await fn(-1 - i);
  const samples: number[] = [];
  for (let i = 0; i < repeats; i++) samples.push(await timeOnce(() => fn(i)));
  return summarise(samples);
}

/** Like timeRepeated for calls that measure themselves (e.g. to an answer's last byte) and return milliseconds. */
export async function measureRepeated(fn: (i: number) => Promise<number>, repeats: number, warmup = 1): Promise<Timing> {
  for (let i = 0; i < warmup; i++) await fn(-1 - i);
  const samples: number[] = [];
  for (let i = 0; i < repeats; i++) samples.push(await fn(i));
  return summarise(samples);
}

export function summarise(samples: number[]): Timing {
  return { samples, median: quantile(samples, 0.5), p95: quantile(samples, 0.95) };
}

// Linear interpolation between order statistics (type 7, the common default of
// R and NumPy): with few repetitions p95 lies between the two largest samples.
function quantile(samples: number[], q: number): number {
  const s = [...samples].sort((a, b) => a - b);
  if (s.length === 0) return Number.NaN;
  const h = (s.length - 1) * q;
  const lo = Math.floor(h);
  const hi = Math.min(lo + 1, s.length - 1);
  return s[lo] + (h - lo) * (s[hi] - s[lo]);
}

export function ratio(a: number, b: number): number {
  return b > 0 ? a / b : Number.NaN;
}
