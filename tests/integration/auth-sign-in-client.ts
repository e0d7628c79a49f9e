import http from "node:http";
import { requireEnv } from "../helpers/env";

// next-auth's credentials sign-in exactly as tests/helpers/session.ts does it
// (CSRF token first, then the callback with json=true), but over node:http so
// that the connection can leave from a chosen loopback address (127.x.y.z all
// reach the server on Linux). The throttle tests then count against addresses
// of their own, never against 127.0.0.1 that the rest of the suite shares.

export interface SignInAnswer {
  status: number;
  /** next-auth's error word ("CredentialsSignin") or the throttle's message; null on success. */
  error: string | null;
  retryAfter: string | null;
  signedIn: boolean;
}

function request(path: string, { from, method = "GET", headers = {}, body }: { from: string; method?: string; headers?: Record<string, string>; body?: string }) {
  const base = new URL(requireEnv("TAULINE_TEST_URL"));
  return new Promise<{ status: number; headers: http.IncomingHttpHeaders; text: string }>((resolve, reject) => {
    const req = http.request({ host: base.hostname, port: base.port, path, method, localAddress: from, headers }, (res) => {
      let text = "";
      res.setEncoding("utf8");
      res.on("data", (chunk: string) => (text += chunk));
      res.on("end", () => resolve({ status: res.statusCode ?? 0, headers: res.headers, text }));
    });
    req.on("error", reject);
    req.end(body);
  });
}

const cookiePairs = (headers: http.IncomingHttpHeaders) => (headers["set-cookie"] ?? []).map((c) => c.split(";")[0]);

/** A client at one loopback address, holding its CSRF cookie across attempts like a browser tab would. */
export async function openSignInClient(from: string) {
  const csrf = await request("/api/auth/csrf", { from });
  const { csrfToken } = JSON.parse(csrf.text) as { csrfToken: string };
  const jar = cookiePairs(csrf.headers).join("; ");
  return {
    async attempt(email: string, password: string, extraHeaders: Record<string, string> = {}): Promise<SignInAnswer> {
      const res = await request("/api/auth/callback/credentials", {
        from,
        method: "POST",
        headers: { "content-type": "application/x-www-form-urlencoded", cookie: jar, ...extraHeaders },
        body: new URLSearchParams({ csrfToken, email, password, json: "true" }).toString(),
      });
      const { url } = JSON.parse(res.text) as { url: string };
      const retryAfter = res.headers["retry-after"];
      return {
        status: res.status,
        error: new URL(url).searchParams.get("error"),
        retryAfter: typeof retryAfter === "string" ? retryAfter : null,
        signedIn: cookiePairs(res.headers).some((c) => c.startsWith("next-auth.session-token=")),
      };
    },
  };
}

/** A loopback address nobody else in this run uses (127.0.0.1 stays the suite's). */
export function freshLoopbackAddress(): string {
  const octet = () => 1 + Math.floor(Math.random() * 254);
  return `127.${octet()}.${octet()}.${octet()}`;
}
