import { Suspense } from "react";
import { CandidateList } from "@/components/gate/candidate-list";
import { GateCaution } from "@/components/gate/gate-caution";
import { PageTitle } from "@/components/ui/panel";
import { LoadingBlock } from "@/components/ui/states";

export const metadata = { title: "Release gate" };

export default function GatePage() {
  return (
    <section>
      <PageTitle
        title="Release gate"
        lead="Release candidates and their decisions. Open one to see what stands in its way, grant waivers and approve, hold or reject it."
      />
      <GateCaution compact />
      {/* useSearchParams inside the list needs a boundary of its own. */}
      <Suspense fallback={<LoadingBlock label="Loading release candidates" rows={8} />}>
        <CandidateList />
      </Suspense>
    </section>
  );
}
