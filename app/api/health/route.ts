import { getDb } from "@/db";

export const dynamic = "force-dynamic";

// Liveness and database reachability, for start scripts and load balancers.
export async function GET() {
  const started = Date.now();
  try {
    await getDb().raw("select 1");
    return Response.json({ status: "ok", database: "up", latencyMs: Date.now() - started });
  } catch (error) {
    return Response.json({ status: "degraded", database: "down", error: (error as Error).message.slice(0, 200) }, { status: 503 });
  }
}
