import { AnalysisError } from "./errors";

// Ordinary least squares accumulated in one pass with Welford's centred
// updates, shared by the log-law and decay fits. Centring keeps the slope
// accurate when x is large and narrow (e.g. ln y+ over 1e4..1e5), and one pass
// with no intermediate arrays keeps 10^6-point fits at bare-loop cost.

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
  private mx = 0;
  private my = 0;
  private sxx = 0;
  private sxy = 0;
  private syy = 0;

  add(x: number, y: number): void {
    this.n++;
    const dx = x - this.mx;
    const dy = y - this.my;
    this.mx += dx / this.n;
    this.my += dy / this.n;
    // Products of the pre- and post-update deviations: the exact Welford form.
    this.sxx += dx * (x - this.mx);
    this.sxy += dx * (y - this.my);
    this.syy += dy * (y - this.my);
  }

  get count(): number {
    return this.n;
  }

  /** Slope, intercept, r^2 and SSE; throws when the abscissae do not vary. */
  finish(subject: string): LineFit {
    if (this.n < 2) throw new AnalysisError(subject, `needs at least 2 points, got ${this.n}`);
    if (!(this.sxx > 0)) {
      throw new AnalysisError(subject, "all abscissae are equal; no slope can be fitted");
    }
    const slope = this.sxy / this.sxx;
    const intercept = this.my - slope * this.mx;
    // SSE = Syy - Sxy^2/Sxx may go slightly negative by round-off; clamp at 0.
    const sse = Math.max(0, this.syy - slope * this.sxy);
    const r2 = this.syy === 0 ? 1 : 1 - sse / this.syy;
    return { slope, intercept, r2, sse, points: this.n };
  }
}
