import NextAuth from "next-auth";
import { authOptions } from "@/lib/auth/options";
import { runWithThrottleNote } from "@/lib/auth/sign-in-throttle";

const handler = NextAuth(authOptions);

type RouteContext = { params: Promise<{ nextauth: string[] }> };

/**
 * next-auth answers every refused credentials sign-in with 401. A throttled one
 * (lib/auth/sign-in-throttle.ts) is turned into 429 with Retry-After, so the form
 * and any script can tell "wrong password" from "wait", and read how long.
 */
async function POST(request: Request, context: RouteContext): Promise<Response> {
  const { result, retryAfterSeconds } = await runWithThrottleNote(() => handler(request, context) as Promise<Response>);
  if (retryAfterSeconds === undefined) return result;
  const headers = new Headers(result.headers);
  headers.set("Retry-After", String(retryAfterSeconds));
  // A plain form post gets next-auth's redirect back to the form; only the JSON answer changes status.
  const redirect = result.status >= 300 && result.status < 400;
  return new Response(result.body, { status: redirect ? result.status : 429, headers });
}

export { handler as GET, POST };
