import type { MarkerPoint, XY } from "@/components/charts/plot-types";
import { linSpace } from "@/components/charts/sampling";
import { analyseStressSample } from "@/lib/analysis";
import { formatSig } from "@/lib/format/numbers";
import type { StressView } from "./run-data";

// Boundaries of the two anisotropy maps (reference sheet §9.2–9.3): the Lumley
// triangle in Pope's (ξ, η) and the barycentric map of Banerjee et al. (2007)
// with vertices 1C (1, 0), 2C (0, 0), 3C (1/2, √3/2).

export const LUMLEY_VERTICES = {
  isotropic: { x: 0, y: 0 },
  oneComponent: { x: 1 / 3, y: 1 / 3 },
  twoComponentAxisymmetric: { x: -1 / 6, y: 1 / 6 },
} as const;

export const BARYCENTRIC_VERTICES = {
  oneComponent: { x: 1, y: 0 },
  twoComponent: { x: 0, y: 0 },
  threeComponent: { x: 0.5, y: Math.sqrt(3) / 2 },
} as const;

/** η on the two-component line, η = sqrt(1/27 + 2ξ³) (F = 1 + 9 II + 27 III = 0). */
export function twoComponentEta(xi: number): number {
  return Math.sqrt(1 / 27 + 2 * xi ** 3);
}

export function lumleyBoundaries(): { prolate: XY[]; oblate: XY[]; twoComponent: XY[] } {
  const { isotropic, oneComponent, twoComponentAxisymmetric } = LUMLEY_VERTICES;
  return {
    // ξ = +η: one large eigenvalue (rod-like); ξ = −η: one small eigenvalue (disk-like).
    prolate: [isotropic, oneComponent],
    oblate: [isotropic, twoComponentAxisymmetric],
    twoComponent: linSpace(-1 / 6, 1 / 3, 120).map((x) => ({ x, y: twoComponentEta(x) })),
  };
}

export function barycentricOutline(): XY[] {
  const { oneComponent, twoComponent, threeComponent } = BARYCENTRIC_VERTICES;
  return [twoComponent, oneComponent, threeComponent, twoComponent];
}

/**
 * A state given by its anisotropy b_ij (as homogeneous shear reports its
 * asymptotic b11, b22, b33, b12) placed on both maps: R = 2k (b + I/3) with k = 1.
 */
export function placeAnisotropy(b: { b11: number; b22: number; b33: number; b12: number }) {
  const a = analyseStressSample({ uu: 2 * (b.b11 + 1 / 3), vv: 2 * (b.b22 + 1 / 3), ww: 2 * (b.b33 + 1 / 3), uv: 2 * b.b12, uw: 0, vw: 0 });
  return { lumley: { x: a.xi, y: a.eta }, barycentric: { x: a.barycentric.x, y: a.barycentric.y }, realizable: a.realizable };
}

export interface MapPoints {
  realizable: { lumley: MarkerPoint[]; barycentric: MarkerPoint[] };
  violating: { lumley: MarkerPoint[]; barycentric: MarkerPoint[] };
  /** Non-realizable samples with no invariants (k <= 0): listed, not placed. */
  unplaced: number;
}

/** Splits the samples into realizable and not, with a tag (their position `at`) when there are few. */
export function placeSamples(samples: StressView[]): MapPoints {
  const tagged = samples.length <= 12;
  const out: MapPoints = { realizable: { lumley: [], barycentric: [] }, violating: { lumley: [], barycentric: [] }, unplaced: 0 };
  samples.forEach((s, i) => {
    const group = s.realizable ? out.realizable : out.violating;
    const note = `sample ${i + 1}, at = ${formatSig(s.at, 4)}, k = ${formatSig(s.k, 4)}, F = ${formatSig(s.lumleyF, 3)}`;
    const tag = tagged ? formatSig(s.at, 3) : undefined;
    const key = String(i + 1);
    const placed = s.xi !== null && s.eta !== null;
    if (placed) group.lumley.push({ x: s.xi as number, y: s.eta as number, note, tag, key });
    if (s.barycentricX !== null && s.barycentricY !== null) group.barycentric.push({ x: s.barycentricX, y: s.barycentricY, note, tag, key });
    if (!placed && !s.realizable) out.unplaced += 1;
  });
  return out;
}

/** Axis ranges holding the map's outline and every placed point, with a margin. */
export function mapRange(outline: XY[], points: XY[], margin: number): { x: [number, number]; y: [number, number] } {
  const all = [...outline, ...points].filter((p) => Number.isFinite(p.x) && Number.isFinite(p.y));
  const xs = all.map((p) => p.x);
  const ys = all.map((p) => p.y);
  return {
    x: [Math.min(...xs) - margin, Math.max(...xs) + margin],
    y: [Math.min(...ys) - margin, Math.max(...ys) + margin],
  };
}
