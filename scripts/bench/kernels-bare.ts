// Bare Float64Array loops doing the arithmetic of the lib/analysis fits, with
// the same input checks fused into the same pass (a finite check per element
// is part of the job, not overhead). Shifted sums as in lib/analysis/linear-fit.

export interface BareLine {
  slope: number;
  intercept: number;
}

function finishLine(n: number, x0: number, y0: number, sx: number, sy: number, sxx: number, sxy: number): BareLine {
  const mx = sx / n;
  const my = sy / n;
  const slope = (sxy - sx * my) / (sxx - sx * mx);
  return { slope, intercept: y0 + my - slope * (x0 + mx) };
}

/** OLS of u+ on ln y+ inside [lo, hi]: returns kappa = 1/slope and B. */
export function bareLogLaw(yPlus: Float64Array, uPlus: Float64Array, lo: number, hi: number): { kappa: number; b: number } {
  let n = 0, x0 = 0, y0 = 0, sx = 0, sy = 0, sxx = 0, sxy = 0;
  for (let i = 0; i < yPlus.length; i++) {
    const y = yPlus[i];
    const u = uPlus[i];
    if (!Number.isFinite(y) || !Number.isFinite(u) || y < 0) throw new Error(`bad sample ${i}`);
    if (y < lo || y > hi) continue;
    const lx = Math.log(y);
    if (n === 0) { x0 = lx; y0 = u; }
    n++;
    const dx = lx - x0, dy = u - y0;
    sx += dx; sy += dy; sxx += dx * dx; sxy += dx * dy;
  }
  const line = finishLine(n, x0, y0, sx, sy, sxx, sxy);
  return { kappa: 1 / line.slope, b: line.intercept };
}

/** Total drop in orders and the tail (last 20 % of iterations) log-linear drop. */
export function bareResidualDrop(it: Float64Array, r: Float64Array): { dropOrders: number; tailDropOrders: number } {
  const n = it.length;
  let prev = -Infinity;
  for (let i = 0; i < n; i++) {
    if (!Number.isFinite(it[i]) || !Number.isFinite(r[i]) || !(it[i] > prev) || !(r[i] > 0)) throw new Error(`bad sample ${i}`);
    prev = it[i];
  }
  const last = it[n - 1];
  const tailStart = last - 0.2 * (last - it[0]);
  let first = n - 1;
  while (first > 0 && it[first - 1] >= tailStart) first--;
  let m = 0, x0 = 0, y0 = 0, sx = 0, sy = 0, sxx = 0, sxy = 0;
  for (let i = first; i < n; i++) {
    const ly = Math.log10(r[i]);
    if (m === 0) { x0 = it[i]; y0 = ly; }
    m++;
    const dx = it[i] - x0, dy = ly - y0;
    sx += dx; sy += dy; sxx += dx * dx; sxy += dx * dy;
  }
  const line = finishLine(m, x0, y0, sx, sy, sxx, sxy);
  return { dropOrders: Math.log10(r[0] / r[n - 1]), tailDropOrders: -line.slope * (last - it[first]) };
}

/** Downstream-most negative-to-positive sign change of c_f, linearly interpolated. */
export function bareReattachment(x: Float64Array, cf: Float64Array): number | null {
  const n = x.length;
  let prev = -Infinity;
  for (let i = 0; i < n; i++) {
    if (!Number.isFinite(x[i]) || !Number.isFinite(cf[i]) || !(x[i] > prev)) throw new Error(`bad sample ${i}`);
    prev = x[i];
  }
  let xr: number | null = null;
  for (let i = 0; i < n - 1; i++) {
    if (cf[i] < 0 && cf[i + 1] > 0) xr = x[i] + ((0 - cf[i]) * (x[i + 1] - x[i])) / (cf[i + 1] - cf[i]);
  }
  return xr;
}

/** Mann–Kendall S over all pairs (Mann 1945; Kendall 1975): the O(n^2) core. */
export function bareMannKendallS(v: Float64Array): number {
  for (let i = 0; i < v.length; i++) if (!Number.isFinite(v[i])) throw new Error(`bad sample ${i}`);
  let s = 0;
  for (let i = 0; i < v.length - 1; i++) {
    const vi = v[i];
    for (let j = i + 1; j < v.length; j++) s += Math.sign(v[j] - vi);
  }
  Float64Array.from(v).sort(); // the tie count sorts once, as the library does
  return s;
}

/** Theil–Sen slope (Theil 1950; Sen 1968): median of all pairwise slopes. */
export function bareTheilSenSlope(x: Float64Array, y: Float64Array): number {
  const n = x.length;
  const slopes = new Float64Array((n * (n - 1)) / 2);
  let c = 0;
  for (let i = 0; i < n - 1; i++) for (let j = i + 1; j < n; j++) if (x[j] !== x[i]) slopes[c++] = (y[j] - y[i]) / (x[j] - x[i]);
  const s = slopes.subarray(0, c).sort();
  const m = c >> 1;
  return c % 2 === 1 ? s[m] : 0.5 * (s[m - 1] + s[m]);
}

/**
 * The least a decay fit must do: one OLS pass of ln k on ln t. The library also
 * searches the virtual origin t0 (several such passes), so this is a lower
 * bound, not the same arithmetic; its ratio is reported as such.
 */
export function bareLogLogPass(t: Float64Array, k: Float64Array): number {
  let n = 0, x0 = 0, y0 = 0, sx = 0, sy = 0, sxx = 0, sxy = 0;
  for (let i = 0; i < t.length; i++) {
    if (!Number.isFinite(t[i]) || !(k[i] > 0)) throw new Error(`bad sample ${i}`);
    const lx = Math.log(t[i]);
    const ly = Math.log(k[i]);
    if (n === 0) { x0 = lx; y0 = ly; }
    n++;
    const dx = lx - x0, dy = ly - y0;
    sx += dx; sy += dy; sxx += dx * dx; sxy += dx * dy;
  }
  return -finishLine(n, x0, y0, sx, sy, sxx, sxy).slope;
}
