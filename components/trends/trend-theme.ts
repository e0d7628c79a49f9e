import { plotTheme } from "@/components/charts/chart-theme";

// Look of the trend chart: the scientific plots' theme (text and grid take
// `currentColor`, so one chart reads on the light and the dark page); model
// colours are CSS variables with a light and a dark value (set by
// TREND_COLOUR_VARS on the chart's wrapper).
export const trendTheme = plotTheme;

/** Six model colours (tide, ochre, brick, violet, blue, moss): distinct in grey-scale too. */
export const MODEL_COLOURS = ["var(--trend-m0)", "var(--trend-m1)", "var(--trend-m2)", "var(--trend-m3)", "var(--trend-m4)", "var(--trend-m5)"];

/** Band shading of a band that applies to every model of the case: neutral slate, unlike any model colour. */
export const SHARED_BAND_COLOUR = "var(--trend-band)";
export const INK = "var(--trend-ink)";

export const TREND_COLOUR_VARS =
  "[--trend-m0:#1b6f68] [--trend-m1:#b07a10] [--trend-m2:#b2452f] [--trend-m3:#7b5ea7] [--trend-m4:#3d6fb0] [--trend-m5:#5f7a22] " +
  "[--trend-band:#56636f] [--trend-ink:#14202b] [--trend-halo:#ffffff] " +
  "dark:[--trend-m0:#5fc8bd] dark:[--trend-m1:#e6b95a] dark:[--trend-m2:#f08f78] dark:[--trend-m3:#c0a6ee] dark:[--trend-m4:#8db8f0] dark:[--trend-m5:#a9c96a] " +
  "dark:[--trend-band:#b7c2cc] dark:[--trend-ink:#e3e8ec] dark:[--trend-halo:#0f171e]";

/** Verdict fills, readable on both backgrounds; the shape carries the verdict too. */
export const VERDICT_FILL = {
  within: "#2a8f86",
  marginal: "#d19a22",
  outside: "#c4452c",
  unbanded: "#7d8b98",
  missing: "#8b6cc0",
} as const;
