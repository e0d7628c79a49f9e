import "server-only";
import { z } from "zod";
import { getDb } from "@/db";
import { countRunVerdictsByBuildIds, listBuildTable, type BuildTableFilter } from "@/db/queries/build-list";
import { getBaselineBuild, getBuildsByIds, type BuildRow } from "@/db/queries/builds";
import { getLatestDecisionsByBuildIds } from "@/db/queries/gate";
import { AppError, formatPath } from "@/lib/errors";
import type { Actor } from "./actor";
import { requirePerson } from "./authorize";

// Reads behind the builds table, its CSV export and the build page header.

const verdicts = ["within", "marginal", "outside", "unbanded", "missing"] as const;
/** Most rows one CSV export returns; a larger view must be narrowed by its filters. */
export const EXPORT_ROW_CAP = 10_000;

const day = z
  .string()
  .trim()
  .regex(/^\d{4}-\d{2}-\d{2}$/, "must be a date YYYY-MM-DD")
  .refine((s) => !Number.isNaN(Date.parse(`${s}T00:00:00Z`)) && new Date(`${s}T00:00:00Z`).toISOString().startsWith(s), "is not a calendar date");
const text = (max: number) => z.string().trim().max(max).transform((s) => (s === "" ? null : s));

export const buildTableFilterSchema = z
  .object({
    branch: text(200).nullish(),
    verdict: z.enum(verdicts).nullish(),
    version: text(100).nullish(),
    commitPrefix: z
      .string()
      .trim()
      .toLowerCase()
      .regex(/^[0-9a-f]{0,64}$/, "must be hexadecimal digits of a commit hash")
      .transform((s) => (s === "" ? null : s))
      .nullish(),
    fromDate: day.nullish(),
    toDate: day.nullish(),
  })
  .refine((f) => !f.fromDate || !f.toDate || f.fromDate <= f.toDate, { message: "fromDate must not be after toDate", path: ["fromDate"] });

export const buildTableSortSchema = z.object({
  column: z.enum(["received", "version", "branch", "verdict"]),
  direction: z.enum(["asc", "desc"]),
});

export const buildTableSchema = z.object({
  filter: buildTableFilterSchema.nullish(),
  sort: buildTableSortSchema.nullish(),
  first: z.number().int().min(1).max(200).default(25),
  offset: z.number().int().min(0).max(10_000_000).default(0),
});

type ParsedFilter = z.infer<typeof buildTableFilterSchema>;

/** Days are UTC calendar days; the end day is inclusive, so the bound is the next midnight. */
function toQueryFilter(f: ParsedFilter | null | undefined): BuildTableFilter {
  if (!f) return {};
  const next = f.toDate ? new Date(Date.parse(`${f.toDate}T00:00:00Z`) + 86_400_000) : null;
  return {
    branch: f.branch,
    verdict: f.verdict,
    version: f.version,
    commitPrefix: f.commitPrefix,
    receivedFrom: f.fromDate ? new Date(`${f.fromDate}T00:00:00Z`) : null,
    receivedBefore: next,
  };
}

const DEFAULT_SORT = { column: "received", direction: "desc" } as const;

export async function findBuildTable({ actor, unsafeInput }: { actor: Actor | null; unsafeInput: unknown }) {
  requirePerson(actor);
  const input = parseInput(buildTableSchema, unsafeInput);
  const { rows, total } = await listBuildTable({
    db: getDb(),
    filter: toQueryFilter(input.filter),
    sort: input.sort ?? DEFAULT_SORT,
    limit: input.first,
    offset: input.offset,
  });
  return { items: rows, totalCount: total };
}

export interface ExportedBuild {
  build: BuildRow;
  gate: "pending" | "approved" | "held" | "rejected";
  runCounts: Record<(typeof verdicts)[number], number>;
}

/** Every build of a view (same filter and sort as the table), up to EXPORT_ROW_CAP. */
export async function exportBuildTable({ actor, unsafeInput }: { actor: Actor | null; unsafeInput: unknown }) {
  requirePerson(actor);
  const input = parseInput(buildTableSchema.pick({ filter: true, sort: true }), unsafeInput);
  const db = getDb();
  const { rows, total } = await listBuildTable({ db, filter: toQueryFilter(input.filter), sort: input.sort ?? DEFAULT_SORT, limit: EXPORT_ROW_CAP, offset: 0 });
  const ids = rows.map((r) => r.id);
  const [decisions, counts] = await Promise.all([getLatestDecisionsByBuildIds({ db, buildIds: ids }), countRunVerdictsByBuildIds({ db, buildIds: ids })]);
  const gate = new Map(decisions.map((d) => [d.build_id, d.state]));
  const empty = { within: 0, marginal: 0, outside: 0, unbanded: 0, missing: 0 };
  const builds: ExportedBuild[] = rows.map((b) => ({ build: b, gate: gate.get(b.id) ?? "pending", runCounts: counts.get(b.id) ?? empty }));
  return { builds, total, truncated: total > rows.length };
}

/** The build page header: the build, its gate, run counts and its branch baseline. */
export async function findBuildSummary({ actor, id }: { actor: Actor | null; id: number }) {
  requirePerson(actor);
  const db = getDb();
  const [build] = await getBuildsByIds({ db, ids: [id] });
  if (!build) return null;
  const [[decision], counts, baseline] = await Promise.all([
    getLatestDecisionsByBuildIds({ db, buildIds: [id] }),
    countRunVerdictsByBuildIds({ db, buildIds: [id] }),
    getBaselineBuild({ db, branch: build.branch, before: build.received_at, excludeId: build.id }),
  ]);
  return {
    build,
    decision: decision ?? null,
    runCounts: counts.get(id) ?? { within: 0, marginal: 0, outside: 0, unbanded: 0, missing: 0 },
    baseline: baseline ?? null,
  };
}

export function parseInput<T>(schema: z.ZodType<T>, unsafeInput: unknown, prefix = ""): T {
  const r = schema.safeParse(unsafeInput);
  if (r.success) return r.data;
  const issues = r.error.issues.map((i) => ({ path: formatPath(i.path, prefix), message: i.message }));
  throw new AppError("invalid_input", issues.map((i) => `${i.path} ${i.message}`).join("; "), issues);
}
