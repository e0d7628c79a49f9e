import type { Plugin } from "graphql-yoga";
import { getEnv } from "@/lib/env";

// The HTTP checks every GraphQL request passes before its body is parsed:
//  1. content type: JSON (CI, Apollo) or multipart/form-data (the upload page);
//     anything else is 415 whatever the other headers say — the API does not
//     read url-encoded or text/plain forms, so they can neither work nor mutate.
//  2. origin: a browser names the page's origin on every cross-origin request
//     and on same-origin POSTs; an Origin that is neither APP_URL nor the
//     server's own host is a page on another site riding on the user's cookie
//     (a JSON fetch with a forged content type, a form) and is refused with 403.
//     CI posts send no Origin and are not affected. A CORS preflight (OPTIONS)
//     from another site is refused here too; yoga's own CORS is off.
//  3. the custom header: form-like requests (multipart, GET) must carry
//     x-tauline-request, which another site's page cannot set without a CORS
//     preflight we never grant; without it, 403.

/** The header a browser client must send on multipart and GET requests. */
export const CSRF_HEADER = "x-tauline-request";

const ACCEPTED_BODIES = ["application/json", "multipart/form-data"];

function refuse(status: number, code: string, message: string): Response {
  return Response.json({ errors: [{ message, extensions: { code } }] }, { status });
}

function mediaTypeOf(headers: Headers): string {
  return (headers.get("content-type") ?? "").split(";")[0].trim().toLowerCase();
}

function allowedOrigins(request: Request): Set<string> {
  return new Set([new URL(getEnv().APP_URL).origin, new URL(request.url).origin]);
}

/** The refusal for a request that fails the gate, or null when it may go on to GraphQL. */
export function checkGraphQLRequest(request: Request): Response | null {
  const method = request.method.toUpperCase();
  const mediaType = mediaTypeOf(request.headers);
  if (method === "POST" && !ACCEPTED_BODIES.includes(mediaType)) {
    return refuse(
      415,
      "UNSUPPORTED_MEDIA_TYPE",
      `Content-Type ${mediaType ? `"${mediaType}"` : "(none)"} is not accepted: post application/json, or multipart/form-data with the ${CSRF_HEADER} header for file uploads.`,
    );
  }
  const origin = request.headers.get("origin");
  if (origin !== null && !allowedOrigins(request).has(origin)) {
    return refuse(403, "FORBIDDEN", `Cross-site request refused: origin ${origin.slice(0, 100)} is not this server's.`);
  }
  // A GET without a query executes nothing (it is how GraphiQL is fetched in development).
  const formLike = (method === "GET" && new URL(request.url).searchParams.has("query")) || mediaType === "multipart/form-data";
  if (formLike && !request.headers.has(CSRF_HEADER)) {
    return refuse(403, "FORBIDDEN", `Form uploads and GET requests must carry the ${CSRF_HEADER} header (cross-site request protection).`);
  }
  return null;
}

/** The gate as a yoga plugin, so that every way into yoga (route, in-process fetch) passes it. */
export function useRequestGate(): Plugin {
  return {
    onRequest({ request, endResponse }) {
      const refusal = checkGraphQLRequest(request);
      if (refusal) endResponse(refusal);
    },
  };
}
