import { withAuth, type NextRequestWithAuth } from "next-auth/middleware";
import { NextResponse, type NextFetchEvent, type NextRequest } from "next/server";
import { buildPagePolicy, createNonce } from "@/lib/http/content-security-policy";

// Two jobs on every page request:
//  - the Content-Security-Policy with a fresh nonce, set on the request (Next
//    reads the nonce from it while rendering) and on the response;
//  - an optimistic redirect: a visitor without a session token is sent to the
//    sign-in page. Every server action and GraphQL resolver checks the session
//    and role again; this is not the guard, just the signpost.
// API routes set their own headers (next.config.mjs) and answer 401 themselves.

const development = process.env.NODE_ENV === "development";

/** Pages a signed-out visitor may open: sign-in and the set-password links (the link is the proof). */
const PUBLIC_PAGES = /^\/(sign-in|invite\/)/;

function nextWithPolicy(request: NextRequest): NextResponse {
  const nonce = createNonce();
  const policy = buildPagePolicy(nonce, development);
  const headers = new Headers(request.headers);
  headers.set("x-nonce", nonce);
  headers.set("content-security-policy", policy);
  const response = NextResponse.next({ request: { headers } });
  response.headers.set("content-security-policy", policy);
  return response;
}

const signedInOnly = withAuth((request: NextRequestWithAuth) => nextWithPolicy(request), {
  pages: { signIn: "/sign-in" },
});

export default function proxy(request: NextRequest, event: NextFetchEvent) {
  if (PUBLIC_PAGES.test(request.nextUrl.pathname)) return nextWithPolicy(request);
  return signedInOnly(request as NextRequestWithAuth, event);
}

export const config = {
  // Every page, and no API route or static file (the app icon too, which the signed-out pages show).
  matcher: ["/((?!api/|_next/static|_next/image|favicon.ico|icon.svg).*)"],
};
