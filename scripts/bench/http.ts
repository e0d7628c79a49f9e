import { readFileSync } from "node:fs";
import http from "node:http";
import zlib from "node:zlib";
import { signInAt } from "../../tests/helpers/session";

// Talking to the running app as CI and as a signed-in person do.

export function requireEnv(name: string): string {
  const v = process.env[name];
  if (!v) throw new Error(`${name} is not set: run the bench through npm run bench`);
  return v;
}

export const appUrl = () => requireEnv("APP_URL");

/** What one timed exchange with the API gave. */
export interface Exchange {
  /** Milliseconds from the request's first byte sent to the answer's last byte received. */
  ms: number;
  data: unknown;
  status: number;
  /** Bytes on the wire and the encoding they came in (gzip, br or identity). */
  wireBytes: number;
  encoding: string;
  /** Milliseconds the client then spent decoding and parsing the answer (outside `ms`). */
  clientMs: number;
}

// One kept-alive connection, as a CI job or a page's client holds: the timing
// excludes connection set-up, as the bare side's pg connection is open too.
const agent = new http.Agent({ keepAlive: true, maxSockets: 1 });

/**
 * Posts a GraphQL body (already serialised and encoded before the clock starts,
 * so our own JSON.stringify is not timed) and checks the answer for errors. Offers the encodings a browser does
 * over HTTPS. The clock runs from the request's first byte to the answer's last
 * byte: the server's work and the transfer. Decompressing and JSON.parse are
 * the client's own work and are timed apart (clientMs), after the clock stops,
 * as the bare side's timing ends when pg has the rows.
 */
export function exchangeGraphQL(body: string, auth: { token?: string; cookie?: string }): Promise<Exchange> {
  const url = new URL("/api/graphql", appUrl());
  // The bytes to send, made before the clock starts: a CI job posts a file it already has.
  const bytes = Buffer.from(body, "utf8");
  return new Promise((resolve, reject) => {
    const started = process.hrtime.bigint();
    const req = http.request(url, {
      method: "POST",
      agent,
      headers: {
        "content-type": "application/json",
        "content-length": bytes.byteLength,
        accept: "application/graphql-response+json, application/json",
        "accept-encoding": process.env.BENCH_ACCEPT_ENCODING ?? "gzip, deflate, br",
        ...(auth.token ? { authorization: `Bearer ${auth.token}` } : {}),
        ...(auth.cookie ? { cookie: auth.cookie } : {}),
      },
    });
    req.on("error", reject);
    req.on("response", (res) => {
      const chunks: Buffer[] = [];
      res.on("data", (c: Buffer) => chunks.push(c));
      res.on("error", reject);
      res.on("end", () => {
        const ms = Number(process.hrtime.bigint() - started) / 1e6;
        try {
          const decodeStarted = process.hrtime.bigint();
          const wire = Buffer.concat(chunks);
          const encoding = String(res.headers["content-encoding"] ?? "identity");
          const text = decode(wire, encoding).toString("utf8");
          const parsed = JSON.parse(text) as { data?: unknown; errors?: { message: string }[] };
          const clientMs = Number(process.hrtime.bigint() - decodeStarted) / 1e6;
          if (parsed.errors?.length) throw new Error(`GraphQL error (${res.statusCode}): ${parsed.errors[0].message.slice(0, 300)}`);
          resolve({ ms, data: parsed.data, status: res.statusCode ?? 0, wireBytes: wire.byteLength, encoding, clientMs });
        } catch (error) {
          reject(error);
        }
      });
    });
    req.end(bytes);
  });
}

/** Closes the kept-alive connection (end of the bench). */
export function closeConnections(): void {
  agent.destroy();
}

function decode(wire: Buffer, encoding: string): Buffer {
  if (encoding === "gzip") return zlib.gunzipSync(wire);
  if (encoding === "br") return zlib.brotliDecompressSync(wire);
  if (encoding === "deflate") return zlib.inflateSync(wire);
  if (encoding === "identity") return wire;
  throw new Error(`unexpected Content-Encoding ${encoding}`);
}

/** The data of a GraphQL answer (errors throw), for calls that are not timed or time themselves. */
export async function postGraphQLBody(body: string, auth: { token?: string; cookie?: string }): Promise<unknown> {
  return (await exchangeGraphQL(body, auth)).data;
}

/** The server-and-wire time of a GraphQL exchange, for timeRequests. */
export async function timedGraphQL(body: string, auth: { token?: string; cookie?: string }, onData?: (data: unknown) => void): Promise<number> {
  const exchange = await exchangeGraphQL(body, auth);
  onData?.(exchange.data);
  return exchange.ms;
}

export function graphQLBody(query: string, variables: Record<string, unknown>): string {
  return JSON.stringify({ query, variables });
}

/** Signs in through next-auth's credentials endpoint as the form does; returns the cookie header. */
export function signIn(email: string): Promise<string> {
  return signInAt(appUrl(), email, requireEnv("TAULINE_DEMO_PASSWORD"));
}

/**
 * Peak resident set (VmHWM, kB → MB) of the next-server process. `next start`
 * runs the server in a child process; the pid file holds the launcher, so the
 * largest VmHWM among it and its descendants is taken.
 */
export function readServerPeakRssMb(): number {
  return readPeakRssOfTreeMb(Number(requireEnv("BENCH_WEB_PID")));
}

/** The largest VmHWM (MB) among a process and its descendants; 0 when none can be read. */
export function readPeakRssOfTreeMb(root: number): number {
  let peak = 0;
  for (const pid of [root, ...descendantsOf(root)]) {
    try {
      const m = /VmHWM:\s+(\d+) kB/.exec(readFileSync(`/proc/${pid}/status`, "utf8"));
      if (m) peak = Math.max(peak, Number(m[1]) / 1024);
    } catch {
      // the process ended between listing and reading: nothing to count
    }
  }
  return peak;
}

function descendantsOf(pid: number): number[] {
  let children: number[] = [];
  try {
    const tasks = readFileSync(`/proc/${pid}/task/${pid}/children`, "utf8").trim();
    children = tasks ? tasks.split(/\s+/).map(Number) : [];
  } catch {
    return [];
  }
  return children.flatMap((c) => [c, ...descendantsOf(c)]);
}
