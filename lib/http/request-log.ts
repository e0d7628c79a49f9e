import { getLogger, pickRequestId, runWithRequestId } from "@/lib/log";

// One log line per API request, written when the answer is ready: method, path,
// status, duration, and what the handler learned on the way (the GraphQL
// operation name, whether a CI token or a person asked). Never headers, cookies,
// tokens or variables: the line is safe to ship to any log store. Every line a
// handler writes meanwhile carries the same requestId, which is also returned as
// the x-request-id header so a CI job can quote it in a bug report.

/** What a handler notes about its request for the closing log line. */
export interface RequestNote {
  operation?: string;
  actor?: "ci" | "user" | "system" | "anonymous" | "refused";
}

type Handler = (request: Request, note: RequestNote) => Promise<Response>;

export const REQUEST_ID_HEADER = "x-request-id";

/** Wraps a route handler with a request id, the x-request-id answer header and the closing log line. */
export function withRequestLog(handler: Handler): (request: Request) => Promise<Response> {
  return (request) => {
    const requestId = pickRequestId(request.headers);
    return runWithRequestId(requestId, async () => {
      const started = performance.now();
      const note: RequestNote = {};
      let response: Response;
      try {
        response = await handler(request, note);
      } catch (error) {
        getLogger().error({ err: error }, "request handler failed");
        response = Response.json({ errors: [{ message: "Unexpected error.", extensions: { code: "INTERNAL_SERVER_ERROR" } }] }, { status: 500 });
      }
      response = withHeader(response, REQUEST_ID_HEADER, requestId);
      const path = new URL(request.url).pathname;
      const ms = Math.round((performance.now() - started) * 10) / 10;
      getLogger().info({ method: request.method, path, status: response.status, ms, operation: note.operation, actor: note.actor }, "request");
      return response;
    });
  };
}

/** Sets a header, copying the response first when its headers are immutable (e.g. a fetched or redirect response). */
function withHeader(response: Response, name: string, value: string): Response {
  try {
    response.headers.set(name, value);
    return response;
  } catch {
    const copy = new Response(response.body, response);
    copy.headers.set(name, value);
    return copy;
  }
}
