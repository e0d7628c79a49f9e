import DataLoader from "dataloader";
import type { BandRecordRow } from "@/db/queries/case-library";
import { findBandRecordsByCase, findGridsByCase, findQuantityKeysByCase } from "@/lib/services/case-library";
import type { GraphQLContext } from "../context";

type Ctx = GraphQLContext;

// Per-request loaders for the library fields, keyed on the request's own loader
// set (created fresh for every request), so the `cases` list costs one statement
// per field instead of one per case.
const perRequest = new WeakMap<object, ReturnType<typeof createLibraryLoaders>>();

function createLibraryLoaders(ctx: Ctx) {
  const grouped = <R extends { case_key: string }>(fetch: (keys: readonly string[]) => Promise<R[]>) =>
    new DataLoader<string, R[]>(async (keys) => {
      const rows = await fetch(keys);
      return keys.map((k) => rows.filter((r) => r.case_key === k));
    });
  return {
    quantityKeys: grouped((caseKeys) => findQuantityKeysByCase({ actor: ctx.actor, caseKeys })),
    grids: grouped((caseKeys) => findGridsByCase({ actor: ctx.actor, caseKeys })),
    bandRecords: grouped((caseKeys) => findBandRecordsByCase({ actor: ctx.actor, caseKeys })),
  };
}

function libraryLoaders(ctx: Ctx) {
  let loaders = perRequest.get(ctx.loaders);
  if (!loaders) {
    loaders = createLibraryLoaders(ctx);
    perRequest.set(ctx.loaders, loaders);
  }
  return loaders;
}

export const caseLibraryResolvers = {
  Case: {
    async quantities(c: { key: string }, _: unknown, ctx: Ctx) {
      const [keys, defs] = await Promise.all([libraryLoaders(ctx).quantityKeys.load(c.key), ctx.loaders.quantityDefinitions.load("all")]);
      const wanted = new Set(keys.map((k) => k.quantity_key));
      return defs.filter((d) => wanted.has(d.key));
    },
    grids: async (c: { key: string }, _: unknown, ctx: Ctx) => (await libraryLoaders(ctx).grids.load(c.key)).map((g) => g.grid),
    bandRecords: (c: { key: string }, _: unknown, ctx: Ctx) => libraryLoaders(ctx).bandRecords.load(c.key),
  },
  BandRecord: {
    quantity: (b: BandRecordRow) => b.quantity_key,
    model: (b: BandRecordRow) => b.model_key,
    marginalMargin: (b: BandRecordRow) => b.marginal_margin,
    noiseFloor: (b: BandRecordRow) => b.noise_floor,
    fitSettings: (b: BandRecordRow) => b.fit_settings ?? {},
    author: (b: BandRecordRow) => b.author_label,
    validFrom: (b: BandRecordRow) => b.valid_from,
    supersededAt: (b: BandRecordRow) => b.superseded_at,
  },
};
