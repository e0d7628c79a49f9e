// Abscissae for drawing analytic curves smoothly on linear or log axes.

export function linSpace(from: number, to: number, count: number): number[] {
  if (count < 2) return [from];
  return Array.from({ length: count }, (_, i) => from + ((to - from) * i) / (count - 1));
}

/** `count` points evenly spaced in log10 between two positive bounds (ends exact). */
export function logSpace(from: number, to: number, count: number): number[] {
  if (!(from > 0) || !(to > 0)) return [];
  if (count < 2) return [from];
  const a = Math.log10(from);
  const b = Math.log10(to);
  return Array.from({ length: count }, (_, i) => (i === 0 ? from : i === count - 1 ? to : 10 ** (a + ((b - a) * i) / (count - 1))));
}

/** Evaluates f at each x, turning a thrown error or a non-finite result into a gap (NaN breaks the curve). */
export function sampleCurve(xs: number[], f: (x: number) => number): { x: number; y: number }[] {
  return xs.map((x) => {
    try {
      const y = f(x);
      return { x, y: Number.isFinite(y) ? y : Number.NaN };
    } catch {
      return { x, y: Number.NaN };
    }
  });
}
