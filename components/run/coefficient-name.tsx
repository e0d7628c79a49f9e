import type { ReactNode } from "react";

// Closure coefficients arrive under their CI keys (C_eps2, beta_star,
// sigma_omega1); engineers read them as C_ε2, β*, σ_ω1.
const GREEK: Record<string, string> = {
  eps: "ε",
  epsilon: "ε",
  mu: "μ",
  sigma: "σ",
  beta: "β",
  alpha: "α",
  kappa: "κ",
  omega: "ω",
  gamma: "γ",
  nu: "ν",
};

function greek(token: string): string {
  const m = /^([a-zA-Z]+)(\d*)([a-zA-Z]*)$/.exec(token);
  if (!m) return token;
  return (GREEK[m[1]] ?? m[1]) + m[2] + m[3];
}

/** Symbol of a coefficient key: base letter, subscript, and a star for the *_star variants. */
export function CoefficientName({ name }: { name: string }): ReactNode {
  const tokens = name.split("_").filter(Boolean);
  if (tokens.length === 0) return name;
  const star = tokens[tokens.length - 1] === "star";
  const rest = (star ? tokens.slice(1, -1) : tokens.slice(1)).map(greek);
  // "a1" without an underscore: the digits are the subscript.
  const head = /^([a-zA-Z]+)(\d+)$/.exec(tokens[0]);
  const base = head ? greek(head[1]) : greek(tokens[0]);
  const sub = [head ? head[2] : "", ...rest].filter(Boolean).join(",");
  return (
    <span title={name}>
      <i>{base}</i>
      {sub && <sub>{sub}</sub>}
      {star && <sup>*</sup>}
    </span>
  );
}
