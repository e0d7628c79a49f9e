import "server-only";
import type { z } from "zod";
import { getDb } from "@/db";
import { insertAuditEntry } from "@/db/queries/audit";
import { getModelKeys } from "@/db/queries/library";
import {
  getCaseForUpdate,
  getQuantityDefinitionForUpdate,
  insertCase,
  insertQuantityDefinition,
  updateCase,
  updateQuantityDefinition,
  type CaseRecord,
  type QuantityRecord,
} from "@/db/queries/library-edit";
import { AppError, formatPath, type FieldIssue } from "@/lib/errors";
import { caseCreateSchema, caseRevisionSchema, quantityCreateSchema, quantityRevisionSchema } from "@/lib/validation/case";
import { actorUserId, type Actor } from "./actor";
import { requirePerson } from "./authorize";
import { findCases } from "./reads";

// The QA lead's edits of cases and quantity definitions. Each runs in one
// transaction with its audit row, which keeps the reason and the record before
// and after, so the change record can show a field-by-field diff. Bands change
// through reviseBand (lib/services/bands.ts), which versions them.

export function parseInput<S extends z.ZodType>(schema: S, unsafeInput: unknown): z.infer<S> {
  const parsed = schema.safeParse(unsafeInput);
  if (parsed.success) return parsed.data;
  const issues = parsed.error.issues.map((i) => ({ path: formatPath(i.path, "input"), message: i.message }));
  throw invalid(issues);
}

function invalid(issues: FieldIssue[]): AppError {
  return new AppError("invalid_input", issues.map((i) => `${i.path} ${i.message}`).join("; "), issues);
}

/** Two people creating the same key at once: the loser gets the field error, not a masked 500. */
function rethrowDuplicate(error: unknown, issue: FieldIssue): never {
  if (typeof error === "object" && error !== null && (error as { code?: string }).code === "23505") throw invalid([issue]);
  throw error;
}

const caseSnapshot = (c: CaseRecord) => ({ title: c.title, description: c.description, models: c.model_keys, parameters: c.parameters ?? {} });
const quantitySnapshot = (q: QuantityRecord) => ({ label: q.label, unit: q.unit, meaning: q.meaning, derivedFrom: q.derived_from });
const toDefinition = (q: QuantityRecord) => ({ key: q.key, label: q.label, unit: q.unit, meaning: q.meaning, derivedFrom: q.derived_from });

async function checkModels(models: string[]) {
  const known = await getModelKeys({ db: getDb() });
  const issues = models.flatMap((m, i) => (known.has(m) ? [] : [{ path: `input.models[${i}]`, message: `is not a known turbulence model: "${m}"` }]));
  if (issues.length) throw invalid(issues);
}

export async function createCase({ actor, unsafeInput }: { actor: Actor | null; unsafeInput: unknown }) {
  requirePerson(actor, "qa");
  const input = parseInput(caseCreateSchema, unsafeInput);
  await checkModels(input.models);
  const taken = { path: "input.key", message: `is already the key of a case: "${input.key}"` };
  await getDb()
    .transaction(async (trx) => {
      if (await getCaseForUpdate({ db: trx, key: input.key })) throw invalid([taken]);
      const row = await insertCase({ db: trx, input });
      await insertAuditEntry({
        db: trx,
        entry: { actorUserId: actorUserId(actor), actorLabel: actor.label, action: "case.created", entity: "case", entityId: row.key, details: { reason: input.reason, before: null, after: caseSnapshot(row) } },
      });
    })
    .catch((error: unknown) => rethrowDuplicate(error, taken));
  const [created] = await findCases({ actor, key: input.key });
  return created;
}

export async function reviseCase({ actor, key, unsafeInput }: { actor: Actor | null; key: string; unsafeInput: unknown }) {
  requirePerson(actor, "qa");
  const input = parseInput(caseRevisionSchema, unsafeInput);
  await checkModels(input.models);
  await getDb().transaction(async (trx) => {
    const before = await getCaseForUpdate({ db: trx, key });
    if (!before) throw new AppError("not_found", `There is no case with the key "${key}".`);
    const after = await updateCase({ db: trx, key, input, at: new Date() });
    await insertAuditEntry({
      db: trx,
      entry: { actorUserId: actorUserId(actor), actorLabel: actor.label, action: "case.revised", entity: "case", entityId: key, details: { reason: input.reason, before: caseSnapshot(before), after: caseSnapshot(after) } },
    });
  });
  const [revised] = await findCases({ actor, key });
  return revised;
}

export async function defineQuantity({ actor, unsafeInput }: { actor: Actor | null; unsafeInput: unknown }) {
  requirePerson(actor, "qa");
  const input = parseInput(quantityCreateSchema, unsafeInput);
  const taken = { path: "input.key", message: `is already defined: "${input.key}" (edit that definition instead)` };
  return getDb()
    .transaction(async (trx) => {
      if (await getQuantityDefinitionForUpdate({ db: trx, key: input.key })) throw invalid([taken]);
      const row = await insertQuantityDefinition({ db: trx, input });
      await insertAuditEntry({
        db: trx,
        entry: { actorUserId: actorUserId(actor), actorLabel: actor.label, action: "quantity.defined", entity: "quantity", entityId: row.key, details: { reason: input.reason, before: null, after: quantitySnapshot(row) } },
      });
      return toDefinition(row);
    })
    .catch((error: unknown) => rethrowDuplicate(error, taken));
}

export async function reviseQuantity({ actor, key, unsafeInput }: { actor: Actor | null; key: string; unsafeInput: unknown }) {
  requirePerson(actor, "qa");
  const input = parseInput(quantityRevisionSchema, unsafeInput);
  return getDb().transaction(async (trx) => {
    const before = await getQuantityDefinitionForUpdate({ db: trx, key });
    if (!before) throw new AppError("not_found", `There is no quantity definition with the key "${key}".`);
    const after = await updateQuantityDefinition({ db: trx, key, input });
    await insertAuditEntry({
      db: trx,
      entry: { actorUserId: actorUserId(actor), actorLabel: actor.label, action: "quantity.revised", entity: "quantity", entityId: key, details: { reason: input.reason, before: quantitySnapshot(before), after: quantitySnapshot(after) } },
    });
    return toDefinition(after);
  });
}
