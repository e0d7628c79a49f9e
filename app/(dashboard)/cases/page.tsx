import Link from "next/link";
import { mayEditLibrary } from "@/components/band-editor/editing-refused";
import { CaseList } from "@/components/cases/case-list";
import { PageTitle } from "@/components/ui/panel";
import { getSessionActor } from "@/lib/auth/session";

export const metadata = { title: "Case library · Tauline" };

export default async function CasesPage() {
  const actor = await getSessionActor();
  return (
    <>
      <PageTitle
        title="Case library"
        lead="The canonical verification and validation cases every Cormorant build must keep reproducing, with the tolerance bands they are judged against."
      >
        {mayEditLibrary(actor) && (
          <Link href="/cases/new" className="rounded bg-tide-700 px-3 py-1.5 text-sm font-medium text-white hover:bg-tide-900">
            New case
          </Link>
        )}
      </PageTitle>
      <CaseList />
    </>
  );
}
