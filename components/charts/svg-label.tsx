import type { ReactNode } from "react";

/** An axis title with a subscript inside SVG text, e.g. c_f or Re_x (tspans, since SVG has no <sub>). */
export function svgSub(base: ReactNode, sub: ReactNode, after?: ReactNode): ReactNode {
  return (
    <>
      <tspan fontStyle="italic">{base}</tspan>
      <tspan baselineShift="sub" fontSize="0.78em">
        {sub}
      </tspan>
      {after !== undefined && <tspan>{after}</tspan>}
    </>
  );
}
