// Numbers as a CFD engineer reads them: significant figures, not fixed decimals,
// exponent form for very small or large magnitudes, a true minus sign.

export function formatSig(value: number | null | undefined, digits = 4): string {
  if (value === null || value === undefined || Number.isNaN(value)) return "—";
  if (!Number.isFinite(value)) return value > 0 ? "∞" : "−∞";
  if (value === 0) return "0";
  const abs = Math.abs(value);
  let text: string;
  if (abs < 1e-3 || abs >= 1e6) {
    const [mantissa, exponent] = value.toExponential(digits - 1).split("e");
    text = `${mantissa}×10${superscript(Number(exponent))}`;
  } else {
    text = Number(value.toPrecision(digits)).toString();
  }
  return text.replace(/^-/, "−");
}

/** A signed change with an explicit + for increases. */
export function formatDelta(value: number | null | undefined, digits = 3): string {
  if (value === null || value === undefined || Number.isNaN(value)) return "—";
  if (value === 0) return "±0";
  return (value > 0 ? "+" : "") + formatSig(value, digits);
}

export function formatPct(value: number | null | undefined, digits = 3): string {
  if (value === null || value === undefined || Number.isNaN(value)) return "—";
  return `${formatDelta(value, digits)} %`;
}

/** Value with its unit; dimensionless quantities (unit "1" or "") carry none. */
export function withUnit(text: string, unit: string | null | undefined): string {
  return !unit || unit === "1" || unit === "-" ? text : `${text} ${unit}`;
}

const SUP: Record<string, string> = { "-": "⁻", "0": "⁰", "1": "¹", "2": "²", "3": "³", "4": "⁴", "5": "⁵", "6": "⁶", "7": "⁷", "8": "⁸", "9": "⁹" };
function superscript(n: number): string {
  return String(n).split("").map((c) => SUP[c] ?? c).join("");
}
