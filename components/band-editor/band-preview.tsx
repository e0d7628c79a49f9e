import { formatSig } from "@/lib/format/numbers";

// The band in force and the draft on one axis, so a tightened limit or a moved
// reference is seen before it is saved. Open sides of a one-sided band run to the
// edge with an arrow; the lighter strips inside the limits are the marginal margin.

export interface PreviewBand {
  label: string;
  reference: number | null;
  lower: number | null;
  upper: number | null;
  marginalMargin: number;
}

const W = 560;
const ROW = 34;
const PAD = 56;

function axisRange(bands: PreviewBand[]): [number, number] | null {
  const xs = bands.flatMap((b) => [b.reference, b.lower, b.upper]).filter((v): v is number => v !== null && Number.isFinite(v));
  if (xs.length === 0) return null;
  let lo = Math.min(...xs);
  let hi = Math.max(...xs);
  const span = hi - lo || Math.abs(lo) * 0.1 || 1;
  lo -= span * 0.25;
  hi += span * 0.25;
  return [lo, hi];
}

export function BandPreview({ bands, unit }: { bands: PreviewBand[]; unit: string }) {
  const range = axisRange(bands);
  if (!range) return <p className="text-xs text-ink-faint">Enter a limit or a reference to see the band.</p>;
  const [lo, hi] = range;
  const x = (v: number) => PAD + ((v - lo) / (hi - lo)) * (W - 2 * PAD);
  const height = bands.length * ROW + 22;
  return (
    <svg viewBox={`0 0 ${W} ${height}`} className="w-full max-w-xl" role="img" aria-label="The band in force and the draft on one axis">
      {bands.map((b, i) => {
        const y = 6 + i * ROW;
        const left = b.lower === null ? PAD - 14 : x(b.lower);
        const right = b.upper === null ? W - PAD + 14 : x(b.upper);
        const m = Math.max(0, b.marginalMargin);
        return (
          <g key={b.label}>
            <text x={4} y={y + 15} className="fill-ink-soft text-[10px] dark:fill-white/70">
              {b.label}
            </text>
            <rect x={left} y={y + 4} width={Math.max(1, right - left)} height={16} className={i === bands.length - 1 ? "fill-tide-500/35" : "fill-ink/15 dark:fill-white/20"} />
            {b.lower !== null && m > 0 && <rect x={x(b.lower)} y={y + 4} width={Math.max(1, x(b.lower + m) - x(b.lower))} height={16} className="fill-verdict-marginal/40" />}
            {b.upper !== null && m > 0 && <rect x={x(b.upper - m)} y={y + 4} width={Math.max(1, x(b.upper) - x(b.upper - m))} height={16} className="fill-verdict-marginal/40" />}
            {b.lower === null && <text x={left - 2} y={y + 16} textAnchor="end" className="fill-ink-faint text-[11px]">◀</text>}
            {b.upper === null && <text x={right + 2} y={y + 16} className="fill-ink-faint text-[11px]">▶</text>}
            {b.reference !== null && <line x1={x(b.reference)} x2={x(b.reference)} y1={y} y2={y + 24} className="stroke-ink dark:stroke-white" strokeWidth={1.5} />}
            {b.lower !== null && (
              <text x={x(b.lower)} y={y + 32} textAnchor="middle" className="fill-ink-soft font-mono text-[9px] dark:fill-white/70">
                {formatSig(b.lower, 5)}
              </text>
            )}
            {b.upper !== null && (
              <text x={x(b.upper)} y={y + 32} textAnchor="middle" className="fill-ink-soft font-mono text-[9px] dark:fill-white/70">
                {formatSig(b.upper, 5)}
              </text>
            )}
          </g>
        );
      })}
      <text x={W - 4} y={height - 2} textAnchor="end" className="fill-ink-faint text-[9px]">
        {unit && unit !== "1" ? unit : "dimensionless"} · bar = accepted range · ochre = marginal strip · line = reference
      </text>
    </svg>
  );
}
