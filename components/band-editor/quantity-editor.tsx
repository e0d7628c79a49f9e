"use client";

import { useQuery } from "@apollo/client/react";
import Link from "next/link";
import { Panel } from "@/components/ui/panel";
import { EmptyState, ErrorNotice, LoadingBlock } from "@/components/ui/states";
import { QUANTITY_USES } from "@/graphql/operations/library-edit";
import { QuantityForm } from "./quantity-form";

/** A quantity definition reached from a case; the definition itself is shared by every case that uses the key. */
export function QuantityEditor({ caseKey, quantityKey }: { caseKey: string; quantityKey: string | null }) {
  const { data, loading, error, refetch } = useQuery(QUANTITY_USES);
  if (error) return <ErrorNotice title="Could not load the quantity definitions" error={error} />;
  if (loading && !data) return <LoadingBlock label="Loading the quantity definitions" rows={6} />;
  const initial = quantityKey === null ? null : data?.quantities.find((q) => q.key === quantityKey) ?? null;
  if (quantityKey !== null && !initial) return <EmptyState title="No such quantity">There is no quantity definition with the key {quantityKey}.</EmptyState>;
  const users = quantityKey === null ? [] : (data?.cases ?? []).filter((c) => c.quantities.some((q) => q.key === quantityKey));
  return (
    <div className="space-y-4">
      {users.length > 1 && (
        <p className="rounded border border-verdict-marginal/40 bg-verdict-marginal/10 p-2 text-sm">
          This definition is shared: a change shows on every case that uses <span className="font-mono">{quantityKey}</span> — {users.map((c) => c.title).join("; ")}.
        </p>
      )}
      <Panel>
        <QuantityForm key={initial ? `${initial.label}|${initial.unit}|${initial.meaning}` : "new"} caseKey={caseKey} initial={initial} onSaved={() => void refetch()} />
      </Panel>
      <p className="text-xs text-ink-faint">
        <Link href={`/cases/${caseKey}/edit`} className="underline">
          Back to editing the case
        </Link>
      </p>
    </div>
  );
}
