import { Suspense } from "react";
import { TrendExplorer, TrendSkeleton } from "@/components/trends/trend-explorer";
import { PageTitle } from "@/components/ui/panel";

export const metadata = { title: "Trends · Tauline" };

export default function TrendsPage() {
  return (
    <>
      <PageTitle title="Trends" lead="Any quantity of any case across the builds of a branch, for one or several models, against its tolerance band." />
      {/* The explorer reads its selection from the query string, which needs a Suspense boundary. */}
      <Suspense fallback={<TrendSkeleton />}>
        <TrendExplorer />
      </Suspense>
    </>
  );
}
