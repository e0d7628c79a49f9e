import { describe, expect, it } from "vitest";
import { ciToken } from "../helpers/graphql";
import { errorMessages, postJson, send } from "./http-helpers";

// Requests the GraphQL route must refuse with a clear 4xx, never a 500:
// bodies that are not JSON, content types it does not read, a mutation over GET,
// and batches (no client of ours batches; see graphql/server.ts).

const TYPENAME = JSON.stringify({ query: "{ __typename }" });

describe("malformed GraphQL requests", () => {
  it("answers 400 with a message about JSON to a body that is not JSON", async () => {
    const answer = await postJson("{nope", { authorization: `Bearer ${ciToken()}` });
    expect(answer.status).toBe(400);
    expect(errorMessages(answer)).toMatch(/invalid JSON/i);
  });

  it("answers 400 to an empty JSON body and to a JSON body without a query", async () => {
    const empty = await postJson("");
    expect(empty.status).toBe(400);
    expect(errorMessages(empty)).not.toBe("");
    const noQuery = await postJson({ variables: {} });
    expect(noQuery.status).toBe(400);
    expect(errorMessages(noQuery)).toMatch(/query/i);
  });

  it.each(["application/xml", "text/plain", "application/x-www-form-urlencoded", "text/html"])(
    "answers 415 naming the accepted types to a POST of %s, with or without the CSRF header",
    async (type) => {
      for (const extra of [{}, { "x-tauline-request": "1" }] as Record<string, string>[]) {
        const answer = await send("/api/graphql", { method: "POST", headers: { "content-type": type, ...extra }, body: TYPENAME });
        expect(answer.status).toBe(415);
        expect(answer.json?.errors?.[0].extensions?.code).toBe("UNSUPPORTED_MEDIA_TYPE");
        expect(errorMessages(answer)).toContain(type);
        expect(errorMessages(answer)).toContain("application/json");
      }
    },
  );

  it("answers 415 to a POST without any content type", async () => {
    const answer = await send("/api/graphql", { method: "POST", body: new Blob([TYPENAME]) });
    expect(answer.status).toBe(415);
    expect(errorMessages(answer)).toMatch(/not accepted/);
  });

  it("answers 405 to a mutation sent over GET, and runs a query over GET", async () => {
    const mutation = await send(`/api/graphql?query=${encodeURIComponent("mutation { __typename }")}`, { headers: { "x-tauline-request": "1", accept: "application/json" } });
    expect(mutation.status).toBe(405);
    expect(errorMessages(mutation)).toMatch(/mutation.*POST/i);
    const query = await send(`/api/graphql?query=${encodeURIComponent("{ __typename }")}`, { headers: { "x-tauline-request": "1", accept: "application/json" } });
    expect(query.status).toBe(200);
    expect(query.json?.data).toEqual({ __typename: "Query" });
  });

  it("answers 403 to a GET query without the CSRF header (a cross-site <img> or link could send it)", async () => {
    const answer = await send(`/api/graphql?query=${encodeURIComponent("{ __typename }")}`, { headers: { accept: "application/json" } });
    expect(answer.status).toBe(403);
    expect(errorMessages(answer)).toContain("x-tauline-request");
  });

  it("refuses batched operations with 400, two of them as well as two hundred", async () => {
    for (const n of [2, 200]) {
      const batch = Array.from({ length: n }, () => ({ query: "{ __typename }" }));
      const answer = await postJson(batch, { authorization: `Bearer ${ciToken()}` });
      expect(answer.status).toBe(400);
      expect(errorMessages(answer)).toMatch(/batching is not supported/i);
    }
  });
});
