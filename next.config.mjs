/** @type {import('next').NextConfig} */
const nextConfig = {
  // `npm test` builds into its own folder so that it never overwrites the
  // build that `npm start` is serving from `.next`.
  distDir: process.env.NEXT_DIST_DIR || ".next",
  reactStrictMode: true,
  poweredByHeader: false,
  // pg and knex load optional drivers dynamically; keep them out of the bundle.
  serverExternalPackages: ["knex", "pg", "pg-query-stream", "pg-copy-streams", "bcryptjs", "nodemailer", "pino", "pg-boss"],
  typedRoutes: false,
};

export default nextConfig;
