import { AnalysisError } from "./errors";

// Ordinary least squares accumulated in one pass, shared by the log-law, decay
// and residual fits. Sums are taken about the first sample (a shift, not the
// mean), which removes the cancellation of raw sums when x is large and narrow
// (e.g. ln y+ over 1e4..1e5) while costing no division per sample, so a
// 10^6-sample fit runs at bare-loop speed.

export interface LineFit {
  slope: number;
  intercept: number;
  r2: number;
  /** Sum of squared residuals. */
  sse: number;
  points: number;
}

export class LineAccumulator {
  private n = 0;
  private x0 = 0;
  private y0 = 0;
  private sx = 0;
  private sy = 0;
  private sxx = 0;
  private sxy = 0;
  private syy = 0;

  add(x: number, y: number): void {
    if (this.n === 0) {
      this.x0 = x;
      this.y0 = y;
    }
    this.n++;
    const dx = x - this.x0;
    const dy = y - this.y0;
    this.sx += dx;
    this.sy += dy;
    this.sxx += dx * dx;
    this.sxy += dx * dy;
    this.syy += dy * dy;
  }

  get count(): number {
    return this.n;
  }

  /** Slope, intercept, r^2 and SSE; throws when the abscissae do not vary. */
  finish(subject: string): LineFit {
    const n = this.n;
    if (n < 2) throw new AnalysisError(subject, `needs at least 2 points, got ${n}`);
    const mx = this.sx / n;
    const my = this.sy / n;
    const cxx = this.sxx - this.sx * mx;
    const cxy = this.sxy - this.sx * my;
    const cyy = this.syy - this.sy * my;
    if (!(cxx > 0)) throw new AnalysisError(subject, "all abscissae are equal; no slope can be fitted");
    const slope = cxy / cxx;
    const intercept = this.y0 + my - slope * (this.x0 + mx);
    // SSE = Cyy - Cxy^2/Cxx may go slightly negative by round-off; clamp at 0.
    const sse = Math.max(0, cyy - slope * cxy);
    const r2 = cyy <= 0 ? 1 : 1 - sse / cyy;
    return { slope, intercept, r2, sse, points: n };
  }
}
