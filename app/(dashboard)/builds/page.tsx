import { Suspense } from "react";
import { BuildTable } from "@/components/builds/build-table";
import { PageTitle } from "@/components/ui/panel";
import { LoadingBlock } from "@/components/ui/states";

export const metadata = { title: "Builds" };

export default function BuildsPage() {
  return (
    <section>
      <PageTitle
        title="Builds"
        lead="Every solver build CI posted, with its verdict on the canonical cases and its release decision. Click a row to open the build."
      />
      {/* useSearchParams inside the table needs a boundary of its own. */}
      <Suspense fallback={<LoadingBlock label="Loading builds" rows={10} />}>
        <BuildTable />
      </Suspense>
    </section>
  );
}
