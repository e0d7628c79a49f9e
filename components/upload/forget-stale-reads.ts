import type { ApolloClient } from "@apollo/client";

/**
 * The upload went out over XMLHttpRequest, past Apollo, so every cached read of
 * builds, runs, trends and the gate may now be stale. Drop them all (the case
 * library the form uses is unchanged by an upload) so the next screen refetches.
 */
export function forgetStaleReads(client: ApolloClient) {
  client.cache.modify({
    id: "ROOT_QUERY",
    fields: (value, { fieldName, DELETE }) => (fieldName === "cases" || fieldName === "__typename" ? value : DELETE),
  });
  client.cache.gc();
}
