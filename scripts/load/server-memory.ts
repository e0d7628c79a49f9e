import { readFileSync } from "node:fs";

// Peak resident set of the app during the load: `next start` serves from a
// child process, so the largest VmHWM among the launcher (LOAD_WEB_PID, from
// scripts/load.sh) and its descendants. Null when the pid is unknown (the load
// was pointed at a server it did not start).

export function readServerPeakRssMb(): number | null {
  const root = Number(process.env.LOAD_WEB_PID);
  if (!Number.isInteger(root) || root <= 0) return null;
  let peak = 0;
  for (const pid of [root, ...listDescendants(root)]) {
    try {
      const m = /VmHWM:\s+(\d+) kB/.exec(readFileSync(`/proc/${pid}/status`, "utf8"));
      if (m) peak = Math.max(peak, Number(m[1]) / 1024);
    } catch {
      // the process ended between listing and reading: nothing to count
    }
  }
  return peak > 0 ? peak : null;
}

function listDescendants(pid: number): number[] {
  let children: number[] = [];
  try {
    const text = readFileSync(`/proc/${pid}/task/${pid}/children`, "utf8").trim();
    children = text ? text.split(/\s+/).map(Number) : [];
  } catch {
    return [];
  }
  return children.flatMap((c) => [c, ...listDescendants(c)]);
}
