"use client";

import { useQuery } from "@apollo/client/react";
import Link from "next/link";
import { Panel } from "@/components/ui/panel";
import { EmptyState, ErrorNotice, LoadingBlock } from "@/components/ui/states";
import { CASE_DETAIL, type ModelInfo } from "@/graphql/operations/cases";
import { CaseQuantity } from "./case-quantity";
import { describeSettings } from "./case-text";

export function CaseDetail({ caseKey }: { caseKey: string }) {
  const { data, loading, error } = useQuery(CASE_DETAIL, { variables: { key: caseKey } });
  if (loading && !data) return <LoadingBlock label="Loading the case" rows={10} />;
  if (error) return <ErrorNotice title="Could not load the case" error={error} />;
  const c = data?.case;
  if (!c) return <EmptyState title="No such case">There is no canonical case with the key {caseKey}.</EmptyState>;
  const models = new Map<string, ModelInfo>(data.models.map((m) => [m.key, m]));
  const settings = describeSettings(c.parameters);
  const now = Date.now();
  const inForce = c.bandRecords.filter((b) => b.supersededAt === null && Date.parse(b.validFrom) <= now);
  return (
    <div className="space-y-5">
      <div className="grid gap-5 lg:grid-cols-2">
        <Panel title="Models run on this case">
          <ul className="space-y-1.5 text-sm">
            {c.models.map((key) => (
              <li key={key}>
                <span className="font-medium">{models.get(key)?.name ?? key}</span> <span className="font-mono text-xs text-ink-faint">{key}</span>
                {models.get(key) && (
                  <span className="block text-xs text-ink-soft dark:text-white/70">
                    {models.get(key)!.family} · {models.get(key)!.reference}
                  </span>
                )}
              </li>
            ))}
          </ul>
        </Panel>
        <Panel title="Fit settings" subtitle="What the derivations use for this case unless a band overrides it.">
          {settings.length === 0 ? (
            <p className="text-sm text-ink-soft dark:text-white/70">None: every quantity of this case is derived without case-specific settings or reported by the run.</p>
          ) : (
            <dl className="grid grid-cols-[minmax(10rem,auto)_1fr] gap-x-4 gap-y-1.5 text-sm">
              {settings.map((s) => (
                <div key={s.label} className="contents">
                  <dt className="text-ink-faint">{s.label}</dt>
                  <dd className="font-mono">{s.value}</dd>
                </div>
              ))}
            </dl>
          )}
        </Panel>
      </div>
      <Panel title="Quantities and their bands in force" subtitle="A model's own band overrides the band for all models of the case.">
        {c.quantities.length === 0 ? (
          <EmptyState title="No quantities yet">No build has reported or derived a quantity of this case, and no band is defined.</EmptyState>
        ) : (
          <div className="divide-y divide-ink/10 dark:divide-white/10">
            {c.quantities.map((q) => (
              <CaseQuantity
                key={q.key}
                caseKey={c.key}
                quantity={q}
                caseModels={c.models}
                modelName={(k) => models.get(k)?.name ?? k}
                bands={inForce.filter((b) => b.quantity === q.key)}
                history={c.bandRecords.filter((b) => b.quantity === q.key)}
              />
            ))}
          </div>
        )}
      </Panel>
      <p className="text-xs text-ink-faint">
        <Link href="/cases" className="underline">
          All cases
        </Link>
      </p>
    </div>
  );
}
