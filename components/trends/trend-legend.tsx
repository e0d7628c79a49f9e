import type { Verdict } from "@/lib/analysis";
import { VerdictMark } from "./trend-layers";
import { INK, SHARED_BAND_COLOUR, TREND_COLOUR_VARS } from "./trend-theme";

// What every mark of the trend chart means, including the models' colours.

const VERDICTS: Verdict[] = ["within", "marginal", "outside", "unbanded"];

function Swatch({ children, width = 22 }: { children: React.ReactNode; width?: number }) {
  return (
    <svg width={width} height={16} viewBox={`0 0 ${width} 16`} aria-hidden className="shrink-0 overflow-visible">
      {children}
    </svg>
  );
}

export function TrendLegend({ models, colourOf }: { models: readonly string[]; colourOf: (model: string) => string }) {
  return (
    <div className={`flex flex-wrap gap-x-5 gap-y-1.5 text-xs text-ink-soft dark:text-white/70 ${TREND_COLOUR_VARS}`}>
      {models.map((m) => (
        <span key={m} className="inline-flex items-center gap-1.5">
          <Swatch>
            <line x1={0} x2={22} y1={8} y2={8} stroke={colourOf(m)} strokeWidth={2} />
          </Swatch>
          <span className="font-medium text-ink dark:text-white">{m}</span>
        </span>
      ))}
      {VERDICTS.map((v) => (
        <span key={v} className="inline-flex items-center gap-1">
          <Swatch width={14}>
            <VerdictMark x={7} y={8} verdict={v} outline={INK} size={4} />
          </Swatch>
          {v}
        </span>
      ))}
      <span className="inline-flex items-center gap-1.5">
        <Swatch>
          <rect x={0} y={0} width={22} height={16} fill={SHARED_BAND_COLOUR} fillOpacity={0.08} />
          <rect x={0} y={4} width={22} height={8} fill={SHARED_BAND_COLOUR} fillOpacity={0.14} />
          <line x1={0} x2={22} y1={8} y2={8} stroke={SHARED_BAND_COLOUR} strokeWidth={1.5} strokeDasharray="6 4" />
        </Swatch>
        band (lighter strips: marginal; dashed: reference; model colour = that model&apos;s own band)
      </span>
      <span className="inline-flex items-center gap-1.5">
        <Swatch>
          <circle cx={11} cy={9} r={6} fill="none" stroke={INK} strokeWidth={1.25} />
          <path d="M8,3L14,3L11,-2Z" fill={INK} />
        </Swatch>
        drift (triangle: direction)
      </span>
      <span className="inline-flex items-center gap-1.5">
        <Swatch width={10}>
          <line x1={5} x2={5} y1={0} y2={16} stroke={INK} strokeWidth={1.25} strokeDasharray="2 3" />
        </Swatch>
        baseline (last approved build)
      </span>
      <span className="inline-flex items-center gap-1.5">
        <span className="font-bold">?</span> run without a value
      </span>
    </div>
  );
}
