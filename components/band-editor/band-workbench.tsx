"use client";

import { useQuery } from "@apollo/client/react";
import Link from "next/link";
import { useState } from "react";
import { describeOrigin } from "@/components/cases/case-text";
import { Panel } from "@/components/ui/panel";
import { EmptyState, ErrorNotice, LoadingBlock } from "@/components/ui/states";
import { BAND_VERSIONS, CASE_EDITOR, type BandVersionInfo } from "@/graphql/operations/library-edit";
import { BandForm } from "./band-form";
import { BandVersionList } from "./band-version-list";
import { ReevaluationPanel } from "./reevaluation-panel";
import { ScopeSwitcher } from "./scope-switcher";

/**
 * One band scope (a quantity of a case, for one model or all): the form for a
 * new version, every version with its changes, and the offer to re-judge builds.
 * The data owner of the band page; saving refetches the versions.
 */
export function BandWorkbench({ caseKey, quantityKey, model }: { caseKey: string; quantityKey: string; model: string | null }) {
  const scope = { caseKey, quantityKey, model };
  const editor = useQuery(CASE_EDITOR, { variables: { key: caseKey } });
  const versions = useQuery(BAND_VERSIONS, { variables: scope });
  const [saved, setSaved] = useState<number | null>(null);

  if (editor.error) return <ErrorNotice title="Could not load the case" error={editor.error} />;
  if (versions.error) return <ErrorNotice title="Could not load the versions of this band" error={versions.error} />;
  if ((editor.loading && !editor.data) || (versions.loading && !versions.data)) return <LoadingBlock label="Loading the band" rows={10} />;
  const c = editor.data?.case;
  const quantity = editor.data?.quantities.find((q) => q.key === quantityKey);
  if (!c || !quantity) return <EmptyState title="Nothing to edit here">There is no quantity definition “{quantityKey}” for the case {caseKey}. Define the quantity first.</EmptyState>;
  if (model !== null && !c.models.includes(model)) return <EmptyState title="Model not run on this case">{model} is not one of this case&apos;s models ({c.models.join(", ")}).</EmptyState>;

  const list = versions.data?.bandVersions ?? [];
  const current: BandVersionInfo | null = list.find((v) => v.supersededAt === null) ?? null;
  const caseWide = c.bandRecords.find((b) => b.quantity === quantityKey && b.model === null && b.supersededAt === null) ?? null;
  const startFrom = model !== null && caseWide ? { ...caseWide, changes: [], judgedBuilds: 0 } : null;
  const newest = list[0];
  const scopeName = model === null ? "all models of the case" : `${editor.data?.models.find((m) => m.key === model)?.name ?? model} only`;
  // Only a revision prompts a re-judgement; the first version has nothing to compare with.
  const suggested = newest && newest.version > 1 ? `Band ${quantityKey} (${model ?? "all models"}) revised to version ${newest.version}: ${newest.reason}`.slice(0, 2000) : "";

  return (
    <div className="space-y-5">
      <ScopeSwitcher caseKey={caseKey} quantityKey={quantityKey} model={model} models={c.models} modelName={(k) => editor.data?.models.find((m) => m.key === k)?.name ?? k} ownBands={new Set(c.bandRecords.filter((b) => b.quantity === quantityKey && b.model !== null && b.supersededAt === null).map((b) => b.model!))} />
      <p className="text-sm text-ink-soft dark:text-white/70">
        {quantity.meaning}; {describeOrigin(quantity.derivedFrom)}. Unit: {quantity.unit === "1" ? "dimensionless" : quantity.unit}.
      </p>
      {saved !== null && (
        <p role="status" className="rounded border border-tide-500/50 bg-tide-50 p-2 text-sm text-tide-900 dark:bg-tide-900/30 dark:text-tide-100">
          Saved as version {saved}. Builds already judged keep their verdicts; re-judge them below if they should be compared with the new band.
        </p>
      )}
      <div className="grid gap-5 xl:grid-cols-[minmax(0,3fr)_minmax(0,2fr)]">
        <Panel title={`New version for ${scopeName}`} subtitle={current ? `Starts from version ${current.version}, in force now.` : startFrom ? "This model has no band of its own yet; the form starts from the case-wide band." : "No band yet: values are recorded as unbanded."}>
          <BandForm
            key={current?.id ?? "new"}
            scope={scope}
            unit={quantity.unit}
            current={current}
            startFrom={startFrom}
            caseSettings={c.parameters}
            onSaved={({ version }) => {
              setSaved(version);
              void versions.refetch();
              void editor.refetch();
            }}
          />
        </Panel>
        <Panel title="Versions of this band" subtitle="Newest first; each with what changed from the version before.">
          <BandVersionList versions={list} unit={quantity.unit} highlight={saved} />
        </Panel>
      </div>
      <ReevaluationPanel
        key={current?.id ?? "none"}
        scope={scope}
        suggestedReason={suggested}
        fitChanged={Boolean(newest?.changes.some((ch) => ch.field.startsWith("fitSettings")))}
        unit={quantity.unit}
      />
      <p className="text-xs text-ink-faint">
        <Link href={`/cases/${caseKey}/edit`} className="underline">
          Back to editing the case
        </Link>{" "}
        ·{" "}
        <Link href={`/cases/${caseKey}#q-${quantityKey}`} className="underline">
          the case page
        </Link>
      </p>
    </div>
  );
}
