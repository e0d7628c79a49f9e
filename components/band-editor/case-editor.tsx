"use client";

import { useQuery } from "@apollo/client/react";
import Link from "next/link";
import { Panel } from "@/components/ui/panel";
import { EmptyState, ErrorNotice, LoadingBlock } from "@/components/ui/states";
import { CASE_EDITOR } from "@/graphql/operations/library-edit";
import { CaseChangeRecord } from "./case-change-record";
import { CaseForm } from "./case-form";
import { QuantityScopes } from "./quantity-scopes";

/** The QA lead's page for one case: its description and fit settings, its band scopes, and its change record. */
export function CaseEditor({ caseKey, justCreated }: { caseKey: string; justCreated: boolean }) {
  const { data, loading, error, refetch } = useQuery(CASE_EDITOR, { variables: { key: caseKey } });
  if (error) return <ErrorNotice title="Could not load the case" error={error} />;
  if (loading && !data) return <LoadingBlock label="Loading the case" rows={10} />;
  const c = data?.case;
  if (!c || !data) return <EmptyState title="No such case">There is no canonical case with the key {caseKey}.</EmptyState>;
  return (
    <div className="space-y-5">
      {justCreated && (
        <p role="status" className="rounded border border-tide-500/50 bg-tide-50 p-2 text-sm text-tide-900 dark:bg-tide-900/30 dark:text-tide-100">
          Case created. Give its quantities bands below; until then its values are recorded as unbanded.
        </p>
      )}
      <Panel title="Quantities and their bands" subtitle="Follow a band to change it (a new version with its reason) or to give one model its own band.">
        <QuantityScopes caseKey={c.key} models={c.models} quantities={c.quantities} definitions={data.quantities} bands={c.bandRecords} />
      </Panel>
      <div className="grid gap-5 xl:grid-cols-2">
        <Panel title="Case description, models and fit settings">
          <CaseForm
            key={`${c.title}|${c.models.join()}|${JSON.stringify(c.parameters)}`}
            initial={{ key: c.key, title: c.title, description: c.description, models: c.models, parameters: c.parameters }}
            models={data.models}
            onSaved={() => void refetch()}
          />
        </Panel>
        <Panel title="Change record" subtitle="Newest first.">
          <CaseChangeRecord caseKey={c.key} />
        </Panel>
      </div>
      <p className="text-xs text-ink-faint">
        <Link href={`/cases/${c.key}`} className="underline">
          The case page
        </Link>
      </p>
    </div>
  );
}

