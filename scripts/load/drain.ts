import autocannon from "autocannon";
import type { Recorder } from "./recorder";

// autocannon with a clean end. Stopped at its duration, autocannon drops every
// connection with a request in flight; the server may still commit such a
// submission, and the client never learns of it. Here the clock only starts
// the drain: from then on each connection is closed as soon as its current
// request is answered (or times out), so every request the server got has a
// known outcome, and `duration` is merely an upper bound for the drain.

/** The parts of autocannon's per-connection client used here (its typings omit them). */
interface RawClient {
  on(event: "timeout", listener: () => void): unknown;
  destroy(): void;
}

export interface CannonOutcome {
  result: autocannon.Result;
  /** From start to the end of the drain. */
  seconds: number;
  drainSeconds: number;
}

/** Shared with the request hooks: a request built while draining is never written (its connection is closed first). */
export interface LoadPhase {
  draining: boolean;
}

export interface DrainedRun {
  phase: LoadPhase;
  options: autocannon.Options;
  loadSeconds: number;
  maxDrainSeconds: number;
  recorder: Recorder;
  /** The kind of the answer autocannon reports next (set by the request's onResponse, which runs just before). */
  lastKind: () => string;
  group: string;
}

export function runDrained({ phase, options, loadSeconds, maxDrainSeconds, recorder, lastKind, group }: DrainedRun): Promise<CannonOutcome> {
  const started = Date.now();
  let drainStarted = 0;
  return new Promise((resolve, reject) => {
    const instance = autocannon(
      {
        ...options,
        duration: loadSeconds + maxDrainSeconds,
        setupClient(client) {
          const raw = client as unknown as RawClient;
          raw.on("timeout", () => {
            if (phase.draining) raw.destroy();
          });
        },
      },
      (error, result) => {
        clearTimeout(timer);
        if (error) return reject(error instanceof Error ? error : new Error(String(error)));
        const ended = Date.now();
        resolve({ result, seconds: (ended - started) / 1000, drainSeconds: drainStarted ? (ended - drainStarted) / 1000 : 0 });
      },
    );
    instance.on("response", (client, statusCode, resBytes, responseTime) => {
      recorder.recordAnswer(lastKind(), statusCode, responseTime, resBytes);
      if (phase.draining) (client as unknown as RawClient).destroy();
    });
    instance.on("reqError", (error: unknown) => {
      const message = error instanceof Error ? error.message : String(error);
      if (/timed out/.test(message)) recorder.timeouts++;
      else recorder.connectionErrors++;
      recorder.recordMessage(group, message);
    });
    const timer = setTimeout(() => {
      phase.draining = true;
      drainStarted = Date.now();
    }, loadSeconds * 1000);
  });
}
