import { existsSync } from "node:fs";
import { readFile, readdir } from "node:fs/promises";
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import { requireEnv } from "../helpers/env";

// Nothing the server keeps secret may reach a file the browser can download.
// Under `npm test` the build under test is NEXT_DIST_DIR (.data/next-test),
// built with the same environment this test reads, so the values compared are
// the ones that would have leaked.

const staticDir = join(process.env.NEXT_DIST_DIR ?? ".next", "static");

async function listFiles(dir: string): Promise<string[]> {
  const entries = await readdir(dir, { withFileTypes: true });
  const nested = await Promise.all(entries.map((e) => (e.isDirectory() ? listFiles(join(dir, e.name)) : Promise.resolve([join(dir, e.name)]))));
  return nested.flat();
}

/** The secrets of this environment, each with a label for the failure message. */
function secrets(): [string, string][] {
  const list: [string, string][] = [
    ["NEXTAUTH_SECRET", requireEnv("NEXTAUTH_SECRET")],
    ["DATABASE_URL", requireEnv("DATABASE_URL")],
    ["TAULINE_CI_TOKEN", requireEnv("TAULINE_CI_TOKEN")],
  ];
  const password = decodeURIComponent(new URL(requireEnv("DATABASE_URL")).password);
  if (password) list.push(["the database password", password]);
  if (process.env.SMTP_PASS) list.push(["SMTP_PASS", process.env.SMTP_PASS]);
  return list;
}

// Paths of modules that only the server may load (SQL, sessions, mail, jobs).
const SERVER_ONLY_PATHS = ["db/queries/", "db/migrations/", "db/index", "lib/auth/", "lib/mail/", "lib/jobs/", "knexfile", "node_modules/pg/", "node_modules/knex/", "nodemailer", "bcryptjs"];

describe("built client files", () => {
  it("exist where the build put them (a missing folder is a failure, not a pass)", async () => {
    expect(existsSync(staticDir), `${staticDir} is missing: build the app first (npm test does)`).toBe(true);
    const files = await listFiles(staticDir);
    expect(files.filter((f) => f.endsWith(".js")).length).toBeGreaterThan(5);
  });

  it("contain none of the server's secrets", async () => {
    const leaks: string[] = [];
    const watched = secrets();
    for (const file of await listFiles(staticDir)) {
      const text = await readFile(file, "latin1");
      for (const [label, value] of watched) if (text.includes(value)) leaks.push(`${label} in ${file}`);
    }
    expect(leaks).toEqual([]);
  });

  it("contain no server-only module", async () => {
    const leaks: string[] = [];
    for (const file of (await listFiles(staticDir)).filter((f) => /\.(js|map)$/.test(f))) {
      const text = await readFile(file, "utf8");
      for (const path of SERVER_ONLY_PATHS) if (text.includes(path)) leaks.push(`${path} in ${file}`);
    }
    expect(leaks).toEqual([]);
  });
});
