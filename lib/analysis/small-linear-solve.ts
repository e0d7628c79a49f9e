// Solves the 3x3 system m x = v (row-major m) by Gaussian elimination with
// partial pivoting. Returns null when the matrix is singular to working
// precision, so an iterative caller can damp harder instead of failing.
export function solve3(m: Float64Array, v: Float64Array): Float64Array | null {
  const a = Float64Array.from(m);
  const b = Float64Array.from(v);
  for (let col = 0; col < 3; col++) {
    let pivot = col;
    for (let r = col + 1; r < 3; r++) {
      if (Math.abs(a[r * 3 + col]) > Math.abs(a[pivot * 3 + col])) pivot = r;
    }
    if (a[pivot * 3 + col] === 0 || !Number.isFinite(a[pivot * 3 + col])) return null;
    if (pivot !== col) {
      for (let c = 0; c < 3; c++) {
        const tmp = a[col * 3 + c];
        a[col * 3 + c] = a[pivot * 3 + c];
        a[pivot * 3 + c] = tmp;
      }
      const tb = b[col];
      b[col] = b[pivot];
      b[pivot] = tb;
    }
    for (let r = col + 1; r < 3; r++) {
      const f = a[r * 3 + col] / a[col * 3 + col];
      for (let c = col; c < 3; c++) a[r * 3 + c] -= f * a[col * 3 + c];
      b[r] -= f * b[col];
    }
  }
  const x = new Float64Array(3);
  for (let r = 2; r >= 0; r--) {
    let s = b[r];
    for (let c = r + 1; c < 3; c++) s -= a[r * 3 + c] * x[c];
    x[r] = s / a[r * 3 + r];
  }
  for (let i = 0; i < 3; i++) if (!Number.isFinite(x[i])) return null;
  return x;
}
