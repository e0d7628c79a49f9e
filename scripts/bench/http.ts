import { readFileSync } from "node:fs";
import { signInAt } from "../../tests/helpers/session";

// Talking to the running app as CI and as a signed-in person do.

export function requireEnv(name: string): string {
  const v = process.env[name];
  if (!v) throw new Error(`${name} is not set: run the bench through npm run bench`);
  return v;
}

export const appUrl = () => requireEnv("APP_URL");

/** Posts a GraphQL body (already serialised, so the timing excludes our own JSON.stringify) and checks for errors. */
export async function postGraphQLBody(body: string, auth: { token?: string; cookie?: string }): Promise<unknown> {
  const res = await fetch(`${appUrl()}/api/graphql`, {
    method: "POST",
    headers: {
      "content-type": "application/json",
      accept: "application/graphql-response+json, application/json",
      ...(auth.token ? { authorization: `Bearer ${auth.token}` } : {}),
      ...(auth.cookie ? { cookie: auth.cookie } : {}),
    },
    body,
  });
  const text = await res.text();
  const parsed = JSON.parse(text) as { data?: unknown; errors?: { message: string }[] };
  if (parsed.errors?.length) throw new Error(`GraphQL error (${res.status}): ${parsed.errors[0].message.slice(0, 300)}`);
  return parsed.data;
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
