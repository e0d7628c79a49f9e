import { notFound } from "next/navigation";
import { z } from "zod";
import { GateCaution } from "@/components/gate/gate-caution";
import { GateReview } from "@/components/gate/gate-review";
import { getCurrentSession } from "@/lib/auth/session";

export const dynamic = "force-dynamic";

const paramsSchema = z.object({ buildId: z.string().regex(/^[1-9][0-9]{0,15}$/) });

export async function generateMetadata({ params }: { params: Promise<{ buildId: string }> }) {
  const { buildId } = await params;
  return { title: `Release gate · build ${buildId}` };
}

/**
 * One build before the release manager: the caution first, then the review,
 * a client leaf that owns its data through GraphQL (decisions and waivers update
 * it in place). Whether the decision form shows follows the role; the server
 * refuses the mutation to anyone else regardless.
 */
export default async function GateReviewPage({ params }: { params: Promise<{ buildId: string }> }) {
  const parsed = paramsSchema.safeParse(await params);
  if (!parsed.success) notFound();
  const session = await getCurrentSession();
  const role = session?.user.role;
  return (
    <section className="space-y-5">
      <GateCaution />
      <GateReview buildId={parsed.data.buildId} mayDecide={role === "release" || role === "admin"} />
    </section>
  );
}
