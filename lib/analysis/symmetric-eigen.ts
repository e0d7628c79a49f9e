// Eigenvalues of a real symmetric 3x3 matrix by the cyclic Jacobi method.
// Chosen over the closed-form trigonometric solution because Jacobi keeps
// every eigenvalue accurate to round-off relative to the matrix norm, also for
// nearly repeated or nearly zero eigenvalues, where the acos form loses digits
// — and those are exactly the realizability boundary cases.

/**
 * Eigenvalues of [[a11,a12,a13],[a12,a22,a23],[a13,a23,a33]], sorted descending.
 */
export function symmetricEigenvalues3(
  a11: number, a22: number, a33: number, a12: number, a13: number, a23: number,
): [number, number, number] {
  const m = [a11, a12, a13, a12, a22, a23, a13, a23, a33];
  for (let sweep = 0; sweep < 50; sweep++) {
    const off = m[1] * m[1] + m[2] * m[2] + m[5] * m[5];
    const diag = m[0] * m[0] + m[4] * m[4] + m[8] * m[8];
    if (off === 0 || off <= 1e-34 * diag) break;
    rotate(m, 0, 1);
    rotate(m, 0, 2);
    rotate(m, 1, 2);
  }
  const e: [number, number, number] = [m[0], m[4], m[8]];
  e.sort((x, y) => y - x);
  return e;
}

/** One Jacobi rotation zeroing m[p][q] (row-major 3x3, symmetric, in place). */
function rotate(m: number[], p: number, q: number): void {
  const apq = m[p * 3 + q];
  if (apq === 0) return;
  const app = m[p * 3 + p];
  const aqq = m[q * 3 + q];
  // Stable choice of tan(theta) (Golub & Van Loan, symmetric Schur decomposition).
  const theta = (aqq - app) / (2 * apq);
  const t = Math.sign(theta || 1) / (Math.abs(theta) + Math.sqrt(theta * theta + 1));
  const c = 1 / Math.sqrt(t * t + 1);
  const s = t * c;
  for (let k = 0; k < 3; k++) {
    const mkp = m[k * 3 + p];
    const mkq = m[k * 3 + q];
    m[k * 3 + p] = c * mkp - s * mkq;
    m[k * 3 + q] = s * mkp + c * mkq;
  }
  for (let k = 0; k < 3; k++) {
    const mpk = m[p * 3 + k];
    const mqk = m[q * 3 + k];
    m[p * 3 + k] = c * mpk - s * mqk;
    m[q * 3 + k] = s * mpk + c * mqk;
  }
  // Exact zero where the rotation was designed to put one.
  m[p * 3 + q] = 0;
  m[q * 3 + p] = 0;
}
