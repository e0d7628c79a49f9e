import { AwaitingDecision } from "@/components/overview/awaiting-decision";
import { BandExits } from "@/components/overview/band-exits";
import { BranchActivity } from "@/components/overview/branch-activity";
import { OpenDrifts } from "@/components/overview/open-drifts";
import { PageTitle } from "@/components/ui/panel";

export const metadata = { title: "Morning view · Tauline" };

// The frame is rendered on the server; each widget is a client leaf with its own
// query, skeleton, empty state and error notice, so one slow or failing widget
// does not hold up the others.
export default function MorningViewPage() {
  return (
    <>
      <PageTitle
        title="Morning view"
        lead="What changed on each branch since its baseline, what is drifting, and which release candidates wait for a decision."
      />
      <div className="grid gap-5 xl:grid-cols-3">
        <div className="xl:col-span-2">
          <BandExits />
        </div>
        <AwaitingDecision />
      </div>
      <div className="mt-5">
        <OpenDrifts />
      </div>
      <div className="mt-5">
        <BranchActivity />
      </div>
    </>
  );
}
