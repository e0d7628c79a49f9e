// What the load clients saw, per kind of request: every answer's latency and
// status, and every error (non-2xx, timeout, GraphQL error inside a 200).

export interface KindRecord {
  kind: string;
  latenciesMs: number[];
  statuses: Map<number, number>;
  bytes: number;
  /** GraphQL errors inside 2xx answers, and 2xx answers lacking the data asked for. */
  bodyErrors: number;
  /** First words of each distinct error message, with how often it came. */
  messages: Map<string, number>;
}

export interface Recorder {
  kinds: Map<string, KindRecord>;
  timeouts: number;
  connectionErrors: number;
  recordAnswer(kind: string, status: number, latencyMs: number, bytes: number): void;
  recordBodyError(kind: string, message: string): void;
  recordMessage(kind: string, message: string): void;
}

export function createRecorder(): Recorder {
  const kinds = new Map<string, KindRecord>();
  const kindRecord = (kind: string): KindRecord => {
    let r = kinds.get(kind);
    if (!r) {
      r = { kind, latenciesMs: [], statuses: new Map(), bytes: 0, bodyErrors: 0, messages: new Map() };
      kinds.set(kind, r);
    }
    return r;
  };
  const recorder: Recorder = {
    kinds,
    timeouts: 0,
    connectionErrors: 0,
    recordAnswer(kind, status, latencyMs, bytes) {
      const r = kindRecord(kind);
      r.latenciesMs.push(latencyMs);
      r.statuses.set(status, (r.statuses.get(status) ?? 0) + 1);
      r.bytes += bytes;
    },
    recordBodyError(kind, message) {
      kindRecord(kind).bodyErrors++;
      recorder.recordMessage(kind, message);
    },
    recordMessage(kind, message) {
      const r = kindRecord(kind);
      const key = message.replace(/\s+/g, " ").slice(0, 160);
      r.messages.set(key, (r.messages.get(key) ?? 0) + 1);
    },
  };
  return recorder;
}

/** The first error message of a GraphQL answer, or null when it has none. */
export function readGraphQLError(body: string): string | null {
  let parsed: { errors?: { message?: string; extensions?: { code?: string } }[] };
  try {
    parsed = JSON.parse(body) as typeof parsed;
  } catch {
    return `answer is not JSON: ${body.slice(0, 80)}`;
  }
  const first = parsed.errors?.[0];
  if (!first) return null;
  return `${first.extensions?.code ?? "ERROR"}: ${first.message ?? "(no message)"}`;
}
