import { readFile } from "node:fs/promises";
import { randomUUID } from "node:crypto";
import { describe, expect, it } from "vitest";
import { ciToken, randomCommit } from "../helpers/graphql";
import { signIn } from "../helpers/session";
import { graphqlUrl, postJson, send } from "./http-helpers";
import { listeningPid, serverLogPath } from "./http-server-process";

// Request ids and the one log line per request (lib/http/request-log.ts): the
// caller's x-request-id comes back (and is what the server logs under), a
// malformed one is replaced, and the line holds the operation, status, time
// and actor kind but never a token, cookie or variable.

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/;

async function logLinesFor(requestId: string): Promise<Record<string, unknown>[]> {
  const pid = await listeningPid(new URL(graphqlUrl()).port);
  const path = serverLogPath(pid);
  if (!path) throw new Error(`the server (pid ${pid}) does not log to a file this test can read`);
  // Lines are written as the answer leaves; give the stream a moment to flush.
  for (let attempt = 0; attempt < 20; attempt++) {
    const lines = (await readFile(path, "utf8"))
      .split("\n")
      .filter((line) => line.includes(requestId))
      .flatMap((line) => {
        try {
          return [JSON.parse(line) as Record<string, unknown>];
        } catch {
          return [];
        }
      });
    if (lines.some((l) => l.msg === "request")) return lines;
    await new Promise((resolve) => setTimeout(resolve, 100));
  }
  throw new Error(`no request log line with requestId ${requestId} in ${path}`);
}

describe("request ids and request log", () => {
  it("echoes the caller's x-request-id on the answer", async () => {
    const id = `ci-job-${randomUUID()}`;
    const answer = await postJson({ query: "{ __typename }" }, { authorization: `Bearer ${ciToken()}`, "x-request-id": id });
    expect(answer.status).toBe(200);
    expect(answer.headers.get("x-request-id")).toBe(id);
  });

  it("answers a fresh UUID when the caller sends none or a malformed one", async () => {
    const none = await postJson({ query: "{ __typename }" });
    expect(none.headers.get("x-request-id")).toMatch(UUID);
    const malformed = await postJson({ query: "{ __typename }" }, { "x-request-id": "has spaces and <angle> brackets" });
    expect(malformed.headers.get("x-request-id")).toMatch(UUID);
  });

  it("sets the id on refusals too (a 415 before GraphQL runs)", async () => {
    const id = `refused-${randomUUID()}`;
    const answer = await send("/api/graphql", { method: "POST", headers: { "content-type": "text/plain", "x-request-id": id }, body: "x" });
    expect(answer.status).toBe(415);
    expect(answer.headers.get("x-request-id")).toBe(id);
  });

  it("logs one line per request with operation, status, time and actor kind, and no token, cookie or variable", async () => {
    const id = `log-${randomUUID()}`;
    const marker = randomCommit();
    const answer = await postJson(
      { query: "query LogProbe($commit: String!) { releaseGate(commit: $commit) { state } }", variables: { commit: marker }, operationName: "LogProbe" },
      { authorization: `Bearer ${ciToken()}`, "x-request-id": id },
    );
    expect(answer.status).toBe(200);
    const lines = await logLinesFor(id);
    const request = lines.filter((l) => l.msg === "request");
    expect(request).toHaveLength(1);
    expect(request[0]).toMatchObject({ requestId: id, method: "POST", path: "/api/graphql", status: 200, operation: "LogProbe", actor: "ci" });
    expect(typeof request[0].ms).toBe("number");
    const all = JSON.stringify(lines);
    expect(all).not.toContain(ciToken());
    expect(all).not.toContain(marker);
  });

  it("logs a signed-in person as a user without the session cookie", async () => {
    const cookie = await signIn("developer@fenwick-hydro.test");
    const id = `log-user-${randomUUID()}`;
    const answer = await postJson({ query: "query Branches { branches }" }, { cookie, "x-request-id": id });
    expect(answer.status).toBe(200);
    const [line] = (await logLinesFor(id)).filter((l) => l.msg === "request");
    expect(line).toMatchObject({ operation: "Branches", actor: "user", status: 200 });
    const sessionValue = /session-token=([^;]+)/.exec(cookie)?.[1] ?? "";
    expect(sessionValue.length).toBeGreaterThan(10);
    expect(JSON.stringify(line)).not.toContain(sessionValue);
  });
});
