// The request body limit (MAX_BODY_BYTES) enforced while the body streams in.
// A declared Content-Length over the limit is refused before a byte is read;
// a body without one (chunked transfer) is counted as it is pulled, and the
// moment the count passes the limit the stream fails and the caller answers
// 413 without the rest ever being read, so a hostile client can neither fill
// the server's memory nor keep a parser busy with an endless upload.

/** Room for the multipart envelope (boundaries, part headers, the operations JSON) around a file of MAX_BODY_BYTES. */
export const ENVELOPE_ALLOWANCE = 1024 * 1024;

export class BodyTooLargeError extends Error {
  constructor(
    readonly limit: number,
    readonly seen: number,
    readonly declared: boolean,
  ) {
    super(
      declared
        ? `The request body is ${megabytes(seen)} MB; the limit is ${megabytes(limit)} MB (MAX_BODY_BYTES).`
        : `The request body passed the limit of ${megabytes(limit)} MB (MAX_BODY_BYTES) while streaming; the rest was not read.`,
    );
    this.name = "BodyTooLargeError";
  }
}

function megabytes(bytes: number): string {
  return (bytes / 2 ** 20).toFixed(1);
}

/** The error for a Content-Length header over the limit, or null when it is absent, malformed or within it. */
export function checkDeclaredLength(headers: Headers, limit: number): BodyTooLargeError | null {
  const declared = Number(headers.get("content-length") ?? "");
  return Number.isFinite(declared) && declared > limit ? new BodyTooLargeError(limit, declared, true) : null;
}

export interface LimitedRequest {
  request: Request;
  /** Resolves with the error the moment the body passes the limit; never settles otherwise. */
  overflow: Promise<BodyTooLargeError>;
  /** True once the body has passed the limit. */
  exceeded: () => boolean;
}

/**
 * The same request with a body that counts its bytes as the consumer pulls them
 * (pull-based, so nothing is read ahead of the parser) and fails past `limit`.
 */
export function limitRequestBody(request: Request, limit: number): LimitedRequest {
  let fire: (error: BodyTooLargeError) => void = () => {};
  const overflow = new Promise<BodyTooLargeError>((resolve) => (fire = resolve));
  const source = request.body;
  if (!source) return { request, overflow, exceeded: () => false };

  const reader = source.getReader();
  let seen = 0;
  let failed: BodyTooLargeError | null = null;
  const counted = new ReadableStream<Uint8Array>({
    async pull(controller) {
      const { done, value } = await reader.read();
      if (done) {
        controller.close();
        return;
      }
      seen += value.byteLength;
      if (seen > limit) {
        failed = new BodyTooLargeError(limit, seen, false);
        fire(failed);
        controller.error(failed);
        // Stop pulling from the socket: what the client still sends is discarded
        // by the HTTP server once the 413 is out, never collected here.
        reader.releaseLock();
        return;
      }
      controller.enqueue(value);
    },
    cancel(reason) {
      return reader.cancel(reason);
    },
  });
  const limited = new Request(request.url, {
    method: request.method,
    headers: request.headers,
    body: counted,
    signal: request.signal,
    // Required by the fetch spec for a streamed request body.
    duplex: "half",
  } as RequestInit & { duplex: "half" });
  return { request: limited, overflow, exceeded: () => failed !== null };
}
