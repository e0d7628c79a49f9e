import type autocannon from "autocannon";
import { print, type DocumentNode } from "graphql";
import { BUILD_MATRIX, BUILD_TABLE } from "@/graphql/operations/builds";
import { MORNING_BAND_EXITS, MORNING_BRANCHES, MORNING_CANDIDATES, MORNING_OPEN_DRIFTS } from "@/graphql/operations/overview";
import { TREND_CHART, TREND_PICKERS } from "@/graphql/operations/trends";
import { readGraphQLError, type Recorder } from "./recorder";

// The dashboard side of the load: signed-in people reading what the screens
// read, with the browser's own documents (graphql/operations), in turn: the
// builds table, one build's verdict matrix, a trend chart, a morning-view
// widget, and the server-rendered /builds page.

export interface ReaderTargets {
  buildIds: string[];
  trends: { case: string; quantity: string; models: string[] }[];
}

const OVERVIEW_WIDGETS: DocumentNode[] = [MORNING_BRANCHES, MORNING_BAND_EXITS, MORNING_OPEN_DRIFTS, MORNING_CANDIDATES];
const pickOne = <T>(items: T[]): T => items[Math.floor(Math.random() * items.length)];
const body = (doc: DocumentNode, variables: Record<string, unknown>) => JSON.stringify({ query: print(doc), variables });

/** Build ids of the demo history and every banded (case, quantity) on main, read once before the load. */
export async function readReaderTargets(url: string, cookie: string): Promise<ReaderTargets> {
  const table = await postJson<{ buildTable: { items: { id: string }[] } }>(url, cookie, body(BUILD_TABLE, { filter: { branch: "main" }, sort: { column: "received", direction: "desc" }, first: 100, offset: 0 }));
  const pickers = await postJson<{ cases: { key: string; models: string[]; bands: { quantity: string }[] }[] }>(url, cookie, body(TREND_PICKERS, {}));
  const trends = pickers.cases.flatMap((c) => [...new Set(c.bands.map((b) => b.quantity))].map((quantity) => ({ case: c.key, quantity, models: c.models })));
  const buildIds = table.buildTable.items.map((b) => b.id);
  if (buildIds.length === 0 || trends.length === 0) throw new Error("the database holds no builds or bands on main: was the demo seeded?");
  return { buildIds, trends };
}

async function postJson<T>(url: string, cookie: string, text: string): Promise<T> {
  const res = await fetch(`${url}/api/graphql`, { method: "POST", headers: { "content-type": "application/json", cookie }, body: text });
  const answer = await res.text();
  const error = readGraphQLError(answer);
  if (!res.ok || error) throw new Error(`reading the reader targets failed (${res.status}): ${error ?? answer.slice(0, 200)}`);
  return (JSON.parse(answer) as { data: T }).data;
}

export function createReaderOptions({ url, cookie, targets, connections, timeoutSeconds, recorder }: {
  url: string;
  cookie: string;
  targets: ReaderTargets;
  connections: number;
  timeoutSeconds: number;
  recorder: Recorder;
}): { options: autocannon.Options; lastKind: () => string } {
  let lastKind = "";
  const headers = { "content-type": "application/json", accept: "application/graphql-response+json, application/json", cookie };
  const graphql = (kind: string, nextBody: () => string, expect: (data: Record<string, unknown>) => boolean): autocannon.Request => ({
    method: "POST",
    path: "/api/graphql",
    headers,
    setupRequest: (req) => ({ ...req, body: nextBody() }),
    onResponse(status, text) {
      lastKind = kind;
      if (status < 200 || status >= 300) return recorder.recordMessage(kind, `${status} ${readGraphQLError(text) ?? text.slice(0, 120)}`);
      const error = readGraphQLError(text);
      if (error) return recorder.recordBodyError(kind, error);
      const data = (JSON.parse(text) as { data?: Record<string, unknown> | null }).data;
      if (!data || !expect(data)) recorder.recordBodyError(kind, "200 answer without the data asked for");
    },
  });
  const requests: autocannon.Request[] = [
    graphql("builds-list", () => body(BUILD_TABLE, { filter: {}, sort: { column: "received", direction: "desc" }, first: 25, offset: 0 }), (d) => Boolean(d.buildTable)),
    graphql("build", () => body(BUILD_MATRIX, { id: pickOne(targets.buildIds) }), (d) => Boolean(d.build)),
    graphql("trend", () => {
      const t = pickOne(targets.trends);
      return body(TREND_CHART, { case: t.case, quantity: t.quantity, models: t.models, branch: "main", grid: "default", last: 50 });
    }, (d) => Boolean(d.trendChart)),
    graphql("overview", () => {
      const widget = pickOne(OVERVIEW_WIDGETS);
      return body(widget, widget === MORNING_BRANCHES ? { perBranch: 5 } : {});
    }, (d) => Boolean(d.morningView)),
    {
      method: "GET",
      path: "/builds",
      headers: { cookie, accept: "text/html" },
      onResponse(status, text) {
        lastKind = "page /builds";
        // A redirect to the sign-in page is a failure too: the session must hold.
        if (status !== 200) recorder.recordMessage("page /builds", `${status} ${text.slice(0, 80)}`);
      },
    },
  ];
  return {
    lastKind: () => lastKind,
    options: { url, connections, timeout: timeoutSeconds, pipelining: 1, requests },
  };
}
