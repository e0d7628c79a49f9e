"use client";

import { useQuery } from "@apollo/client/react";
import Link from "next/link";
import { EmptyState, ErrorNotice, LoadingBlock } from "@/components/ui/states";
import { CASE_LIST } from "@/graphql/operations/cases";

export function CaseList() {
  const { data, loading, error } = useQuery(CASE_LIST);
  if (loading && !data) return <LoadingBlock label="Loading the case library" rows={8} />;
  if (error) return <ErrorNotice title="Could not load the case library" error={error} />;
  if (!data || data.cases.length === 0) return <EmptyState title="No canonical cases">Seed the case library (npm run db:seed).</EmptyState>;
  const modelName = new Map(data.models.map((m) => [m.key, m.name]));
  return (
    <ul className="grid gap-4 md:grid-cols-2">
      {data.cases.map((c) => {
        const verification = c.bands.filter((b) => b.kind === "verification").length;
        const validation = c.bands.length - verification;
        return (
          <li key={c.key} className="rounded-lg border border-ink/10 bg-paper-raised p-4 shadow-sm dark:border-white/10 dark:bg-white/5" data-case={c.key}>
            <Link href={`/cases/${c.key}`} className="group block">
              <h2 className="font-semibold tracking-tight group-hover:underline">{c.title}</h2>
              <p className="font-mono text-xs text-ink-faint">{c.key}</p>
            </Link>
            <p className="mt-2 text-sm text-ink-soft dark:text-white/70">{c.description}</p>
            <dl className="mt-3 grid grid-cols-[auto_1fr] gap-x-3 gap-y-1 text-sm">
              <dt className="text-ink-faint">Models</dt>
              <dd>{c.models.map((m) => modelName.get(m) ?? m).join(", ")}</dd>
              <dt className="text-ink-faint">Bands in force</dt>
              <dd>
                {c.bands.length} ({verification} verification, {validation} validation) on {new Set(c.bands.map((b) => b.quantity)).size} of {c.quantities.length} quantities
              </dd>
            </dl>
          </li>
        );
      })}
    </ul>
  );
}
