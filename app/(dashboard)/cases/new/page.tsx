import { EditingRefused, mayEditLibrary } from "@/components/band-editor/editing-refused";
import { NewCase } from "@/components/band-editor/new-case";
import { PageTitle } from "@/components/ui/panel";
import { getSessionActor } from "@/lib/auth/session";

export const metadata = { title: "New case · Tauline" };

export default async function NewCasePage() {
  const actor = await getSessionActor();
  if (!mayEditLibrary(actor)) return <EditingRefused readHref="/cases" />;
  return (
    <>
      <PageTitle title="New canonical case" lead="A case every build must keep reproducing. After creating it, give its quantities bands with their published sources." />
      <NewCase />
    </>
  );
}
