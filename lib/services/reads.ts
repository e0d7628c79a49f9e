import "server-only";
import { z } from "zod";
import { getDb } from "@/db";
import { getBuildByCommit, getBranches, listBuilds } from "@/db/queries/builds";
import { getLatestDecisionsByBuildIds } from "@/db/queries/gate";
import { getBandsInForce, getCases, getModels, getQuantityDefinitions } from "@/db/queries/library";
import { getTrendPoints } from "@/db/queries/quantity-values";
import { AppError, formatPath } from "@/lib/errors";
import type { Actor } from "./actor";
import { requirePerson, requireSignedIn } from "./authorize";

// Read services: the same functions serve GraphQL resolvers and server pages.

const verdicts = ["within", "marginal", "outside", "unbanded", "missing"] as const;

export const buildListSchema = z.object({
  branch: z.string().trim().min(1).max(200).nullish(),
  verdict: z.enum(verdicts).nullish(),
  first: z.number().int().min(1).max(200).default(25),
  offset: z.number().int().min(0).max(10_000_000).default(0),
});

export async function findBuilds({ actor, unsafeInput }: { actor: Actor | null; unsafeInput: unknown }) {
  requirePerson(actor);
  const f = parse(buildListSchema, unsafeInput);
  const { rows, total } = await listBuilds({ db: getDb(), filter: { branch: f.branch, verdict: f.verdict, limit: f.first, offset: f.offset } });
  return { items: rows, totalCount: total };
}

export async function findBranches({ actor }: { actor: Actor | null }) {
  requirePerson(actor);
  return getBranches({ db: getDb() });
}

export async function findCases({ actor, key }: { actor: Actor | null; key?: string }) {
  requirePerson(actor);
  const db = getDb();
  const cases = await getCases({ db, keys: key ? [key] : undefined });
  const bands = await getBandsInForce({ db, caseKeys: cases.map((c) => c.key) });
  return cases.map((c) => ({ ...c, bands: bands.filter((b) => b.caseKey === c.key) }));
}

export async function findModels({ actor }: { actor: Actor | null }) {
  requirePerson(actor);
  return getModels({ db: getDb() });
}

export async function findQuantityDefinitions({ actor }: { actor: Actor | null }) {
  requirePerson(actor);
  return getQuantityDefinitions({ db: getDb() });
}

const slug = z.string().trim().min(1).max(64);
export const trendSchema = z.object({
  case: slug,
  quantity: slug,
  model: slug,
  branch: z.string().trim().min(1).max(200),
  grid: slug.default("default"),
  last: z.number().int().min(1).max(5000).default(50),
});

export async function findTrend({ actor, unsafeInput }: { actor: Actor | null; unsafeInput: unknown }) {
  requirePerson(actor);
  const t = parse(trendSchema, unsafeInput);
  const points = await getTrendPoints({ db: getDb(), caseKey: t.case, quantityKey: t.quantity, modelKey: t.model, branch: t.branch, grid: t.grid, last: t.last });
  return { ...t, points };
}

/** Gate state of a commit for CI: the newest decision, or pending, and what blocks it. */
export async function findReleaseGate({ actor, commit }: { actor: Actor | null; commit: string }) {
  requireSignedIn(actor);
  const c = parse(z.string().trim().regex(/^[0-9a-fA-F]{7,64}$/, "must be a commit hash of 7 to 64 hexadecimal digits"), commit, "commit");
  const db = getDb();
  const build = await getBuildByCommit({ db, commit: c });
  if (!build) return { commit: c.toLowerCase(), build: null, state: "pending" as const, decision: null, blocking: ["no results have been posted for this commit"] };
  const [decision] = await getLatestDecisionsByBuildIds({ db, buildIds: [build.id] });
  const blockingRows: { case_key: string; model_key: string; grid: string; quantity_key: string; value: number | null }[] = await db("quantity_values")
    .where({ build_id: build.id, verdict: "outside" })
    .select("case_key", "model_key", "grid", "quantity_key", "value")
    .orderBy(["case_key", "model_key", "quantity_key"]);
  const failedRuns: { case_key: string; model_key: string; grid: string; status: string }[] = await db("runs")
    .where({ build_id: build.id })
    .whereNot({ status: "COMPLETED" })
    .select("case_key", "model_key", "grid", "status");
  const blocking = [
    ...failedRuns.map((r) => `${r.case_key}/${r.model_key}/${r.grid}: run ${r.status.toLowerCase()}`),
    ...blockingRows.map((r) => `${r.case_key}/${r.model_key}/${r.grid}: ${r.quantity_key} = ${r.value ?? "no value"} is outside its band`),
  ];
  return { commit: build.commit, build, state: decision?.state ?? ("pending" as const), decision: decision ?? null, blocking };
}

function parse<T>(schema: z.ZodType<T>, unsafeInput: unknown, prefix = ""): T {
  const r = schema.safeParse(unsafeInput);
  if (r.success) return r.data;
  const issues = r.error.issues.map((i) => ({ path: formatPath(i.path, prefix), message: i.message }));
  throw new AppError("invalid_input", issues.map((i) => `${i.path} ${i.message}`).join("; "), issues);
}
