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
