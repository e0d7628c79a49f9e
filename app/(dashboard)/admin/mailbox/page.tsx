import { Suspense } from "react";
import { MailboxView } from "@/components/alerts/mailbox-view";
import { PageTitle } from "@/components/ui/panel";
import { ErrorNotice, LoadingBlock } from "@/components/ui/states";
import { getSessionActor } from "@/lib/auth/session";
import { roleAllows } from "@/lib/services/actor";

export const metadata = { title: "Mailbox · Administration · Tauline" };

export default async function MailboxPage() {
  // The data is refused by the server for other roles anyway (GraphQL checks
  // the admin role); this only spares them a page of errors.
  const actor = await getSessionActor();
  const admin = actor?.kind === "user" && roleAllows(actor.role, "admin");
  return (
    <>
      <PageTitle title="Mailbox" lead="What Tauline mailed: the messages the local SMTP server received, and the mail still owed." />
      {admin ? (
        <Suspense fallback={<LoadingBlock label="Loading the mailbox" rows={10} />}>
          <MailboxView />
        </Suspense>
      ) : (
        <ErrorNotice title="Administrators only" error="The mailbox shows other people's addresses and messages; it needs the admin role." action="Ask an administrator if you need a message." />
      )}
    </>
  );
}
