// Next.js calls register() once when a server instance starts. Every instance
// runs the mail worker (lib/jobs/worker.ts); the queues are shared through
// PostgreSQL, so any number of instances can run side by side.
export async function register(): Promise<void> {
  // The worker needs Node (sockets for SMTP and PostgreSQL); the Edge runtime
  // (proxy.ts) also calls register() and must not load it. NEXT_RUNTIME is set
  // by Next itself, not by the deployment, so it is read here and not in lib/env.ts.
  if (process.env.NEXT_RUNTIME !== "nodejs") return;
  // The per-address sign-in throttle needs each request's socket address (lib/auth/peer-stamp.ts).
  const { installPeerStamp } = await import("./lib/auth/peer-stamp");
  installPeerStamp();
  const { startMailWorker } = await import("./lib/jobs/worker");
  // Not awaited: a database that is still starting must not hold up the web
  // server; the worker logs the failure and the next start tries again.
  void startMailWorker();
}
