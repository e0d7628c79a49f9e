// One look for every nivo chart: the app's type, quiet grid, readable ticks.
export const chartTheme = {
  text: { fontFamily: '"Inter Variable", system-ui, sans-serif', fontSize: 11, fill: "#3b4a58" },
  axis: {
    domain: { line: { stroke: "#9aa6b1", strokeWidth: 1 } },
    ticks: { line: { stroke: "#9aa6b1", strokeWidth: 1 }, text: { fontSize: 10, fill: "#3b4a58" } },
    legend: { text: { fontSize: 11, fill: "#14202b", fontWeight: 600 } },
  },
  grid: { line: { stroke: "#d9dde0", strokeWidth: 1 } },
  legends: { text: { fontSize: 11, fill: "#3b4a58" } },
  tooltip: { container: { fontSize: 12, borderRadius: 4, boxShadow: "0 2px 8px rgba(0,0,0,.15)" } },
};

/** Series colours: tide, ochre, brick, violet, slate, moss — distinct in grey-scale too. */
export const SERIES_COLOURS = ["#1b5f59", "#c08a1e", "#b2452f", "#7b5ea7", "#3b4a58", "#6c8a2e"];

export const VERDICT_COLOURS = {
  within: "#2a8f86",
  marginal: "#c08a1e",
  outside: "#b2452f",
  unbanded: "#6b7a88",
  missing: "#7b5ea7",
} as const;

/**
 * Theme for the scientific plots: text and grid take `currentColor`, so one
 * chart reads on the light and the dark page (the wrapper sets the colour).
 */
export const plotTheme = {
  background: "transparent",
  text: { fontFamily: '"Inter Variable", system-ui, sans-serif', fontSize: 11, fill: "currentColor" },
  axis: {
    domain: { line: { stroke: "currentColor", strokeOpacity: 0.55, strokeWidth: 1 } },
    ticks: { line: { stroke: "currentColor", strokeOpacity: 0.55, strokeWidth: 1 }, text: { fontSize: 10.5, fill: "currentColor" } },
    legend: { text: { fontSize: 12, fill: "currentColor", fontWeight: 600 } },
  },
  grid: { line: { stroke: "currentColor", strokeOpacity: 0.12, strokeWidth: 1 } },
  tooltip: { container: { fontSize: 12, borderRadius: 4, boxShadow: "0 2px 8px rgba(0,0,0,.2)", background: "#ffffff", color: "#14202b" } },
};

/**
 * Plot colours by role, as CSS variables so each has a light and a dark value
 * (set by PLOT_COLOUR_VARS on the plot's wrapper). Data are ink-coloured, fits
 * tide, references brick, composite laws violet, sublayer ochre, guides slate.
 */
export const PLOT_COLOURS = {
  data: "var(--plot-data)",
  fit: "var(--plot-fit)",
  reference: "var(--plot-reference)",
  composite: "var(--plot-composite)",
  sublayer: "var(--plot-sublayer)",
  guide: "var(--plot-guide)",
  window: "var(--plot-window)",
  band: "var(--plot-band)",
  bad: "var(--plot-bad)",
  extra: "var(--plot-extra)",
  halo: "var(--plot-halo)",
} as const;

export const PLOT_COLOUR_VARS =
  "[--plot-data:#14202b] [--plot-fit:#1b7d74] [--plot-reference:#b2452f] [--plot-composite:#7b5ea7] " +
  "[--plot-sublayer:#a8740f] [--plot-guide:#6b7a88] [--plot-window:#2a8f86] [--plot-band:#c08a1e] [--plot-bad:#c0392b] [--plot-extra:#3d6fb0] [--plot-halo:#ffffff] " +
  "dark:[--plot-data:#e3e8ec] dark:[--plot-fit:#5fc8bd] dark:[--plot-reference:#f08f78] dark:[--plot-composite:#c0a6ee] " +
  "dark:[--plot-sublayer:#e6b95a] dark:[--plot-guide:#9aa6b1] dark:[--plot-window:#5fc8bd] dark:[--plot-band:#e6b95a] dark:[--plot-bad:#ff7b6b] dark:[--plot-extra:#8db8f0] dark:[--plot-halo:#182026]";
