export const alertsTypeDefs = /* GraphQL */ `
  "At once (one mail per alert) or collected into the hourly digest."
  enum AlertMode {
    immediate
    digest
  }

  "A person's own alert scope: a case or every case (null), a branch or every branch (null)."
  type AlertSubscription {
    id: ID!
    caseKey: String
    caseTitle: String
    branch: String
    mode: AlertMode!
    createdAt: DateTime!
  }

  type MyAlerts {
    "Release managers receive every alert at once, whatever they subscribe to."
    releaseManager: Boolean!
    subscriptions: [AlertSubscription!]!
  }

  input AlertSubscriptionInput {
    "Empty or null for every case."
    caseKey: String
    "Empty or null for every branch."
    branch: String
    mode: AlertMode!
  }

  "A message the local SMTP fake stored in MAIL_DIR."
  type StoredMail {
    name: ID!
    date: DateTime
    storedAt: DateTime!
    from: String!
    to: [String!]!
    "Every envelope recipient, Bcc included (the fake records them)."
    envelopeTo: [String!]!
    subject: String!
    size: Int!
  }

  type StoredMailPage {
    directory: String!
    total: Int!
    entries: [StoredMail!]!
  }

  type StoredMailMessage {
    name: ID!
    date: DateTime
    from: String!
    to: [String!]!
    cc: [String!]!
    envelopeTo: [String!]!
    subject: String!
    eventKey: String
    text: String
    "The HTML part as received; clients must show it only in a sandboxed frame."
    html: String
  }

  enum OutboxStatus {
    queued
    sending
    sent
    failed
  }

  "A message Tauline owes someone, and how its delivery went."
  type OutboxMessage {
    id: ID!
    eventKey: String!
    kind: String!
    recipients: [String!]!
    bcc: [String!]!
    subject: String!
    status: OutboxStatus!
    attempts: Int!
    lastError: String
    createdAt: DateTime!
    nextAttemptAt: DateTime!
    sentAt: DateTime
    buildId: ID
  }

  extend type Query {
    "The caller's own alert subscriptions."
    myAlerts: MyAlerts!
    "Administrator: messages in MAIL_DIR, newest first."
    storedMail(first: Int = 50, offset: Int = 0): StoredMailPage!
    "Administrator: one stored message."
    storedMailMessage(name: ID!): StoredMailMessage!
    "Administrator: the newest outbox rows (unsentOnly: queued, sending, failed)."
    mailOutbox(first: Int = 30, unsentOnly: Boolean = false): [OutboxMessage!]!
  }

  extend type Mutation {
    "Adds one of the caller's subscriptions, or changes the mode of the one with the same case and branch."
    saveAlertSubscription(input: AlertSubscriptionInput!): AlertSubscription!
    "Removes one of the caller's own subscriptions; returns its id."
    removeAlertSubscription(id: ID!): ID!
  }
`;
