"use client";

import { useQuery } from "@apollo/client/react";
import { Panel } from "@/components/ui/panel";
import { ErrorNotice, LoadingBlock } from "@/components/ui/states";
import { MY_ALERTS } from "@/graphql/operations/alerts";
import { SubscriptionForm } from "./subscription-form";
import { SubscriptionList } from "./subscription-list";

/** "My alerts": what reaches this person by mail, and the form to change it. */
export function AlertSettings() {
  const { data, loading, error } = useQuery(MY_ALERTS);
  if (loading && !data) return <LoadingBlock label="Loading your alerts" rows={5} />;
  if (error && !data) return <ErrorNotice title="Could not load your alerts" error={error} />;
  if (!data) return null;
  const { releaseManager, subscriptions } = data.myAlerts;
  return (
    <div className="space-y-5">
      <Panel title="What reaches you">
        <ul className="list-disc space-y-1 pl-5 text-sm text-ink-soft dark:text-white/70">
          <li>
            An alert is one e-mail per build event: a quantity left its tolerance band, a run diverged, crashed or timed out, or a value drifts against the
            baseline or along the last builds. It names the build, branch, values, limits and units, and links to each run.
          </li>
          <li>
            {releaseManager ? (
              <strong className="text-ink dark:text-white">As release manager you receive every alert at once, on every case and branch.</strong>
            ) : (
              "Release managers receive every alert at once. Everyone else, administrators included, hears only of the cases and branches subscribed here."
            )}{" "}
            A re-post of a build that changes none of its findings sends nothing new.
          </li>
          <li>“At once” mails each alert as it happens; “hourly digest” collects them into one mail on the hour.</li>
        </ul>
      </Panel>
      <Panel title="Your subscriptions" subtitle={`${subscriptions.length} in force`}>
        <SubscriptionList subscriptions={subscriptions} />
      </Panel>
      <Panel title="Add a subscription" subtitle="the same case and branch again changes its delivery">
        <SubscriptionForm cases={data.cases} branches={data.branches} />
      </Panel>
    </div>
  );
}
