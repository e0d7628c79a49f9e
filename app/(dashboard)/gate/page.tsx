import { Suspense } from "react";
import { CandidateList } from "@/components/gate/candidate-list";
import { GateCaution } from "@/components/gate/gate-caution";
import { WaiverRegister } from "@/components/gate/waiver-register";
import { PageTitle } from "@/components/ui/panel";
import { LoadingBlock } from "@/components/ui/states";
import { getCurrentSession } from "@/lib/auth/session";

export const metadata = { title: "Release gate" };

export default async function GatePage() {
  const role = (await getCurrentSession())?.user.role;
  // Only wording and buttons follow the role; the server refuses decisions and waivers to anyone else.
  const mayDecide = role === "release" || role === "admin";
  return (
    <section>
      <PageTitle
        title="Release gate"
        lead="Release candidates and their decisions. Open one to see what stands in its way, grant waivers and approve, hold or reject it."
      />
      <div className="space-y-5">
        <GateCaution compact />
        {/* useSearchParams inside the list needs a boundary of its own. */}
        <Suspense fallback={<LoadingBlock label="Loading release candidates" rows={8} />}>
          <CandidateList mayDecide={mayDecide} />
          <WaiverRegister mayDecide={mayDecide} />
        </Suspense>
      </div>
    </section>
  );
}
