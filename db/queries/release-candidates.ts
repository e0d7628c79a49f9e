import "server-only";
import type { Db } from "../index";
import type { BuildRow } from "./builds";

// A build on a release/* branch with no gate decision is a release candidate
// awaiting the release manager, unless a later build of its branch has already
// been decided: that decision settled the release line (e.g. 4.2.0-rc.2 needs no
// answer once 4.2.0 shipped), so such builds are only counted, not listed.

const RELEASE_BRANCH = "release/%";
const UNDECIDED = `not exists (select 1 from gate_decisions d where d.build_id = b.id)`;
const LAST_DECIDED_AT = `coalesce((
  select max(b2.received_at) from builds b2 join gate_decisions d2 on d2.build_id = b2.id where b2.branch = b.branch
), '-infinity'::timestamptz)`;

/** Undecided release-branch builds newer than their branch's last decided build, newest first. */
export async function getAwaitingReleaseCandidates({ db, limit }: { db: Db; limit: number }): Promise<BuildRow[]> {
  return db("builds as b")
    .where("b.branch", "like", RELEASE_BRANCH)
    .whereRaw(UNDECIDED)
    .whereRaw(`b.received_at > ${LAST_DECIDED_AT}`)
    .orderBy([{ column: "b.received_at", order: "desc" }, { column: "b.id", order: "desc" }])
    .limit(limit)
    .select("b.*");
}

/** How many undecided release-branch builds a later decision on their branch has settled. */
export async function countSettledUndecidedCandidates({ db }: { db: Db }): Promise<number> {
  const [{ count }] = await db("builds as b")
    .where("b.branch", "like", RELEASE_BRANCH)
    .whereRaw(UNDECIDED)
    .whereRaw(`b.received_at <= ${LAST_DECIDED_AT}`)
    .count<{ count: number }[]>({ count: "*" });
  return Number(count);
}
