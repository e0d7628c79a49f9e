import { notFound } from "next/navigation";
import { z } from "zod";
import { CaseDetail } from "@/components/cases/case-detail";
import { PageTitle } from "@/components/ui/panel";
import { getSessionActor } from "@/lib/auth/session";
import { findCases } from "@/lib/services/reads";

const paramsSchema = z.object({ caseKey: z.string().regex(/^[a-z0-9][a-z0-9-]{0,63}$/) });

export default async function CasePage({ params }: { params: Promise<{ caseKey: string }> }) {
  const parsed = paramsSchema.safeParse(await params);
  if (!parsed.success) notFound();
  // Title and existence on the server, so an unknown key is a real 404; the library data loads in the client leaf.
  const [found] = await findCases({ actor: await getSessionActor(), key: parsed.data.caseKey });
  if (!found) notFound();
  return (
    <>
      <PageTitle title={found.title} lead={found.description} />
      <CaseDetail caseKey={found.key} />
    </>
  );
}
