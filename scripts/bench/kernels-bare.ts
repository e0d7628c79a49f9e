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
 * The decay fit's arithmetic written out in one function: ln k once, the
 * profile-SSE scan of ln d0 on 2,048 thinned samples (81 cells of width 1 from
 * ln(span) - 50), golden section to 1e-7, the full-resolution line at that
 * origin, then Levenberg–Marquardt on (c', n, ln d0) with the 3×3 step by
 * Cramer's rule. Returns n.
 */
export function bareDecayFit(t: Float64Array, k: Float64Array): number {
  const len = t.length;
  const logK = new Float64Array(len);
  for (let i = 0; i < len; i++) {
    if (!Number.isFinite(t[i]) || (i > 0 && !(t[i] > t[i - 1])) || !(k[i] > 0)) throw new Error(`bad sample ${i}`);
    logK[i] = Math.log(k[i]);
  }
  const thin = Math.min(len, 2048);
  const tt = new Float64Array(thin);
  const lt = new Float64Array(thin);
  const stride = (len - 1) / (thin - 1);
  for (let j = 0; j < thin; j++) {
    const i = len > 2048 ? Math.round(j * stride) : j;
    tt[j] = t[i];
    lt[j] = logK[i];
  }
  // OLS of ln k on log1p((t - t[0]) / e^s) about the first sample, then the SSE from explicit residuals.
  const line = (tv: Float64Array, lv: Float64Array, s: number) => {
    const d0 = Math.exp(s);
    const t1 = tv[0];
    const y0 = lv[0];
    let sx = 0, sy = 0, sxx = 0, sxy = 0;
    for (let i = 0; i < tv.length; i++) {
      const dx = Math.log1p((tv[i] - t1) / d0); // about the first sample, where log1p(0) = 0
      const dy = lv[i] - y0;
      sx += dx; sy += dy; sxx += dx * dx; sxy += dx * dy;
    }
    const m = tv.length;
    const slope = (sxy - (sx * sy) / m) / (sxx - (sx * sx) / m);
    const intercept = y0 + sy / m - slope * (sx / m);
    let sse = 0;
    for (let i = 0; i < tv.length; i++) {
      const r = lv[i] - intercept - slope * Math.log1p((tv[i] - t1) / d0);
      sse += r * r;
    }
    return { slope, intercept, sse };
  };
  const sStart = Math.log(tt[thin - 1] - tt[0]) - 50;
  let best = 0;
  let bestSse = Infinity;
  for (let j = 0; j <= 80; j++) {
    const sse = line(tt, lt, sStart + j).sse;
    if (sse < bestSse) { bestSse = sse; best = j; }
  }
  if (best === 0 || best === 80) throw new Error("no origin");
  const g = (Math.sqrt(5) - 1) / 2;
  let lo = sStart + best - 1;
  let hi = lo + 2;
  let s1 = hi - g * (hi - lo);
  let s2 = lo + g * (hi - lo);
  let f1 = line(tt, lt, s1).sse;
  let f2 = line(tt, lt, s2).sse;
  for (let it = 0; it < 200 && hi - lo > 1e-7; it++) {
    if (f1 <= f2) { hi = s2; s2 = s1; f2 = f1; s1 = hi - g * (hi - lo); f1 = line(tt, lt, s1).sse; }
    else { lo = s1; s1 = s2; f1 = f2; s2 = lo + g * (hi - lo); f2 = line(tt, lt, s2).sse; }
  }
  const s = f1 <= f2 ? s1 : s2;
  const full = line(t, logK, s);
  let c = full.intercept, n = -full.slope, l = s;
  const t1 = t[0];
  const sseAt = (cc: number, nn: number, ll: number) => {
    const d0 = Math.exp(ll);
    let sum = 0;
    for (let i = 0; i < len; i++) {
      const r = logK[i] - cc + nn * Math.log1p((t[i] - t1) / d0);
      sum += r * r;
    }
    return sum;
  };
  let sse = sseAt(c, n, l);
  let lambda = 1e-3;
  for (let it = 0; it < 100 && sse > 0; it++) {
    const d0 = Math.exp(l);
    let a00 = 0, a01 = 0, a02 = 0, a11 = 0, a12 = 0, a22 = 0, b0 = 0, b1 = 0, b2 = 0;
    for (let i = 0; i < len; i++) {
      const dt = t[i] - t1;
      const x = Math.log1p(dt / d0);
      const r = logK[i] - c + n * x;
      const j2 = (-n * dt) / (dt + d0);
      a00 += 1; a01 -= x; a02 -= j2; a11 += x * x; a12 += x * j2; a22 += j2 * j2;
      b0 += r; b1 -= x * r; b2 -= j2 * r;
    }
    let accepted = false;
    while (!accepted && lambda < 1e12) {
      const m00 = a00 * (1 + lambda), m11 = a11 * (1 + lambda), m22 = a22 * (1 + lambda);
      const det = m00 * (m11 * m22 - a12 * a12) - a01 * (a01 * m22 - a12 * a02) + a02 * (a01 * a12 - m11 * a02);
      const d0c = b0 * (m11 * m22 - a12 * a12) - a01 * (b1 * m22 - a12 * b2) + a02 * (b1 * a12 - m11 * b2);
      const d1c = m00 * (b1 * m22 - a12 * b2) - b0 * (a01 * m22 - a12 * a02) + a02 * (a01 * b2 - b1 * a02);
      const d2c = m00 * (m11 * b2 - b1 * a12) - a01 * (a01 * b2 - b1 * a02) + b0 * (a01 * a12 - m11 * a02);
      const st = [d0c / det, d1c / det, d2c / det];
      if (det !== 0 && st.every(Number.isFinite)) {
        const trialSse = sseAt(c + st[0], n + st[1], l + st[2]);
        if (trialSse <= sse) {
          const tiny = Math.abs(st[1]) <= 1e-14 * Math.abs(n + st[1]) && Math.abs(st[2]) <= 1e-14;
          const gain = sse - trialSse;
          c += st[0]; n += st[1]; l += st[2];
          sse = trialSse;
          accepted = true;
          lambda = Math.max(lambda / 10, 1e-12);
          if (tiny || gain <= 1e-14 * sse) return n;
        }
      }
      if (!accepted) lambda *= 10;
    }
    if (!accepted) return n;
  }
  return n;
}
