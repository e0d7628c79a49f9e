import { gql, type TypedDocumentNode } from "@apollo/client";

// Client documents of "My alerts" and the administrator's mailbox.

export type AlertMode = "immediate" | "digest";

export interface AlertSubscriptionRecord {
  id: string;
  caseKey: string | null;
  caseTitle: string | null;
  branch: string | null;
  mode: AlertMode;
  createdAt: string;
}

export const MY_ALERTS: TypedDocumentNode<{
  myAlerts: { releaseManager: boolean; subscriptions: AlertSubscriptionRecord[] };
  cases: { key: string; title: string }[];
  branches: string[];
}> = gql`
  query MyAlerts {
    myAlerts {
      releaseManager
      subscriptions { id caseKey caseTitle branch mode createdAt }
    }
    cases { key title }
    branches
  }
`;

export const SAVE_ALERT_SUBSCRIPTION: TypedDocumentNode<
  { saveAlertSubscription: AlertSubscriptionRecord },
  { input: { caseKey: string | null; branch: string | null; mode: AlertMode } }
> = gql`
  mutation SaveAlertSubscription($input: AlertSubscriptionInput!) {
    saveAlertSubscription(input: $input) { id caseKey caseTitle branch mode createdAt }
  }
`;

export const REMOVE_ALERT_SUBSCRIPTION: TypedDocumentNode<{ removeAlertSubscription: string }, { id: string }> = gql`
  mutation RemoveAlertSubscription($id: ID!) {
    removeAlertSubscription(id: $id)
  }
`;

export interface StoredMailEntry {
  name: string;
  date: string | null;
  storedAt: string;
  from: string;
  to: string[];
  envelopeTo: string[];
  subject: string;
  size: number;
}

export interface OutboxEntry {
  id: string;
  eventKey: string;
  kind: string;
  recipients: string[];
  bcc: string[];
  subject: string;
  status: "queued" | "sending" | "sent" | "failed";
  attempts: number;
  lastError: string | null;
  createdAt: string;
  nextAttemptAt: string;
  sentAt: string | null;
  buildId: string | null;
}

export const MAILBOX: TypedDocumentNode<
  { storedMail: { directory: string; total: number; entries: StoredMailEntry[] }; mailOutbox: OutboxEntry[] },
  { first: number; offset: number }
> = gql`
  query Mailbox($first: Int!, $offset: Int!) {
    storedMail(first: $first, offset: $offset) {
      directory
      total
      entries { name date storedAt from to envelopeTo subject size }
    }
    mailOutbox(first: 20, unsentOnly: true) {
      id eventKey kind recipients bcc subject status attempts lastError createdAt nextAttemptAt sentAt buildId
    }
  }
`;

export interface StoredMailMessage {
  name: string;
  date: string | null;
  from: string;
  to: string[];
  cc: string[];
  envelopeTo: string[];
  subject: string;
  eventKey: string | null;
  text: string | null;
  html: string | null;
}

export const MAILBOX_MESSAGE: TypedDocumentNode<{ storedMailMessage: StoredMailMessage }, { name: string }> = gql`
  query MailboxMessage($name: ID!) {
    storedMailMessage(name: $name) { name date from to cc envelopeTo subject eventKey text html }
  }
`;
