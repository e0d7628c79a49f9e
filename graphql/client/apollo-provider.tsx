"use client";

import { HttpLink } from "@apollo/client";
import { ApolloClient, ApolloNextAppProvider, InMemoryCache } from "@apollo/client-integration-nextjs";
import type { ReactNode } from "react";

// The browser talks to /api/graphql with its session cookie. Build ids and run
// ids identify records; value-like types (quantities, series) have no id and are
// stored under their parent.
function makeClient() {
  return new ApolloClient({
    cache: new InMemoryCache({
      typePolicies: {
        QuantityValue: { keyFields: false },
        Series: { keyFields: false },
        StressSample: { keyFields: false },
        GridStudy: { keyFields: false },
        TrendPoint: { keyFields: false },
        VerdictCounts: { keyFields: false },
      },
    }),
    link: new HttpLink({
      uri: typeof window === "undefined" ? `${process.env.APP_URL ?? "http://127.0.0.1:3000"}/api/graphql` : "/api/graphql",
      credentials: "same-origin",
    }),
  });
}

/** `nonce`: the page's CSP nonce (proxy.ts), stamped on the scripts that carry server-rendered query data to the browser. */
export function ApolloProvider({ children, nonce }: { children: ReactNode; nonce?: string }) {
  return (
    <ApolloNextAppProvider makeClient={makeClient} extraScriptProps={nonce ? { nonce } : undefined}>
      {children}
    </ApolloNextAppProvider>
  );
}
