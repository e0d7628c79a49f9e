"use client";

import { PLOT_COLOURS } from "@/components/charts/chart-theme";
import { PlotFrame } from "@/components/charts/plot-frame";
import type { NoteLine, PlotCurve, PlotMarkers, XY } from "@/components/charts/plot-types";
import { svgSub } from "@/components/charts/svg-label";
import { Panel } from "@/components/ui/panel";
import { formatSig } from "@/lib/format/numbers";
import { barycentricOutline, BARYCENTRIC_VERTICES, LUMLEY_VERTICES, lumleyBoundaries, mapRange, placeAnisotropy, placeSamples } from "./anisotropy-geometry";
import { valueWithVerdict } from "./note-format";
import { findQuantity, type RunView } from "./run-data";
import { SelectedSample } from "./selected-sample";
import { StressViolations } from "./stress-violations";
import { useSampleSelection } from "./use-sample-selection";

/** Reynolds-stress samples on the Lumley triangle and the barycentric map, non-realizable ones picked out. */
export function AnisotropyPanel({ run }: { run: RunView }) {
  const placed = placeSamples(run.stresses);
  const asymptotic = reportedState(run);
  const q = findQuantity(run, "realizability_violations");
  const bad = run.stresses.filter((s) => !s.realizable).length;
  const [selected, select] = useSampleSelection(run.stresses.length);
  const pick = (_: string, p: { key?: string }) => (p.key && /^[0-9]+$/.test(p.key) ? select(Number(p.key)) : undefined);
  const highlight = (map: "lumley" | "barycentric"): PlotMarkers[] => {
    const all = [...placed.realizable[map], ...placed.violating[map]];
    const p = selected !== null ? all.find((q) => q.key === String(selected)) : undefined;
    return p ? [{ id: "selected", label: `selected sample ${selected}`, points: [{ x: p.x, y: p.y, note: p.note }], shape: "ring", size: 18, color: PLOT_COLOURS.extra }] : [];
  };

  const sampleSets = (map: "lumley" | "barycentric"): PlotMarkers[] => [
    { id: "ok", label: "realizable sample, labelled by its position “at”", points: placed.realizable[map], shape: "circle", size: 7, color: PLOT_COLOURS.fit },
    ...(placed.violating[map].length ? [{ id: "bad", label: "NOT realizable", points: placed.violating[map], shape: "cross" as const, size: 10, color: PLOT_COLOURS.bad }] : []),
    ...(asymptotic ? [{ id: "asymptotic", label: "reported asymptotic state (b_ij quantities)", points: [asymptotic[map]], shape: "diamond" as const, size: 10, hollow: true, color: PLOT_COLOURS.reference }] : []),
  ];

  const edges = lumleyBoundaries();
  const lumleyCurves: PlotCurve[] = [
    { id: "prolate", label: "axisymmetric, one large eigenvalue (ξ = η)", points: edges.prolate, style: { color: PLOT_COLOURS.guide, width: 1.6 } },
    { id: "oblate", label: "axisymmetric, one small eigenvalue (ξ = −η)", points: edges.oblate, style: { color: PLOT_COLOURS.guide, width: 1.6, dash: "5 3" } },
    { id: "two-c", label: "two-component limit η = (1/27 + 2ξ³)^½", points: edges.twoComponent, style: { color: PLOT_COLOURS.composite, width: 1.6 } },
  ];
  const lumleyVertices = vertexMarkers([
    { ...LUMLEY_VERTICES.isotropic, tag: "isotropic" },
    { ...LUMLEY_VERTICES.oneComponent, tag: "1C" },
    { ...LUMLEY_VERTICES.twoComponentAxisymmetric, tag: "2C axisym." },
  ]);
  const lumleyPoints = [...placed.realizable.lumley, ...placed.violating.lumley, ...(asymptotic ? [asymptotic.lumley] : [])];
  const lumleyRange = mapRange([...edges.twoComponent, LUMLEY_VERTICES.isotropic], lumleyPoints, 0.035);

  const outline = barycentricOutline();
  const baryVertices = vertexMarkers([
    { ...BARYCENTRIC_VERTICES.oneComponent, tag: "1C" },
    { ...BARYCENTRIC_VERTICES.twoComponent, tag: "2C" },
    { ...BARYCENTRIC_VERTICES.threeComponent, tag: "3C (isotropic)" },
  ]);
  const baryPoints = [...placed.realizable.barycentric, ...placed.violating.barycentric, ...(asymptotic ? [asymptotic.barycentric] : [])];
  const baryRange = mapRange(outline, baryPoints, 0.06);

  const notes: NoteLine[] = [
    { text: `${run.stresses.length} sample${run.stresses.length === 1 ? "" : "s"}, ${bad} not realizable`, tone: bad > 0 ? "bad" : "strong" },
    ...(q ? [{ text: `realizability_violations = ${valueWithVerdict(q, 3)}` }] : []),
    ...(placed.unplaced ? [{ text: `${placed.unplaced} with k ≤ 0 cannot be placed (listed below)`, tone: "bad" as const }] : []),
  ];

  return (
    <Panel title="Reynolds-stress anisotropy" subtitle="invariants of b_ij = R_ij/(2k) − δ_ij/3 on the Lumley triangle and the barycentric map" className="lg:col-span-2">
      <div className="grid gap-6 md:grid-cols-2">
        <div>
          <h3 className="mb-1 text-xs font-semibold tracking-tight">Lumley triangle (Pope&apos;s ξ, η)</h3>
          <PlotFrame
            ariaLabel="Anisotropy invariant map in xi and eta with the Lumley triangle boundaries"
            x={{ kind: "linear", min: lumleyRange.x[0], max: lumleyRange.x[1], label: "ξ = (III/2)^⅓", symbol: "ξ" }}
            y={{ kind: "linear", min: lumleyRange.y[0], max: lumleyRange.y[1], label: "η = (−II/3)^½", symbol: "η" }}
            equalAspect
            maxWidth={620}
            curves={lumleyCurves}
            markers={[lumleyVertices, ...sampleSets("lumley"), ...highlight("lumley")]}
            onPointClick={pick}
            notes={[{ corner: "auto", prefer: ["top-left", "bottom-right", "top-right", "bottom-left"], lines: notes }]}
          />
        </div>
        <div>
          <h3 className="mb-1 text-xs font-semibold tracking-tight">Barycentric map (Banerjee et al. 2007)</h3>
          <PlotFrame
            ariaLabel="Barycentric anisotropy map with vertices 1C, 2C and 3C"
            x={{ kind: "linear", min: baryRange.x[0], max: baryRange.x[1], label: svgSub("x", "B"), symbol: "x_B" }}
            y={{ kind: "linear", min: baryRange.y[0], max: baryRange.y[1], label: svgSub("y", "B"), symbol: "y_B" }}
            equalAspect
            maxWidth={620}
            curves={[{ id: "outline", label: "realizable states: 1C (1, 0), 2C (0, 0), 3C (½, √3/2)", points: outline, style: { color: PLOT_COLOURS.guide, width: 1.6 } }]}
            markers={[baryVertices, ...sampleSets("barycentric"), ...highlight("barycentric")]}
            onPointClick={pick}
          />
        </div>
      </div>
      <SelectedSample samples={run.stresses} selected={selected} onSelect={select} />
      <StressViolations samples={run.stresses} />
    </Panel>
  );
}

function vertexMarkers(points: (XY & { tag: string })[]): PlotMarkers {
  return { id: "vertices", label: "limiting states", points: points.map((p) => ({ ...p, note: p.tag })), shape: "square", size: 5, color: PLOT_COLOURS.guide };
}

/** The asymptotic b_ij a homogeneous-shear run reports, when all four are present. */
function reportedState(run: RunView) {
  const v = (key: string) => findQuantity(run, key)?.value ?? null;
  const [b11, b22, b33, b12] = [v("b11"), v("b22"), v("b33"), v("b12")];
  if (b11 === null || b22 === null || b33 === null || b12 === null) return null;
  const p = placeAnisotropy({ b11, b22, b33, b12 });
  const note = `b11 = ${formatSig(b11, 3)}, b22 = ${formatSig(b22, 3)}, b33 = ${formatSig(b33, 3)}, b12 = ${formatSig(b12, 3)}`;
  return { lumley: { ...p.lumley, note }, barycentric: { ...p.barycentric, note } };
}
