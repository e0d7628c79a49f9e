"use client";

import { useMutation } from "@apollo/client/react";
import { useState } from "react";
import { EmptyState } from "@/components/ui/states";
import { MY_ALERTS, REMOVE_ALERT_SUBSCRIPTION, SAVE_ALERT_SUBSCRIPTION, type AlertSubscriptionRecord } from "@/graphql/operations/alerts";
import { inputClass, quietButton } from "./form-styles";
import { serverMessage } from "./server-message";

const day = new Intl.DateTimeFormat("en-GB", { dateStyle: "medium", timeZone: "UTC" });

/** The person's scopes, each with its delivery (changeable in place) and a remove button. */
export function SubscriptionList({ subscriptions }: { subscriptions: AlertSubscriptionRecord[] }) {
  const refetch = { refetchQueries: [MY_ALERTS], awaitRefetchQueries: true };
  const [save, saving] = useMutation(SAVE_ALERT_SUBSCRIPTION, refetch);
  const [remove, removing] = useMutation(REMOVE_ALERT_SUBSCRIPTION, refetch);
  const [problem, setProblem] = useState<string | null>(null);
  const busy = saving.loading || removing.loading;

  async function run(action: () => Promise<unknown>) {
    setProblem(null);
    try {
      await action();
    } catch (error) {
      setProblem(serverMessage(error).message);
    }
  }

  if (subscriptions.length === 0) {
    return <EmptyState title="No subscriptions yet">Add a case and branch below to hear when a build leaves a band or drifts there.</EmptyState>;
  }
  return (
    <>
      <table className="w-full text-sm">
        <thead>
          <tr className="border-b border-ink/10 text-left text-xs text-ink-faint dark:border-white/10">
            <th className="py-1.5 pr-3 font-medium">Case</th>
            <th className="py-1.5 pr-3 font-medium">Branch</th>
            <th className="py-1.5 pr-3 font-medium">Delivery</th>
            <th className="py-1.5 pr-3 font-medium">Since</th>
            <th className="py-1.5 font-medium" aria-label="Actions" />
          </tr>
        </thead>
        <tbody>
          {subscriptions.map((s) => (
            <tr key={s.id} className="border-b border-ink/5 last:border-0 dark:border-white/5" data-subscription={`${s.caseKey ?? "*"}@${s.branch ?? "*"}`}>
              <td className="py-1.5 pr-3">{s.caseKey ? <span>{s.caseTitle ?? s.caseKey} <span className="font-mono text-xs text-ink-faint">{s.caseKey}</span></span> : <em>every case</em>}</td>
              <td className="py-1.5 pr-3">{s.branch ? <span className="font-mono">{s.branch}</span> : <em>every branch</em>}</td>
              <td className="py-1.5 pr-3">
                <select
                  aria-label={`Delivery for ${s.caseKey ?? "every case"} on ${s.branch ?? "every branch"}`}
                  className={inputClass}
                  value={s.mode}
                  disabled={busy}
                  onChange={(e) => run(() => save({ variables: { input: { caseKey: s.caseKey, branch: s.branch, mode: e.target.value as AlertSubscriptionRecord["mode"] } } }))}
                >
                  <option value="immediate">at once</option>
                  <option value="digest">hourly digest</option>
                </select>
              </td>
              <td className="py-1.5 pr-3 text-ink-soft dark:text-white/60">{day.format(new Date(s.createdAt))}</td>
              <td className="py-1.5 text-right">
                <button type="button" className={quietButton} disabled={busy} onClick={() => run(() => remove({ variables: { id: s.id } }))}>
                  Remove
                </button>
              </td>
            </tr>
          ))}
        </tbody>
      </table>
      {problem && (
        <p role="alert" className="mt-2 text-sm text-verdict-outside">
          {problem}
        </p>
      )}
    </>
  );
}
