import { readPeakRssOfTreeMb } from "../bench/http";

// Peak resident set of the app during the load, read the way the bench reads it
// (the launcher LOAD_WEB_PID from scripts/load.sh and its descendants). Null when
// the pid is unknown (the load was pointed at a server it did not start).
export function readServerPeakRssMb(): number | null {
  const root = Number(process.env.LOAD_WEB_PID);
  if (!Number.isInteger(root) || root <= 0) return null;
  const peak = readPeakRssOfTreeMb(root);
  return peak > 0 ? peak : null;
}
