const production = process.env.NODE_ENV === "production";

// Sent with every response, pages and API alike. The pages' Content-Security-Policy
// carries a per-request nonce and is set in proxy.ts; API answers are data, never
// documents, so their policy allows nothing at all. In development the API keeps
// no policy, so that GraphiQL (development only) can load its page.
const everywhere = [
  { key: "X-Content-Type-Options", value: "nosniff" },
  { key: "X-Frame-Options", value: "DENY" },
  { key: "Referrer-Policy", value: "strict-origin-when-cross-origin" },
  { key: "Permissions-Policy", value: "camera=(), microphone=(), geolocation=(), payment=(), usb=(), browsing-topics=()" },
  { key: "Cross-Origin-Opener-Policy", value: "same-origin" },
];
const apiOnly = production ? [{ key: "Content-Security-Policy", value: "default-src 'none'; frame-ancestors 'none'" }] : [];

/** @type {import('next').NextConfig} */
const nextConfig = {
  // `npm test` builds into its own folder so that it never overwrites the
  // build that `npm start` is serving from `.next`.
  distDir: process.env.NEXT_DIST_DIR || ".next",
  reactStrictMode: true,
  poweredByHeader: false,
  // pg and knex load optional drivers dynamically; keep them out of the bundle.
  // graphql too: graphql-jit (CommonJS) and the schema (ESM) must share one copy
  // of it, or type checks across the two copies fail (graphql/plugins/execution.ts).
  serverExternalPackages: ["graphql", "knex", "pg", "pg-query-stream", "pg-copy-streams", "bcryptjs", "nodemailer", "pino", "pg-boss"],
  typedRoutes: false,
  async headers() {
    return [
      { source: "/:path*", headers: everywhere },
      { source: "/api/:path*", headers: apiOnly },
    ].filter((rule) => rule.headers.length > 0);
  },
};

export default nextConfig;
