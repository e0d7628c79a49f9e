import "server-only";
import { getDb } from "@/db";
import type { BandRecordRow } from "@/db/queries/case-library";
import { countJudgedBuildsByBand, getBandScopeVersions, getCaseAuditEntries, type LibraryAuditRow } from "@/db/queries/library-edit";
import { getQuantityKeysByCase } from "@/db/queries/case-library";
import { BAND_FIELDS, CASE_FIELDS, QUANTITY_FIELDS, diffFields, type FieldChange } from "@/lib/format/field-changes";
import { bandScopeSchema } from "@/lib/validation/case";
import type { Actor } from "./actor";
import { requirePerson } from "./authorize";
import { parseInput } from "./library-edit";

// Readable history of the case library: every version of a band scope with what
// changed from the version before, and the change record of a case.

const asBand = (r: BandRecordRow) => ({
  kind: r.kind,
  reference: r.reference,
  source: r.source,
  lower: r.lower,
  upper: r.upper,
  marginalMargin: r.marginal_margin,
  noiseFloor: r.noise_floor,
  fitSettings: r.fit_settings ?? {},
});

/** Versions of one band scope, newest first, each with its changes against the version before. */
export async function findBandVersions({ actor, unsafeInput }: { actor: Actor | null; unsafeInput: unknown }) {
  requirePerson(actor);
  const scope = parseInput(bandScopeSchema, unsafeInput);
  const db = getDb();
  const versions = await getBandScopeVersions({ db, ...scope });
  const judged = await countJudgedBuildsByBand({ db, caseKey: scope.caseKey, quantityKey: scope.quantityKey, bandIds: versions.map((v) => v.id) });
  return versions
    .map((v, i) => ({ ...v, changes: diffFields(i === 0 ? null : asBand(versions[i - 1]), asBand(v), BAND_FIELDS), judgedBuilds: judged.get(v.id) ?? 0 }))
    .reverse();
}

export interface LibraryChange {
  id: string;
  at: Date;
  by: string;
  action: string;
  subject: string;
  reason: string | null;
  changes: FieldChange[];
}

type Details = { reason?: string; before?: Record<string, unknown> | null; after?: Record<string, unknown>; [k: string]: unknown };

function describeEntry(row: LibraryAuditRow): LibraryChange {
  const d = row.details as Details;
  const base = { id: String(row.id), at: row.at, by: row.actor_name ?? row.actor_label, action: row.action, reason: d.reason ?? null };
  const diff = (fields: readonly string[]) => diffFields(d.before ?? null, d.after ?? {}, fields);
  if (row.entity === "case") return { ...base, subject: row.action === "case.created" ? "case created" : "case edited", changes: diff(CASE_FIELDS) };
  if (row.entity === "quantity") {
    return { ...base, subject: `quantity ${row.entity_id} ${row.action === "quantity.defined" ? "defined" : "edited"}`, changes: diff(QUANTITY_FIELDS) };
  }
  if (row.entity === "band") {
    const scope = (d.scope ?? {}) as { quantity?: string; model?: string | null };
    const what = `band ${scope.quantity} · ${scope.model ?? "all models"} v${d.version}`;
    return { ...base, subject: row.action === "band.created" ? `${what} created` : what, changes: diff(BAND_FIELDS) };
  }
  const build = `build ${((d.build ?? {}) as { version?: string }).version ?? row.entity_id}`;
  return { ...base, subject: `${build} re-judged`, changes: [{ field: build, before: d.originalVerdict ?? null, after: d.verdict ?? null }] };
}

/**
 * The change record of a case, newest first. Re-judgements made together (one
 * request, one timestamp) become one entry listing each build's verdict change.
 */
export async function findCaseChangeRecord({ actor, caseKey, last }: { actor: Actor | null; caseKey: string; last: number }) {
  requirePerson(actor);
  const db = getDb();
  const keys = await getQuantityKeysByCase({ db, caseKeys: [caseKey] });
  const rows = await getCaseAuditEntries({ db, caseKey, quantityKeys: keys.map((k) => k.quantity_key), limit: Math.min(Math.max(last, 1), 500) });
  const out: LibraryChange[] = [];
  for (const row of rows) {
    const entry = describeEntry(row);
    const prev = out.at(-1);
    if (row.action === "build.reevaluated" && prev?.action === row.action && prev.at.getTime() === row.at.getTime()) {
      prev.changes.push(...entry.changes);
      prev.subject = `${prev.changes.length} builds re-judged`;
    } else {
      out.push(entry);
    }
  }
  return out;
}
