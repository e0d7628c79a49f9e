"use client";

import { useQuery } from "@apollo/client/react";
import { Panel } from "@/components/ui/panel";
import { ErrorNotice, LoadingBlock } from "@/components/ui/states";
import { LIBRARY_CHOICES } from "@/graphql/operations/library-edit";
import { CaseForm } from "./case-form";

/** The create-a-case form with the turbulence models to choose from. */
export function NewCase() {
  const { data, loading, error } = useQuery(LIBRARY_CHOICES);
  if (error) return <ErrorNotice title="Could not load the turbulence models" error={error} />;
  if (loading || !data) return <LoadingBlock label="Loading the turbulence models" rows={8} />;
  return (
    <Panel>
      <CaseForm models={data.models} />
    </Panel>
  );
}
