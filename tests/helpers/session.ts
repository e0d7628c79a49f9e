import { requireEnv } from "./env";

/**
 * Signs in through next-auth's credentials endpoint exactly as the browser form
 * does (CSRF token first) and returns the session cookie header.
 */
export async function signIn(email: string, password = requireEnv("TAULINE_DEMO_PASSWORD")): Promise<string> {
  return signInAt(requireEnv("TAULINE_TEST_URL"), email, password);
}

/** The same sign-in against any running app (the bench uses it too). */
export async function signInAt(base: string, email: string, password: string): Promise<string> {
  const csrfRes = await fetch(`${base}/api/auth/csrf`);
  const { csrfToken } = (await csrfRes.json()) as { csrfToken: string };
  const jar = cookiesOf(csrfRes);
  const res = await fetch(`${base}/api/auth/callback/credentials`, {
    method: "POST",
    redirect: "manual",
    headers: { "content-type": "application/x-www-form-urlencoded", cookie: jar },
    body: new URLSearchParams({ csrfToken, email, password, json: "true" }),
  });
  const cookies = cookiesOf(res);
  if (!/next-auth\.session-token=/.test(cookies)) throw new Error(`sign-in as ${email} failed (${res.status})`);
  return [jar, cookies].filter(Boolean).join("; ");
}

function cookiesOf(res: Response): string {
  return res.headers
    .getSetCookie()
    .map((c) => c.split(";")[0])
    .join("; ");
}
