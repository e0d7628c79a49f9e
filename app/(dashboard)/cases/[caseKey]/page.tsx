import Link from "next/link";
import { notFound } from "next/navigation";
import { z } from "zod";
import { mayEditLibrary } from "@/components/band-editor/editing-refused";
import { CaseDetail } from "@/components/cases/case-detail";
import { PageTitle } from "@/components/ui/panel";
import { getSessionActor } from "@/lib/auth/session";
import { findCases } from "@/lib/services/reads";

const paramsSchema = z.object({ caseKey: z.string().regex(/^[a-z0-9][a-z0-9-]{0,63}$/) });

export default async function CasePage({ params }: { params: Promise<{ caseKey: string }> }) {
  const parsed = paramsSchema.safeParse(await params);
  if (!parsed.success) notFound();
  // Title and existence on the server, so an unknown key is a real 404; the library data loads in the client leaf.
  const actor = await getSessionActor();
  const [found] = await findCases({ actor, key: parsed.data.caseKey });
  if (!found) notFound();
  return (
    <>
      <PageTitle title={found.title} lead={found.description}>
        {mayEditLibrary(actor) && (
          <Link href={`/cases/${found.key}/edit`} className="rounded bg-tide-700 px-3 py-1.5 text-sm font-medium text-white hover:bg-tide-900">
            Edit case and bands
          </Link>
        )}
      </PageTitle>
      <CaseDetail caseKey={found.key} />
    </>
  );
}
