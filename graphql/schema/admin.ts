// People, roles and CI tokens (administrator only), and the set-password link
// an invited person opens (no session: the link is the proof).
export const adminTypeDefs = /* GraphQL */ `
  enum PersonRole {
    developer
    qa
    release
    admin
  }

  "active: can sign in; invited: waits for its set-password link; deactivated: switched off by an administrator."
  enum AccountStatus {
    active
    invited
    deactivated
  }

  type UserAccount {
    id: ID!
    name: String!
    email: String!
    role: PersonRole!
    status: AccountStatus!
    createdAt: DateTime!
    deactivatedAt: DateTime
    "Expiry of the open set-password link, if there is one."
    inviteExpiresAt: DateTime
    "False for someone invited who never set a password."
    hasPassword: Boolean!
  }

  "A set-password link: the URL is returned once and only its hash is stored."
  type PasswordLink {
    account: UserAccount!
    url: String!
    expiresAt: DateTime!
    "The account's address, to which the link was also mailed (through the outbox)."
    mailedTo: String!
  }

  enum CiTokenStatus {
    usable
    expired
    revoked
  }

  type CiToken {
    id: ID!
    name: String!
    createdAt: DateTime!
    "Name of the administrator who made it (null for the seeded demo token)."
    createdBy: String
    expiresAt: DateTime
    lastUsedAt: DateTime
    revokedAt: DateTime
    status: CiTokenStatus!
  }

  "A new CI token with its secret, which is shown this once and never again."
  type NewCiToken {
    token: CiToken!
    secret: String!
  }

  "An entry of the audit log about a person or a CI token."
  type AccountChange {
    id: ID!
    at: DateTime!
    actor: String!
    action: String!
    entity: String!
    entityId: String
    details: JSON!
  }

  input NewUserInput {
    name: String!
    email: String!
    role: PersonRole!
    "Initial password (10 characters to 72 bytes); stored as a bcrypt hash, never returned."
    password: String!
  }

  input InviteInput {
    name: String!
    email: String!
    role: PersonRole!
  }

  input CiTokenInput {
    name: String!
    "Null for a token that does not expire."
    expiresAt: DateTime
  }

  input SetPasswordInput {
    "The secret at the end of the set-password link."
    token: String!
    password: String!
  }

  type PasswordSet {
    email: String!
  }

  extend type Query {
    "Administrator: every account with its role and status."
    userAccounts: [UserAccount!]!
    "Administrator: every CI token (never its secret)."
    ciTokens: [CiToken!]!
    "Administrator: the newest audit entries about people and CI tokens."
    accountChanges(last: Int = 25): [AccountChange!]!
  }

  extend type Mutation {
    "Administrator: an account that can sign in at once with the given password."
    createUser(input: NewUserInput!): UserAccount!
    "Administrator: an account that waits until its owner sets a password through the returned link."
    inviteUser(input: InviteInput!): PasswordLink!
    "Administrator: a new set-password link (voids older ones) for an invited or active person."
    issuePasswordLink(userId: ID!): PasswordLink!
    setUserRole(userId: ID!, role: PersonRole!): UserAccount!
    deactivateUser(userId: ID!): UserAccount!
    reactivateUser(userId: ID!): UserAccount!
    createCiToken(input: CiTokenInput!): NewCiToken!
    revokeCiToken(id: ID!): CiToken!
    "Anyone holding a set-password link: sets the password and switches the account on."
    setPasswordWithLink(input: SetPasswordInput!): PasswordSet!
  }
`;
