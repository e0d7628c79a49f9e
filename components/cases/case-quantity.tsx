import Link from "next/link";
import type { BandRecord, CaseDetailData } from "@/graphql/operations/cases";
import { BandEntry } from "./band-entry";
import { BandHistory } from "./band-history";
import { describeOrigin } from "./case-text";

/** One quantity of a case: what it is, where it comes from, its bands in force and their history. */
export function CaseQuantity({
  caseKey,
  quantity: q,
  caseModels,
  modelName,
  bands,
  history,
}: {
  caseKey: string;
  quantity: CaseDetailData["quantities"][number];
  caseModels: string[];
  modelName: (key: string) => string;
  bands: BandRecord[];
  history: BandRecord[];
}) {
  const ownBand = new Set(bands.filter((b) => b.model !== null).map((b) => b.model!));
  const withoutOwn = caseModels.filter((m) => !ownBand.has(m));
  // Case-wide band first, then the models' own bands in the case's model order.
  const ordered = [...bands].sort((a, b) => (a.model === null ? -1 : b.model === null ? 1 : caseModels.indexOf(a.model) - caseModels.indexOf(b.model)));
  const appliesTo = (b: BandRecord) => {
    if (b.model !== null) return `${modelName(b.model)} (${b.model})`;
    if (ownBand.size === 0) return "all models";
    if (withoutOwn.length === 0) return "all models — not used at present: every model of this case has its own band";
    return `all models without their own band: ${withoutOwn.map(modelName).join(", ")}`;
  };
  return (
    <section className="py-4 first:pt-0" id={`q-${q.key}`} aria-label={q.label}>
      <header className="flex flex-wrap items-baseline gap-x-3 gap-y-1">
        <h3 className="font-semibold">{q.label}</h3>
        <span className="font-mono text-xs text-ink-faint">{q.key}</span>
        <span className="text-xs text-ink-faint">unit: {q.unit === "1" ? "dimensionless" : q.unit}</span>
        <Link className="ml-auto text-xs text-tide-700 underline dark:text-tide-300" href={`/trends?${new URLSearchParams({ case: caseKey, quantity: q.key }).toString()}`}>
          trend of this quantity
        </Link>
      </header>
      <p className="mt-1 text-sm text-ink-soft dark:text-white/70">
        {q.meaning}; {describeOrigin(q.derivedFrom)}.
      </p>
      {ordered.length === 0 ? (
        <p className="mt-2 text-sm text-ink-faint">No band: values are recorded and trended as unbanded.</p>
      ) : (
        <div className="mt-2 grid gap-2 xl:grid-cols-2">
          {ordered.map((b) => (
            <BandEntry key={b.id} band={b} unit={q.unit} appliesTo={appliesTo(b)} />
          ))}
        </div>
      )}
      <BandHistory records={history} unit={q.unit} />
    </section>
  );
}
