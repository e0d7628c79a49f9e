"use client";

import Link from "next/link";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { formatLimit } from "@/components/cases/case-text";
import type { BandRecord } from "@/graphql/operations/cases";
import type { QuantityDefinitionInfo } from "@/graphql/operations/library-edit";
import { INPUT } from "./form-controls";

const LINK = "text-tide-700 hover:underline dark:text-tide-300";

function ScopeCell({ href, band }: { href: string; band: BandRecord | undefined }) {
  if (!band) return <Link href={href} className={`${LINK} text-xs`}>add a band</Link>;
  return (
    <Link href={href} className={`${LINK} font-mono text-xs tabular-nums`} title={`${band.kind}, version ${band.version}`}>
      v{band.version}: {formatLimit(band.lower, "lower")} … {formatLimit(band.upper, "upper")}
    </Link>
  );
}

/** Each quantity of the case with its case-wide band and the models' own bands, each a link to its band editor. */
export function QuantityScopes({ caseKey, models, quantities, definitions, bands }: { caseKey: string; models: string[]; quantities: QuantityDefinitionInfo[]; definitions: QuantityDefinitionInfo[]; bands: BandRecord[] }) {
  const router = useRouter();
  const [another, setAnother] = useState("");
  const inForce = bands.filter((b) => b.supersededAt === null);
  const href = (q: string, m: string | null) => `/cases/${caseKey}/edit/bands/${q}${m ? `?model=${m}` : ""}`;
  const used = new Set(quantities.map((q) => q.key));
  const unused = definitions.filter((d) => !used.has(d.key));
  return (
    <div className="space-y-3">
      <div className="overflow-x-auto">
        <table className="w-full text-sm">
          <thead className="text-left text-xs text-ink-faint">
            <tr className="border-b border-ink/10 dark:border-white/10">
              <th className="py-1.5 pr-3 font-medium">Quantity</th>
              <th className="py-1.5 pr-3 font-medium">All models</th>
              {models.map((m) => (
                <th key={m} className="py-1.5 pr-3 font-mono text-xs font-medium">{m}</th>
              ))}
              <th className="py-1.5 font-medium">Definition</th>
            </tr>
          </thead>
          <tbody>
            {quantities.map((q) => (
              <tr key={q.key} className="border-b border-ink/5 align-top dark:border-white/5" data-quantity={q.key}>
                <td className="py-1.5 pr-3">
                  {q.label}
                  <span className="block font-mono text-[11px] text-ink-faint">
                    {q.key} · {q.unit === "1" ? "dimensionless" : q.unit}
                  </span>
                </td>
                <td className="py-1.5 pr-3">
                  <ScopeCell href={href(q.key, null)} band={inForce.find((b) => b.quantity === q.key && b.model === null)} />
                </td>
                {models.map((m) => {
                  const own = inForce.find((b) => b.quantity === q.key && b.model === m);
                  return (
                    <td key={m} className="py-1.5 pr-3">
                      {own ? <ScopeCell href={href(q.key, m)} band={own} /> : <Link href={href(q.key, m)} className="text-xs text-ink-faint hover:underline" title="Uses the case-wide band; follow to give this model its own">case-wide</Link>}
                    </td>
                  );
                })}
                <td className="py-1.5">
                  <Link href={`/cases/${caseKey}/edit/quantities/${q.key}`} className={`${LINK} text-xs`}>edit</Link>
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      <div className="flex flex-wrap items-end gap-3 text-sm">
        <label>
          <span className="text-xs text-ink-faint">Band a quantity this case has no band or value for</span>
          <select className={`${INPUT} w-auto`} value={another} onChange={(e) => setAnother(e.target.value)}>
            <option value="">Choose a defined quantity…</option>
            {unused.map((d) => (
              <option key={d.key} value={d.key}>
                {d.label} ({d.key})
              </option>
            ))}
          </select>
        </label>
        <button type="button" disabled={!another} onClick={() => router.push(href(another, null))} className="rounded border border-tide-700 px-2.5 py-1.5 text-sm text-tide-700 disabled:opacity-50 dark:border-tide-300 dark:text-tide-300">
          Open its band editor
        </button>
        <Link href={`/cases/${caseKey}/edit/quantities`} className={`${LINK} ml-auto`}>
          Define a new reported quantity
        </Link>
      </div>
    </div>
  );
}
