import { setTimeout as sleep } from "node:timers/promises";
import { Client } from "pg";
import type { CiLedger } from "./ci-clients";

// After the load: the database must hold exactly what the server acknowledged.
// Every receipt's build with exactly its runs, nothing of a refused or
// unanswered post, and no build under the load's branches that no client posted.

export interface StoredBuild {
  commit: string;
  buildId: string;
  runIds: string[];
  submissions: number;
  quantityValues: number;
}

export interface DatabaseCheck {
  ok: boolean;
  acknowledgedBuilds: number;
  acknowledgedRuns: number;
  storedBuilds: number;
  storedRuns: number;
  refusedPosts: number;
  unansweredPosts: number;
  /** Requests built after the drain began; never written to the wire. */
  neverSentPosts: number;
  problems: string[];
}

export async function checkDatabase(databaseUrl: string, branchPrefix: string, ledger: CiLedger): Promise<DatabaseCheck> {
  const client = new Client({ connectionString: databaseUrl });
  await client.connect();
  try {
    // A post that timed out may still be running on the server: wait until the
    // load's builds stop changing before judging.
    const waitingFor = [...ledger.posted.values()].some((p) => !p.answer && !p.afterDrain);
    if (waitingFor) await waitForQuiet(client, branchPrefix);
    return compare(await readStoredBuilds(client, branchPrefix), ledger);
  } finally {
    await client.end();
  }
}

async function readStoredBuilds(client: Client, branchPrefix: string): Promise<Map<string, StoredBuild>> {
  const res = await client.query<{ commit: string; build_id: string; run_ids: string[]; submissions: number; quantity_values: number }>(
    `select b.commit, b.id::text as build_id,
            coalesce(array_agg(r.id::text order by r.id) filter (where r.id is not null), '{}') as run_ids,
            (select count(*)::int from submissions s where s.build_id = b.id) as submissions,
            (select count(*)::int from quantity_values v where v.build_id = b.id) as quantity_values
       from builds b left join runs r on r.build_id = b.id
      where left(b.branch, length($1)) = $1
      group by b.id`,
    [`${branchPrefix}/`],
  );
  return new Map(res.rows.map((r) => [r.commit, { commit: r.commit, buildId: r.build_id, runIds: r.run_ids, submissions: r.submissions, quantityValues: r.quantity_values }]));
}

async function waitForQuiet(client: Client, branchPrefix: string): Promise<void> {
  let last = "";
  for (let i = 0; i < 60; i++) {
    const res = await client.query<{ state: string }>(
      `select count(*) || '/' || coalesce(max(r.id), 0) as state from builds b left join runs r on r.build_id = b.id where left(b.branch, length($1)) = $1`,
      [`${branchPrefix}/`],
    );
    if (res.rows[0].state === last) return;
    last = res.rows[0].state;
    await sleep(2000);
  }
}

export function compare(stored: Map<string, StoredBuild>, ledger: CiLedger): DatabaseCheck {
  const problems: string[] = [];
  let acknowledgedBuilds = 0;
  let acknowledgedRuns = 0;
  let refusedPosts = 0;
  let unansweredPosts = 0;
  let neverSentPosts = 0;
  for (const posted of ledger.posted.values()) {
    const row = stored.get(posted.commit);
    const receipt = posted.answer?.receipt;
    if (receipt) {
      acknowledgedBuilds++;
      acknowledgedRuns += receipt.runIds.length;
      if (!row) problems.push(`acknowledged build ${receipt.buildId} (commit ${posted.commit}) is not in the database`);
      else if (row.buildId !== receipt.buildId) problems.push(`commit ${posted.commit}: receipt build ${receipt.buildId}, database build ${row.buildId}`);
      else if (!sameIds(row.runIds, receipt.runIds)) problems.push(`build ${row.buildId}: receipt runs [${receipt.runIds}], database runs [${row.runIds}]`);
      else if (row.submissions !== 1) problems.push(`build ${row.buildId}: ${row.submissions} submission rows for one post`);
      else if (row.quantityValues === 0) problems.push(`build ${row.buildId}: runs stored without any quantity values`);
      continue;
    }
    if (posted.answer) refusedPosts++;
    else if (posted.afterDrain) neverSentPosts++;
    else unansweredPosts++;
    if (row) {
      const what = posted.answer ? `refused (${posted.answer.error})` : posted.afterDrain ? "never sent" : "unanswered";
      problems.push(`commit ${posted.commit} was ${what} but build ${row.buildId} with ${row.runIds.length} of ${posted.runCount} runs is stored`);
    }
  }
  for (const row of stored.values()) {
    if (!ledger.posted.has(row.commit)) problems.push(`build ${row.buildId} (commit ${row.commit}) is stored but no client posted it`);
  }
  let storedRuns = 0;
  for (const row of stored.values()) storedRuns += row.runIds.length;
  return {
    ok: problems.length === 0,
    acknowledgedBuilds,
    acknowledgedRuns,
    storedBuilds: stored.size,
    storedRuns,
    refusedPosts,
    unansweredPosts,
    neverSentPosts,
    problems,
  };
}

function sameIds(a: string[], b: string[]): boolean {
  if (a.length !== b.length) return false;
  const sorted = [...b].sort((x, y) => Number(x) - Number(y));
  return a.every((id, i) => id === sorted[i]);
}
