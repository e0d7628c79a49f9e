// Axis ranges, tick positions and tick labels as an engineer draws them by hand:
// decades on log axes, 1-2-5 steps on linear axes, and one power of ten moved
// into the axis title instead of "0.0027" repeated on every tick.

const MINUS = "\u2212";
const SUP: Record<string, string> = { "-": "⁻", "0": "⁰", "1": "¹", "2": "²", "3": "³", "4": "⁴", "5": "⁵", "6": "⁶", "7": "⁷", "8": "⁸", "9": "⁹" };

/** 10 to an integer power as "10⁻³". */
export function formatPowerOfTen(exponent: number): string {
  return `10${String(exponent).split("").map((c) => SUP[c] ?? c).join("")}`;
}

/**
 * Range of a log axis: the data snapped outwards to 1, 2 or 5 × 10ⁿ when they
 * span two decades or more (a whole empty decade at each end wastes the plot),
 * otherwise the data widened by a factor 1.25 each way. Non-positive values are ignored
 * (they have no place on a log axis; callers say how many they dropped).
 */
export function logExtent(values: Iterable<number>): [number, number] {
  let lo = Infinity;
  let hi = -Infinity;
  for (const v of values) {
    if (!(v > 0) || !Number.isFinite(v)) continue;
    if (v < lo) lo = v;
    if (v > hi) hi = v;
  }
  if (lo === Infinity) return [1, 10];
  if (lo === hi) return [lo / 2, hi * 2];
  // 5 % headroom first, so the end samples never sit on the frame.
  if (Math.log10(hi / lo) >= 2) return [snapLog(lo / 1.05, "down"), snapLog(hi * 1.05, "up")];
  return [lo / 1.25, hi * 1.25];
}

function snapLog(v: number, direction: "down" | "up"): number {
  const e = Math.floor(Math.log10(v));
  const steps = direction === "down" ? [5, 2, 1] : [1, 2, 5, 10];
  for (const m of steps) {
    const candidate = m * 10 ** e;
    const ok = direction === "down" ? candidate <= v * (1 + 1e-12) : candidate >= v * (1 - 1e-12);
    if (ok) return candidate;
  }
  return direction === "down" ? 10 ** e : 10 ** (e + 1);
}

/** Range of a linear axis: the data padded by `pad` of their span (a flat series gets ±10 %, or ±1 around 0). */
export function linearExtent(values: Iterable<number>, pad = 0.06): [number, number] {
  let lo = Infinity;
  let hi = -Infinity;
  for (const v of values) {
    if (!Number.isFinite(v)) continue;
    if (v < lo) lo = v;
    if (v > hi) hi = v;
  }
  if (lo === Infinity) return [0, 1];
  if (lo === hi) {
    const half = lo === 0 ? 1 : Math.abs(lo) * 0.1;
    return [lo - half, hi + half];
  }
  const span = hi - lo;
  return [lo - pad * span, hi + pad * span];
}

/** Tick values of a log axis: decades, thinned when there are many, with 2 and 5 added when there are few. */
export function logTicks(min: number, max: number): number[] {
  if (!(min > 0) || !(max > min)) return [];
  const first = Math.ceil(Math.log10(min) - 1e-9);
  const last = Math.floor(Math.log10(max) + 1e-9);
  const decades = last - first + 1;
  if (decades >= 3) {
    const every = Math.ceil(decades / 10);
    const ticks: number[] = [];
    for (let e = first; e <= last; e++) if ((e - first) % every === 0) ticks.push(10 ** e);
    return ticks;
  }
  const ticks: number[] = [];
  for (let e = first - 1; e <= last; e++) {
    for (const m of [1, 2, 5]) {
      const v = m * 10 ** e;
      if (v >= min * (1 - 1e-9) && v <= max * (1 + 1e-9)) ticks.push(v);
    }
  }
  return ticks;
}

/** The 2…9 multiples of each decade inside [min, max], for a faint minor grid. */
export function logMinorTicks(min: number, max: number): number[] {
  if (!(min > 0) || !(max > min)) return [];
  const out: number[] = [];
  for (let e = Math.floor(Math.log10(min)); e <= Math.ceil(Math.log10(max)); e++) {
    for (let m = 2; m <= 9; m++) {
      const v = m * 10 ** e;
      if (v > min && v < max) out.push(v);
    }
  }
  return out;
}

/** Step of a linear axis: 1, 2 or 5 times a power of ten giving about `target` intervals. */
export function niceStep(min: number, max: number, target = 6): number {
  const raw = (max - min) / Math.max(1, target);
  if (!(raw > 0) || !Number.isFinite(raw)) return 1;
  const power = 10 ** Math.floor(Math.log10(raw));
  const m = raw / power;
  return (m <= 1.5 ? 1 : m <= 3 ? 2 : m <= 7 ? 5 : 10) * power;
}

export function linearTicks(min: number, max: number, target = 6): number[] {
  const step = niceStep(min, max, target);
  const ticks: number[] = [];
  for (let v = Math.ceil(min / step - 1e-9) * step; v <= max + step * 1e-9; v += step) {
    // Snap round-off (0.30000000000000004) and signed zero.
    const snapped = Number((Math.round(v / step) * step).toPrecision(12));
    ticks.push(snapped === 0 ? 0 : snapped);
  }
  return ticks;
}

/**
 * Power of ten to move into the axis title of a linear axis: −3 for c_f ≈ 0.0027
 * (ticks then read "2.70" with the title "c_f × 10³"), 0 when plain numbers read well.
 */
export function axisExponent(min: number, max: number): number {
  const big = Math.max(Math.abs(min), Math.abs(max));
  if (!(big > 0) || !Number.isFinite(big)) return 0;
  if (big >= 1e-2 && big < 1e5) return 0;
  return Math.floor(Math.log10(big));
}

/** Text for the title suffix of an axis with `exponent` moved out: "× 10³" shows the factor applied to the values. */
export function exponentSuffix(exponent: number): string {
  return exponent === 0 ? "" : ` × ${formatPowerOfTen(-exponent)}`;
}

/** Tick label of a linear axis: as many decimals as the step needs, a true minus sign. */
export function formatLinearTick(value: number, step: number, exponent = 0): string {
  const scaled = value / 10 ** exponent;
  const scaledStep = step / 10 ** exponent;
  const decimals = Math.max(0, Math.min(8, -Math.floor(Math.log10(scaledStep) + 1e-9)));
  const text = scaled.toFixed(decimals);
  return /^-0(\.0*)?$/.test(text) ? text.slice(1) : text.replace(/^-/, MINUS);
}

/** Whether a log axis writes every tick as a power of ten: when any tick lies outside 0.01 … 10⁴. */
export function needsPowersOfTen(ticks: number[]): boolean {
  return ticks.some((t) => t < 0.01 || t >= 1e4);
}

/**
 * Tick label of a log axis: plain numbers from 0.01 to 10⁴, powers of ten (with
 * a 2× or 5× mantissa) beyond; `powers` writes every tick of the axis that way
 * so one axis never mixes "0.1" with "10⁻³".
 */
export function formatLogTick(value: number, powers = false): string {
  if (!(value > 0)) return "";
  const e = Math.floor(Math.log10(value) + 1e-9);
  const mantissa = Math.round(value / 10 ** e);
  if (!powers && value >= 0.01 && value < 1e4) return Number(value.toPrecision(6)).toString();
  return mantissa === 1 ? formatPowerOfTen(e) : `${mantissa}×${formatPowerOfTen(e)}`;
}
