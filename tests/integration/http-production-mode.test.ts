import { beforeAll, describe, expect, it } from "vitest";
import { ciToken } from "../helpers/graphql";
import { detectServerMode, errorMessages, postJson, send } from "./http-helpers";

// Introspection, GraphiQL and "did you mean" hints exist for developers only.
// Under `npm test` the server is a production build and each must be refused;
// against `next dev` each must still work, which shows the switch is the mode
// and not a blanket refusal (graphql/server.ts, graphql/guards/limits.ts).

let mode: "development" | "production";
beforeAll(async () => {
  mode = await detectServerMode();
});

describe(`developer aids by server mode`, () => {
  it("refuses __schema and __type introspection in production and answers them in development", async () => {
    for (const query of ["{ __schema { queryType { name } } }", '{ __type(name: "Build") { name } }']) {
      const answer = await postJson({ query }, { authorization: `Bearer ${ciToken()}` });
      if (mode === "production") {
        expect(answer.status).toBe(400);
        expect(errorMessages(answer)).toMatch(/introspection has been disabled/i);
        expect(answer.json?.data ?? null).toBeNull();
      } else {
        expect(answer.status).toBe(200);
        expect(JSON.stringify(answer.json?.data)).toMatch(/"name":"(Query|Build)"/);
      }
    }
  });

  it("still answers __typename in production (Apollo asks for it on every object)", async () => {
    const answer = await postJson({ query: "{ __typename }" }, { authorization: `Bearer ${ciToken()}` });
    expect(answer.status).toBe(200);
    expect(answer.json?.data).toEqual({ __typename: "Query" });
  });

  it("serves no GraphiQL page in production, and serves it in development", async () => {
    const page = await send("/api/graphql", { headers: { accept: "text/html" } });
    const isGraphiQL = page.status === 200 && (page.headers.get("content-type") ?? "").includes("text/html") && /graphiql/i.test(page.text);
    expect(isGraphiQL).toBe(mode === "development");
    if (mode === "production") expect(page.status).toBeGreaterThanOrEqual(400);
  });

  it("hides field suggestions in production and keeps them in development", async () => {
    const answer = await postJson({ query: "{ buildz }" }, { authorization: `Bearer ${ciToken()}` });
    expect(answer.status).toBe(400);
    const message = errorMessages(answer);
    expect(message).toMatch(/buildz/);
    if (mode === "production") expect(message).not.toMatch(/did you mean/i);
    else expect(message).toMatch(/did you mean/i);
  });
});
