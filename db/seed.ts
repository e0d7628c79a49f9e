import { getDb } from "./index";
import { runDbScript } from "./run-script";
import { getEnv } from "../lib/env";
import { seedLibrary } from "./seeds/library";
import { seedPeople } from "./seeds/people";
import { demoHistoryStart, seedDemoHistory } from "./seeds/demo-history";

// Seeds what is missing: the case library, the demo users and CI token, the demo
// history. Safe to run again: each part checks before it writes.
async function main() {
  const env = getEnv();
  const db = getDb();
  const now = new Date();
  const library = await seedLibrary({ db, validFrom: demoHistoryStart(now) });
  console.log(library ? "seed: case library inserted" : "seed: case library already present");
  const people = await seedPeople({ db, password: env.TAULINE_DEMO_PASSWORD, ciToken: env.TAULINE_CI_TOKEN });
  console.log(`seed: demo users ${people.usersCreated ? "created" : "already present"}; CI token ${people.tokenCreated ? "stored" : "already stored"}`);
  const started = Date.now();
  const builds = await seedDemoHistory({ db, now });
  console.log(builds ? `seed: demo history of ${builds} builds posted in ${((Date.now() - started) / 1000).toFixed(1)} s` : "seed: demo history already present");
}

runDbScript(main);
