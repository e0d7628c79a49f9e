import "server-only";
import { getDb } from "@/db";
import { getBandRecordsByCase, getQuantityKeysByCase, getRecentGridsByCase } from "@/db/queries/case-library";
import type { Actor } from "./actor";
import { requirePerson } from "./authorize";

// Batched reads behind the Case type's library fields (called from DataLoaders,
// one statement per request whatever the number of cases).

/** How many of the newest builds decide which grids a case offers in the trend picker. */
const GRID_LOOKBACK_BUILDS = 200;

export async function findQuantityKeysByCase({ actor, caseKeys }: { actor: Actor | null; caseKeys: readonly string[] }) {
  requirePerson(actor);
  return getQuantityKeysByCase({ db: getDb(), caseKeys });
}

export async function findGridsByCase({ actor, caseKeys }: { actor: Actor | null; caseKeys: readonly string[] }) {
  requirePerson(actor);
  return getRecentGridsByCase({ db: getDb(), caseKeys, recentBuilds: GRID_LOOKBACK_BUILDS });
}

export async function findBandRecordsByCase({ actor, caseKeys }: { actor: Actor | null; caseKeys: readonly string[] }) {
  requirePerson(actor);
  return getBandRecordsByCase({ db: getDb(), caseKeys });
}
