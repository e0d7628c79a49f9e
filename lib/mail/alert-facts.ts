import { createHash } from "node:crypto";

// What one alert says, as plain data: kept in digest items and rendered into
// mail by compose-alert.ts. Pure: no I/O, so it is unit-tested on its own.

export interface AlertBuild {
  id: number;
  solver: string;
  version: string;
  commit: string;
  branch: string;
  verdict: string;
  pipelineUrl: string | null;
}

export interface AlertWhere {
  runId: number;
  caseKey: string;
  model: string;
  grid: string;
}

export interface BandExit extends AlertWhere {
  quantity: string;
  label: string | null;
  unit: string | null;
  value: number | null;
  lower: number | null;
  upper: number | null;
  reference: number | null;
  bandKind: string | null;
  bandVersion: number | null;
}

export interface DriftNote extends AlertWhere {
  quantity: string;
  label: string | null;
  unit: string | null;
  value: number | null;
  verdict: string;
  reason: "baseline" | "trend";
  baselineValue: number | null;
  baselineDelta: number | null;
  noiseFloor: number | null;
  pValue: number | null;
  slopePerBuild: number | null;
}

export interface IncompleteRun extends AlertWhere {
  status: string;
  iterations: number | null;
}

export interface AlertFacts {
  build: AlertBuild;
  exits: BandExit[];
  incompleteRuns: IncompleteRun[];
  drifts: DriftNote[];
}

/** A build is worth a mail when something left its band, a run did not complete, or a value drifts. */
export function needsAlert(facts: AlertFacts): boolean {
  return facts.exits.length + facts.incompleteRuns.length + facts.drifts.length > 0;
}

/** The cases the alert touches: subscriptions to any of them match. */
export function alertCaseKeys(facts: AlertFacts): string[] {
  return [...new Set([...facts.exits, ...facts.incompleteRuns, ...facts.drifts].map((f) => f.caseKey))].sort();
}

/**
 * The outbox event key: the build and a hash of WHAT is wrong (which quantities
 * of which runs left their band or drift and why, which runs failed), not of the
 * values. A re-post that reports the same findings, even with values changed in
 * the last digits, is the same event and is not mailed again; a re-post that
 * adds or clears a finding is a new event.
 */
export function alertEventKey(facts: AlertFacts): string {
  const where = (f: AlertWhere) => `${f.caseKey}|${f.model}|${f.grid}`;
  const lines = [
    ...facts.exits.map((e) => `outside|${where(e)}|${e.quantity}`),
    ...facts.incompleteRuns.map((r) => `run|${where(r)}|${r.status}`),
    ...facts.drifts.map((d) => `drift|${where(d)}|${d.quantity}|${d.reason}`),
  ].sort();
  const hash = createHash("sha256").update(lines.join("\n"), "utf8").digest("hex").slice(0, 20);
  return `alert:build:${facts.build.id}:${hash}`;
}

export function shortCommit(commit: string): string {
  return commit.slice(0, 10);
}
