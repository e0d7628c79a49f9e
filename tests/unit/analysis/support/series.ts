// Test-only generators: grids and a seeded random source, so every "noisy"
// test is deterministic and can fail the same way on every machine.

/** n points from a to b, log-spaced, with both ends exactly a and b. */
export function logSpace(a: number, b: number, n: number): Float64Array {
  const out = new Float64Array(n);
  const la = Math.log(a);
  const step = (Math.log(b) - la) / (n - 1);
  for (let i = 0; i < n; i++) out[i] = Math.exp(la + step * i);
  out[0] = a;
  out[n - 1] = b;
  return out;
}

/** n points from a to b, evenly spaced, ends exact. */
export function linSpace(a: number, b: number, n: number): Float64Array {
  const out = new Float64Array(n);
  for (let i = 0; i < n; i++) out[i] = a + ((b - a) * i) / (n - 1);
  out[n - 1] = b;
  return out;
}

export function mapSeries(x: ArrayLike<number>, f: (v: number) => number): Float64Array {
  const out = new Float64Array(x.length);
  for (let i = 0; i < x.length; i++) out[i] = f(x[i]);
  return out;
}

/** Mulberry32: a small, well-mixed 32-bit PRNG; uniform in [0, 1). */
export function seededUniform(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

/** Standard normal deviates by Box–Muller from a seeded uniform source. */
export function seededNormal(seed: number): () => number {
  const u = seededUniform(seed);
  return () => {
    const u1 = Math.max(u(), 1e-300);
    return Math.sqrt(-2 * Math.log(u1)) * Math.cos(2 * Math.PI * u());
  };
}
