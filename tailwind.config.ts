import type { Config } from "tailwindcss";

// Theme tokens. Tailwind 4 is configured CSS-first (app/globals.css); this file
// is loaded from there with `@config` and holds the palette and type scale.
// Verdict colours are our own: a cool teal for "within", ochre for "marginal",
// brick for "outside", slate for "unbanded", violet for "missing".
const config: Config = {
  content: ["./app/**/*.{ts,tsx}", "./components/**/*.{ts,tsx}"],
  darkMode: "media",
  theme: {
    extend: {
      fontFamily: {
        sans: ['"Inter Variable"', "system-ui", "sans-serif"],
        mono: ['"IBM Plex Mono"', "ui-monospace", "monospace"],
      },
      colors: {
        ink: { DEFAULT: "#14202b", soft: "#3b4a58", faint: "#6b7a88" },
        paper: { DEFAULT: "#f6f5f1", raised: "#ffffff", sunk: "#ebe9e2" },
        tide: { 50: "#eef7f6", 100: "#d3ecea", 300: "#7cc4bd", 500: "#2a8f86", 700: "#1b5f59", 900: "#0f3532" },
        verdict: {
          within: "#2a8f86",
          marginal: "#c08a1e",
          outside: "#b2452f",
          unbanded: "#6b7a88",
          missing: "#7b5ea7",
        },
      },
    },
  },
};

export default config;
