import "server-only";
import { z } from "zod";
import { getDb } from "@/db";
import { getBranches, listBuilds } from "@/db/queries/builds";
import { getBandsInForce, getCases, getModels, getQuantityDefinitions } from "@/db/queries/library";
import { getTrendPoints } from "@/db/queries/quantity-values";
import { AppError, formatPath } from "@/lib/errors";
import type { Actor } from "./actor";
import { requirePerson } from "./authorize";

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

// The gate state for CI lives with the rest of the release gate.
export { findReleaseGate } from "./gate-ci";

function parse<T>(schema: z.ZodType<T>, unsafeInput: unknown, prefix = ""): T {
  const r = schema.safeParse(unsafeInput);
  if (r.success) return r.data;
  const issues = r.error.issues.map((i) => ({ path: formatPath(i.path, prefix), message: i.message }));
  throw new AppError("invalid_input", issues.map((i) => `${i.path} ${i.message}`).join("; "), issues);
}
