// A build whose runs hit every state the run page must show rather than hide:
// a profile long enough to be thinned, a log-law fit with no samples in its
// window, a station outside the c_f series, a decay with no power-law origin,
// non-realizable stresses, an oscillatory grid study, a step flow that never
// reattaches and one with a secondary bubble. Posted on a test branch only.

export const EDGE_BRANCH = "test/run-view";

/** Musker (1979) closed form, κ = 0.41, as written in reference sheet §1.3 (independent of lib/analysis). */
const musker = (y: number) => 5.424 * Math.atan((2 * y - 8.15) / 16.7) + Math.log10((y + 10.6) ** 9.6 / (y * y - 8.15 * y + 86) ** 2) - 3.52;

const logSpaced = (from: number, to: number, n: number) => Array.from({ length: n }, (_, i) => from * (to / from) ** (i / (n - 1)));
const linSpaced = (from: number, to: number, n: number) => Array.from({ length: n }, (_, i) => from + ((to - from) * i) / (n - 1));
const residual = (n: number, orders: number) => ({ key: "residual", x: linSpaced(1, 1000 * n, n), y: linSpaced(0, orders, n).map((o) => 10 ** -o) });

function stepWithCornerEddy(x: number): number {
  if (x < 0.6) return -0.0002;
  if (x < 1.5) return 0.0003;
  if (x < 6.3) return -0.0012 * Math.sin((Math.PI * (x - 1.5)) / 4.8);
  return 0.002 * (1 - Math.exp(-(x - 6.3)));
}

/** Number of u_plus samples in the long profile (more than the page draws). */
export const LONG_PROFILE_POINTS = 20_000;

export function buildEdgeCaseSubmission(commit: string) {
  const longY = logSpaced(0.2, 180, LONG_PROFILE_POINTS);
  const bufferOnly = logSpaced(0.5, 20, 60);
  const stepX = linSpaced(0.05, 30, 120);
  return {
    build: { solver: "Cormorant", version: "0.0.0-run-view", commit, branch: EDGE_BRANCH },
    runs: [
      {
        case: "channel-re180", model: "sa", status: "COMPLETED", iterations: 6000, wallSeconds: 70,
        series: [{ key: "u_plus", x: longY, y: longY.map((y) => musker(y)) }, residual(80, 5.5)],
      },
      {
        case: "flat-plate-zpg", model: "sst", status: "COMPLETED", iterations: 12000, wallSeconds: 300,
        series: [
          { key: "u_plus", x: bufferOnly, y: bufferOnly.map((y) => musker(y)) },
          // Ends before the station Re_x = 4.8504e6: c_f there cannot be interpolated.
          { key: "cf", x: logSpaced(1e5, 3e6, 80), y: logSpaced(1e5, 3e6, 80).map((r) => 0.0576 * r ** -0.2) },
          residual(100, 3.2),
        ],
      },
      {
        // Exponential decay has no virtual origin: the fit must fail, not invent n.
        case: "decaying-hit", model: "k-epsilon", status: "COMPLETED", iterations: 4000, wallSeconds: 12,
        series: [{ key: "k_decay", x: linSpaced(0, 20, 40), y: linSpaced(0, 20, 40).map((t) => Math.exp(-0.4 * t)) }],
        coefficients: [{ name: "C_eps2", value: 1.92 }],
      },
      {
        case: "homogeneous-shear", model: "lrr", status: "COMPLETED", iterations: 5000, wallSeconds: 15,
        stresses: [
          { at: 2, uu: 1.158, vv: 0.617, ww: 0.744, uv: -0.242, uw: 0, vw: 0 },
          { at: 6, uu: 2.09, vv: 0.8, ww: 1.1, uv: -0.577, uw: 0, vw: 0 },
          // Reference sheet §9.4 non-realizable examples: Schwarz broken, and a negative normal stress.
          { at: 10, uu: 1, vv: 1, ww: 1, uv: 1.2, uw: 0, vw: 0 },
          { at: 14, uu: 2.2, vv: -0.1, ww: 0.9, uv: 0, uw: 0, vw: 0 },
          { at: 18, uu: -1, vv: 0, ww: 0, uv: 0, uw: 0, vw: 0 },
        ],
      },
      {
        // Celik et al. 2008 Table 1, column 3: oscillatory convergence.
        case: "grid-study", model: "sa", status: "COMPLETED", iterations: 40000, wallSeconds: 5000,
        gridStudy: { quantity: "cf_at_x", cells: [18000, 4500, 980], values: [6.0042, 5.9624, 6.0909], dimension: 2 },
      },
      {
        case: "backstep", model: "sst", status: "COMPLETED", iterations: 20000, wallSeconds: 1500,
        series: [{ key: "cf", x: stepX, y: stepX.map((x) => -0.001 * Math.exp(-x / 10)) }, residual(100, 4)],
      },
      {
        // A small reversed region at the step, a corner eddy, then the primary bubble
        // to x/H = 6.3: two − to + crossings, the downstream one is the reattachment.
        case: "backstep", model: "k-omega", status: "COMPLETED", iterations: 20000, wallSeconds: 1500,
        series: [{ key: "cf", x: stepX, y: stepX.map(stepWithCornerEddy) }, residual(100, 4)],
      },
    ],
  };
}
