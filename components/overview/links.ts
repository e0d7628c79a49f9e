// Shareable addresses the morning view links to.

export function runHref(buildId: string, runId: string): string {
  return `/builds/${buildId}/runs/${runId}`;
}

export function trendHref({ caseKey, quantity, models, branch, grid }: { caseKey: string; quantity: string; models: string[]; branch: string; grid?: string }): string {
  const q = new URLSearchParams({ case: caseKey, quantity, model: models.join(","), branch });
  if (grid && grid !== "default") q.set("grid", grid);
  return `/trends?${q.toString()}`;
}
