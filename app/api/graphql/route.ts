import { yoga } from "@/graphql/server";
import { BodyTooLargeError, ENVELOPE_ALLOWANCE, checkDeclaredLength, limitRequestBody } from "@/lib/http/body-limit";
import { withRequestLog, type RequestNote } from "@/lib/http/request-log";
import { getEnv } from "@/lib/env";

export const dynamic = "force-dynamic";

function tooLarge(error: BodyTooLargeError): Response {
  // Connection: close — the client is most likely still sending; the rest of
  // its body is not wanted on this connection.
  return Response.json(
    { errors: [{ message: error.message, extensions: { code: "PAYLOAD_TOO_LARGE", limitBytes: error.limit } }] },
    { status: 413, headers: { connection: "close" } },
  );
}

/**
 * Every GraphQL request: a declared body over the limit is refused before it is
 * read; otherwise yoga reads a body that counts its bytes, and the first to
 * come of yoga's answer and the body passing the limit is the response.
 */
async function handle(request: Request, note: RequestNote): Promise<Response> {
  const limit = getEnv().MAX_BODY_BYTES + ENVELOPE_ALLOWANCE;
  const declared = checkDeclaredLength(request.headers, limit);
  if (declared) return tooLarge(declared);
  const limited = limitRequestBody(request, limit);
  const answering = Promise.resolve(yoga.handleRequest(limited.request, { request: limited.request, note }));
  // Once the overflow has answered, yoga's own outcome is of no interest.
  answering.catch(() => undefined);
  const answer = await Promise.race([answering, limited.overflow]);
  if (answer instanceof BodyTooLargeError) return tooLarge(answer);
  // yoga may have answered (400, invalid body) from the failed stream a moment before the race saw the overflow.
  if (limited.exceeded()) return tooLarge(await limited.overflow);
  return answer;
}

const route = withRequestLog(handle);

export const GET = route;
export const POST = route;
export const OPTIONS = route;
