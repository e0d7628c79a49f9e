// Thinning a long series for drawing. A plot 1000 px wide cannot show a million
// samples, but it must still show every spike: each bucket of consecutive
// samples keeps its lowest and its highest y (in their original order), and the
// first and last samples are always kept, so the envelope of an oscillating
// residual or a c_f peak survives. Derived quantities never use thinned data.

export interface ThinnedSeries {
  x: number[];
  y: number[];
  totalPoints: number;
}

export function thinSeries(x: ArrayLike<number>, y: ArrayLike<number>, maxPoints: number): ThinnedSeries {
  const n = Math.min(x.length, y.length);
  const limit = Math.max(4, Math.floor(maxPoints));
  if (n <= limit) return { x: Array.from({ length: n }, (_, i) => x[i]), y: Array.from({ length: n }, (_, i) => y[i]), totalPoints: n };
  const buckets = Math.floor((limit - 2) / 2);
  const keep: number[] = [0];
  // Interior samples 1 … n-2 split into `buckets` runs of (almost) equal length.
  for (let b = 0; b < buckets; b++) {
    const from = 1 + Math.floor((b * (n - 2)) / buckets);
    const to = 1 + Math.floor(((b + 1) * (n - 2)) / buckets);
    if (to <= from) continue;
    let lo = from;
    let hi = from;
    for (let i = from + 1; i < to; i++) {
      if (y[i] < y[lo]) lo = i;
      if (y[i] > y[hi]) hi = i;
    }
    if (lo === hi) keep.push(lo);
    else keep.push(Math.min(lo, hi), Math.max(lo, hi));
  }
  keep.push(n - 1);
  return { x: keep.map((i) => x[i]), y: keep.map((i) => y[i]), totalPoints: n };
}
