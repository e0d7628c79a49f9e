// The Content-Security-Policy of every page, with a fresh nonce per request
// (Next.js's documented CSP-with-nonce pattern: the proxy puts the policy on the
// request, Next reads the nonce from it while rendering and stamps it on its own
// scripts). Scripts run only with the nonce ('strict-dynamic' lets those load
// the app's chunks), so an injected <script> or inline handler does nothing.
// Styles allow 'unsafe-inline': nivo and the plots set style attributes on SVG
// elements, which a nonce cannot cover; style injection cannot run code.

/** A nonce for one response: 128 random bits, base64. */
export function createNonce(): string {
  const bytes = new Uint8Array(16);
  crypto.getRandomValues(bytes);
  return btoa(String.fromCharCode(...bytes));
}

/** The page policy for one nonce. Development adds 'unsafe-eval' (React's dev build rebuilds server stacks with eval). */
export function buildPagePolicy(nonce: string, development: boolean): string {
  const directives = [
    "default-src 'self'",
    `script-src 'self' 'nonce-${nonce}' 'strict-dynamic'${development ? " 'unsafe-eval'" : ""}`,
    "style-src 'self' 'unsafe-inline'",
    "img-src 'self' blob: data:",
    "font-src 'self' data:",
    "connect-src 'self'",
    "object-src 'none'",
    "base-uri 'self'",
    "form-action 'self'",
    "frame-ancestors 'none'",
  ];
  return directives.join("; ");
}
