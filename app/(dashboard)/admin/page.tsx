import Link from "next/link";
import { ChangeRecord } from "@/components/admin/change-record";
import { PeoplePanel } from "@/components/admin/people-panel";
import { TokenPanel } from "@/components/admin/token-panel";
import { PageTitle } from "@/components/ui/panel";
import { EmptyState } from "@/components/ui/states";
import { getCurrentSession } from "@/lib/auth/session";

export const metadata = { title: "Administration · Tauline" };

// The role is checked here for the frame and again by every query and mutation
// on the server; the navigation only hides the link.
export default async function AdministrationPage() {
  const session = await getCurrentSession();
  if (session?.user.role !== "admin") {
    return (
      <>
        <PageTitle title="Administration" />
        <EmptyState title="For administrators only">People, roles and CI tokens are managed by a Tauline administrator.</EmptyState>
      </>
    );
  }
  return (
    <>
      <PageTitle title="Administration" lead="Who may sign in with which role, and which pipelines may post results.">
        <Link href="/admin/mailbox" className="text-sm underline">
          Sent mail
        </Link>
      </PageTitle>
      <div className="space-y-5">
        <PeoplePanel meId={session.user.id} beside={<ChangeRecord />} />
        <TokenPanel />
      </div>
    </>
  );
}
