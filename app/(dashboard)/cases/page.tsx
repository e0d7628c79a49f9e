import { CaseList } from "@/components/cases/case-list";
import { PageTitle } from "@/components/ui/panel";

export const metadata = { title: "Case library · Tauline" };

export default function CasesPage() {
  return (
    <>
      <PageTitle
        title="Case library"
        lead="The canonical verification and validation cases every Cormorant build must keep reproducing, with the tolerance bands they are judged against."
      />
      <CaseList />
    </>
  );
}
