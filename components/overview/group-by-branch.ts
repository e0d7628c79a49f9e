/** Rows grouped by branch, keeping the order in which branches first appear. */
export function groupByBranch<T extends { branch: string }>(rows: readonly T[]): [string, T[]][] {
  const groups = new Map<string, T[]>();
  for (const r of rows) {
    const list = groups.get(r.branch) ?? [];
    list.push(r);
    groups.set(r.branch, list);
  }
  return [...groups.entries()];
}
