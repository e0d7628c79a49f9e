import { request as httpRequest } from "node:http";
import { describe, expect, it } from "vitest";
import { ciToken } from "../helpers/graphql";
import { graphqlUrl, postJson } from "./http-helpers";
import { listeningPid, readRssBytes } from "./http-server-process";

// The body limit (MAX_BODY_BYTES, default 64 MB, plus 1 MB for a multipart
// envelope: lib/http/body-limit.ts) is enforced while the body streams in.
// These tests send through node:http so that they control what goes on the
// wire: headers with a false promise, or a chunked body that never ends.

const LIMIT = Number(process.env.MAX_BODY_BYTES ?? 64 * 2 ** 20) + 2 ** 20;
const MB = 2 ** 20;

interface StreamOutcome {
  status: number;
  body: string;
  /** Bytes written before the answer arrived. */
  sentBeforeAnswer: number;
  answeredAfterMs: number;
}

/**
 * Streams `chunk` repeatedly (up to `maxBytes`) and stops writing as soon as the
 * server answers. With `declaredLength` the request promises that many bytes;
 * without, it is sent chunked (no Content-Length at all).
 */
function streamBody({ chunk, maxBytes, declaredLength, onTick }: { chunk: Buffer; maxBytes: number; declaredLength?: number; onTick?: () => void }): Promise<StreamOutcome> {
  return new Promise((resolve, reject) => {
    const url = new URL(graphqlUrl());
    const started = Date.now();
    let sent = 0;
    let answered = false;
    const req = httpRequest({
      host: url.hostname,
      port: url.port,
      path: url.pathname,
      method: "POST",
      headers: {
        "content-type": "application/json",
        authorization: `Bearer ${ciToken()}`,
        ...(declaredLength !== undefined ? { "content-length": String(declaredLength) } : {}),
      },
    });
    req.on("response", (res) => {
      answered = true;
      const sentBeforeAnswer = sent;
      const answeredAfterMs = Date.now() - started;
      const parts: Buffer[] = [];
      res.on("data", (part: Buffer) => parts.push(part));
      res.on("end", () => {
        resolve({ status: res.statusCode ?? 0, body: Buffer.concat(parts).toString("utf8"), sentBeforeAnswer, answeredAfterMs });
        req.destroy();
      });
    });
    // Once the server has answered and closed, further writes fail; that is the point.
    req.on("error", (error) => {
      if (!answered) reject(error);
    });
    const pump = () => {
      if (answered || req.destroyed) return;
      onTick?.();
      if (sent >= maxBytes) {
        if (declaredLength === undefined) req.end();
        return;
      }
      sent += chunk.byteLength;
      if (req.write(chunk)) setImmediate(pump);
      else req.once("drain", pump);
    };
    req.write('{"query":"{ __typename }","variables":{"pad":"');
    pump();
  });
}

describe("request body limit", () => {
  it("refuses a declared Content-Length over the limit at once, before the body is sent", async () => {
    const outcome = await streamBody({ chunk: Buffer.alloc(1024, 0x61), maxBytes: 4096, declaredLength: LIMIT + 10 * MB });
    expect(outcome.status).toBe(413);
    expect(outcome.body).toMatch(/MAX_BODY_BYTES/);
    // Only the first few kilobytes ever left the client, and the answer did not wait for more.
    expect(outcome.sentBeforeAnswer).toBeLessThanOrEqual(4096);
    expect(outcome.answeredAfterMs).toBeLessThan(5000);
  });

  it("cuts a chunked body that keeps coming at the limit, answering 413 while the client is still sending, without holding the body in memory", async () => {
    const pid = await listeningPid(new URL(graphqlUrl()).port);
    // Warm the route (a development server compiles it on first use).
    await postJson({ query: "{ __typename }" }, { authorization: `Bearer ${ciToken()}` });
    const before = readRssBytes(pid);
    let peak = before;
    // What the client would send if nobody stopped it: eight times the limit.
    const planned = 8 * LIMIT;
    const outcome = await streamBody({
      chunk: Buffer.alloc(MB, 0x61),
      maxBytes: planned,
      onTick: () => {
        peak = Math.max(peak, readRssBytes(pid));
      },
    });
    expect(outcome.status).toBe(413);
    expect(outcome.body).toMatch(/MAX_BODY_BYTES/);
    // The answer came after the limit was passed and long before the client's planned end.
    expect(outcome.sentBeforeAnswer).toBeGreaterThan(LIMIT - 4 * MB);
    expect(outcome.sentBeforeAnswer).toBeLessThan(2 * LIMIT);
    // The server holds at most about the limit (a JSON document must be whole
    // before it can be parsed), never the body the client keeps sending: reading
    // it all would add eight times the limit to the resident set.
    expect(peak - before).toBeLessThan(2 * LIMIT);
  });

  it("accepts a chunked body of several megabytes under the limit (the count does not refuse honest posts)", async () => {
    const pad = "x".repeat(8 * MB);
    const answer = await postJson({ query: "{ __typename }", variables: { pad } }, { authorization: `Bearer ${ciToken()}` });
    expect(answer.status).toBe(200);
    expect(answer.json?.data).toEqual({ __typename: "Query" });
  });
});
