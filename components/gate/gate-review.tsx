"use client";

import { useQuery } from "@apollo/client/react";
import Link from "next/link";
import { EmptyState, ErrorNotice, Skeleton } from "@/components/ui/states";
import { GATE_REVIEW, type GateFindingItem } from "@/graphql/operations/gate";
import { BlockerPanel } from "./blocker-panel";
import { DecisionHistory } from "./decision-history";
import { DecisionPanel } from "./decision-panel";
import { FindingsTable } from "./findings-table";
import { ReviewHeader } from "./review-header";
import { WaiversInForce } from "./waivers-in-force";

/** The review of one build: the data owner of the page; decisions and waivers refresh it. */
export function GateReview({ buildId, mayDecide }: { buildId: string; mayDecide: boolean }) {
  const { data, loading, error } = useQuery(GATE_REVIEW, { variables: { buildId }, fetchPolicy: "cache-and-network" });
  const review = data?.gateReview;
  if (loading && !data) return <ReviewSkeleton />;
  if (error && !data) return <ErrorNotice title="Could not load the review of this build" error={error} />;
  if (!review)
    return (
      <EmptyState title={`There is no build ${buildId}`}>
        <Link href="/gate" className="underline">
          Back to the release candidates
        </Link>
      </EmptyState>
    );

  const byId = new Map(review.findings.map((f) => [f.id, f]));
  const pick = (refs: { id: string }[]) => refs.map((r) => byId.get(r.id)).filter((f): f is GateFindingItem => Boolean(f));
  const blockers = pick(review.blockers);
  const waived = pick(review.waived);
  return (
    <div className="space-y-5">
      <ReviewHeader review={review} />
      <div className="grid items-start gap-5 lg:grid-cols-3">
        <div className="space-y-5 lg:col-span-2">
          <BlockerPanel build={review.build} blockers={blockers} waived={waived} mayDecide={mayDecide} />
          <WaiversInForce waivers={review.waivers} mayDecide={mayDecide} />
        </div>
        <div className="space-y-5">
          <DecisionPanel review={review} blockerCount={blockers.length} mayDecide={mayDecide} />
          <DecisionHistory history={review.history} />
        </div>
      </div>
      <FindingsTable buildId={review.build.id} branch={review.build.branch} findings={review.findings} />
    </div>
  );
}

function ReviewSkeleton() {
  return (
    <div role="status" aria-label="Loading the review" className="space-y-5">
      <Skeleton className="h-28 w-full" />
      <div className="grid gap-5 lg:grid-cols-3">
        <Skeleton className="h-72 w-full lg:col-span-2" />
        <Skeleton className="h-72 w-full" />
      </div>
    </div>
  );
}
