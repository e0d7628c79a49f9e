import type { PickerCase } from "@/graphql/operations/trends";
import type { XMode } from "./trend-data";

// The trend selection lives in the query string (?case=&quantity=&model=a,b&branch=&grid=&last=&x=)
// so that a chart can be shared as a link. Unknown or missing values fall back to
// sensible defaults drawn from what the case actually has.

export interface TrendSelection {
  caseKey: string;
  quantity: string;
  models: string[];
  branch: string;
  grid: string;
  last: number;
  x: XMode;
}

export const LAST_CHOICES = [20, 50, 100, 200, 500];
const DEFAULT_LAST = 50;
const MAX_MODELS = 6;

export function resolveSelection(params: URLSearchParams, cases: readonly PickerCase[], branches: readonly string[]): TrendSelection | null {
  if (cases.length === 0 || branches.length === 0) return null;
  const c = cases.find((k) => k.key === params.get("case")) ?? cases[0];
  const banded = new Set(c.bands.map((b) => b.quantity));
  const quantityKeys = c.quantities.map((q) => q.key);
  const quantity = quantityKeys.includes(params.get("quantity") ?? "")
    ? params.get("quantity")!
    : (quantityKeys.find((k) => banded.has(k)) ?? quantityKeys[0] ?? "");
  const asked = (params.get("model") ?? "").split(",").filter((m) => c.models.includes(m));
  const models = (asked.length > 0 ? [...new Set(asked)] : c.models).slice(0, MAX_MODELS);
  const branch = branches.includes(params.get("branch") ?? "") ? params.get("branch")! : branches.includes("main") ? "main" : branches[0];
  const grids = c.grids.length > 0 ? c.grids : ["default"];
  const grid = grids.includes(params.get("grid") ?? "") ? params.get("grid")! : grids.includes("default") ? "default" : grids[0];
  const lastAsked = Number(params.get("last"));
  const last = Number.isInteger(lastAsked) && lastAsked >= 2 && lastAsked <= 500 ? lastAsked : DEFAULT_LAST;
  const x: XMode = params.get("x") === "time" ? "time" : "order";
  return { caseKey: c.key, quantity, models, branch, grid, last, x };
}

/** The query string of a selection; defaults (grid "default", last 50, x by build order) are left out. */
export function selectionQuery(s: TrendSelection): string {
  const q = new URLSearchParams({ case: s.caseKey, quantity: s.quantity, model: s.models.join(","), branch: s.branch });
  if (s.grid !== "default") q.set("grid", s.grid);
  if (s.last !== DEFAULT_LAST) q.set("last", String(s.last));
  if (s.x !== "order") q.set("x", s.x);
  return q.toString();
}
