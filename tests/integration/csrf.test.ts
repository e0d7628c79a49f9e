import { readFile } from "node:fs/promises";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { closeTestDb, countRows } from "../helpers/db";
import { ciToken, randomCommit } from "../helpers/graphql";
import { signIn } from "../helpers/session";
import { baseUrl, errorMessages, postJson, send } from "./http-helpers";

// Cross-site request forgery: a page on another site can make the browser send
// the signed-in user's cookie with a form post or a fetch. None of these may
// change anything (graphql/guards/request-gate.ts); each case proves it with a
// count of builds under its own commit. CI posts (bearer token, no cookie, no
// Origin) keep working, and so does a same-origin post from the app's pages.

const BRANCH = "test/http-csrf";
const MUTATION = /* GraphQL */ `mutation Submit($input: ResultSubmission!) { submitResults(input: $input) { created build { id commit } } }`;

let developer = "";
let sample: { variables: { input: { build: Record<string, unknown> } & Record<string, unknown> } };

function submission(commit: string) {
  const input = { ...sample.variables.input, build: { ...sample.variables.input.build, commit, branch: BRANCH } };
  return { query: MUTATION, variables: { input } };
}

const buildsOf = (commit: string) => countRows("builds", { commit });

beforeAll(async () => {
  developer = await signIn("developer@fenwick-hydro.test");
  sample = JSON.parse(await readFile("fixtures/payloads/sample-build.json", "utf8"));
});
afterAll(closeTestDb);

describe("cross-site requests carrying a session cookie", () => {
  it("refuses a JSON mutation whose Origin is another site with 403, and stores nothing", async () => {
    const commit = randomCommit();
    const answer = await postJson(submission(commit), { cookie: developer, origin: "https://evil.example" });
    expect(answer.status).toBe(403);
    expect(errorMessages(answer)).toMatch(/cross-site/i);
    expect(await buildsOf(commit)).toBe(0);
  });

  it("refuses Origin: null (sandboxed frames, data: pages) the same way", async () => {
    const commit = randomCommit();
    const answer = await postJson(submission(commit), { cookie: developer, origin: "null" });
    expect(answer.status).toBe(403);
    expect(await buildsOf(commit)).toBe(0);
  });

  it("accepts the same mutation from the app's own origin (control: the refusal above is the Origin's doing)", async () => {
    const commit = randomCommit();
    const answer = await postJson(submission(commit), { cookie: developer, origin: new URL(baseUrl()).origin });
    expect(errorMessages(answer)).toBe("");
    expect(answer.status).toBe(200);
    expect(await buildsOf(commit)).toBe(1);
  });

  it("refuses a multipart form post without the x-tauline-request header with 403, and stores nothing", async () => {
    const commit = randomCommit();
    const form = new FormData();
    form.set("operations", JSON.stringify({ query: MUTATION.replace("$input: ResultSubmission!", "$input: ResultSubmission, $file: File!").replace("submitResults(input: $input)", "submitResults(input: $input, file: $file)"), variables: { input: null, file: null } }));
    form.set("map", JSON.stringify({ 0: ["variables.file"] }));
    form.set("0", new File([JSON.stringify(submission(commit))], "build.json", { type: "application/json" }));
    const answer = await send("/api/graphql", { method: "POST", body: form, headers: { cookie: developer } });
    expect(answer.status).toBe(403);
    expect(errorMessages(answer)).toContain("x-tauline-request");
    expect(await buildsOf(commit)).toBe(0);
  });

  it("refuses url-encoded and text/plain form posts (what a plain HTML form can send) with 415, and stores nothing", async () => {
    const urlEncodedCommit = randomCommit();
    const textCommit = randomCommit();
    const posts = [
      // A form can only send name=value pairs; the commit is in the variables it names.
      { type: "application/x-www-form-urlencoded", commit: urlEncodedCommit, body: new URLSearchParams({ query: MUTATION, variables: JSON.stringify(submission(urlEncodedCommit).variables) }).toString() },
      // enctype="text/plain" can smuggle a JSON-looking body.
      { type: "text/plain", commit: textCommit, body: JSON.stringify(submission(textCommit)) },
    ];
    for (const { type, commit, body } of posts) {
      const answer = await send("/api/graphql", { method: "POST", headers: { "content-type": type, cookie: developer }, body });
      expect(answer.status).toBe(415);
      expect(await buildsOf(commit)).toBe(0);
    }
  });

  it("grants no CORS preflight to another site, so its scripts cannot add the custom header or read answers", async () => {
    const preflight = await send("/api/graphql", {
      method: "OPTIONS",
      headers: { origin: "https://evil.example", "access-control-request-method": "POST", "access-control-request-headers": "content-type,x-tauline-request" },
    });
    expect(preflight.headers.get("access-control-allow-origin")).toBeNull();
    expect(preflight.headers.get("access-control-allow-credentials")).toBeNull();
    expect(preflight.status).toBe(403);
  });

  it("keeps CI posts working: bearer token, no cookie, no Origin", async () => {
    const commit = randomCommit();
    const answer = await postJson(submission(commit), { authorization: `Bearer ${ciToken()}` });
    expect(errorMessages(answer)).toBe("");
    expect(answer.status).toBe(200);
    expect(await buildsOf(commit)).toBe(1);
  });
});

describe("session cookie attributes", () => {
  it("sets the session cookie HttpOnly and SameSite=Lax (or Strict) at sign-in", async () => {
    const csrf = await fetch(`${baseUrl()}/api/auth/csrf`);
    const { csrfToken } = (await csrf.json()) as { csrfToken: string };
    const jar = csrf.headers.getSetCookie().map((c) => c.split(";")[0]).join("; ");
    const res = await fetch(`${baseUrl()}/api/auth/callback/credentials`, {
      method: "POST",
      redirect: "manual",
      headers: { "content-type": "application/x-www-form-urlencoded", cookie: jar },
      body: new URLSearchParams({ csrfToken, email: "developer@fenwick-hydro.test", password: process.env.TAULINE_DEMO_PASSWORD ?? "", json: "true" }),
    });
    const session = res.headers.getSetCookie().find((c) => /session-token=/.test(c));
    expect(session, "sign-in sets a session cookie").toBeDefined();
    const attributes = session!.split(";").slice(1).map((a) => a.trim().toLowerCase());
    expect(attributes).toContain("httponly");
    expect(attributes.some((a) => a === "samesite=lax" || a === "samesite=strict")).toBe(true);
  });
});
