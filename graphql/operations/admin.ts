import { gql, type TypedDocumentNode } from "@apollo/client";
import type { Role } from "@/lib/validation/users";

// Client documents of the administration screen.

export type AccountStatus = "active" | "invited" | "deactivated";

export interface UserAccount {
  id: string;
  name: string;
  email: string;
  role: Role;
  status: AccountStatus;
  createdAt: string;
  deactivatedAt: string | null;
  inviteExpiresAt: string | null;
  hasPassword: boolean;
}

export interface CiToken {
  id: string;
  name: string;
  createdAt: string;
  createdBy: string | null;
  expiresAt: string | null;
  lastUsedAt: string | null;
  revokedAt: string | null;
  status: "usable" | "expired" | "revoked";
}

export interface AccountChange {
  id: string;
  at: string;
  actor: string;
  action: string;
  entity: string;
  entityId: string | null;
  details: Record<string, unknown>;
}

export interface PasswordLink {
  url: string;
  expiresAt: string;
  mailedTo: string;
  account: UserAccount;
}

const ACCOUNT_FIELDS = "id name email role status createdAt deactivatedAt inviteExpiresAt hasPassword";
const TOKEN_FIELDS = "id name createdAt createdBy expiresAt lastUsedAt revokedAt status";
const LINK_FIELDS = `url expiresAt mailedTo account { ${ACCOUNT_FIELDS} }`;

export const USER_ACCOUNTS: TypedDocumentNode<{ userAccounts: UserAccount[] }> = gql`
  query UserAccounts { userAccounts { ${ACCOUNT_FIELDS} } }
`;

export const CI_TOKENS: TypedDocumentNode<{ ciTokens: CiToken[] }> = gql`
  query CiTokens { ciTokens { ${TOKEN_FIELDS} } }
`;

export const ACCOUNT_CHANGES: TypedDocumentNode<{ accountChanges: AccountChange[] }, { last?: number }> = gql`
  query AccountChanges($last: Int) { accountChanges(last: $last) { id at actor action entity entityId details } }
`;

export const CREATE_USER: TypedDocumentNode<{ createUser: UserAccount }, { input: { name: string; email: string; role: Role; password: string } }> = gql`
  mutation CreateUser($input: NewUserInput!) { createUser(input: $input) { ${ACCOUNT_FIELDS} } }
`;

export const INVITE_USER: TypedDocumentNode<{ inviteUser: PasswordLink }, { input: { name: string; email: string; role: Role } }> = gql`
  mutation InviteUser($input: InviteInput!) { inviteUser(input: $input) { ${LINK_FIELDS} } }
`;

export const ISSUE_PASSWORD_LINK: TypedDocumentNode<{ issuePasswordLink: PasswordLink }, { userId: string }> = gql`
  mutation IssuePasswordLink($userId: ID!) { issuePasswordLink(userId: $userId) { ${LINK_FIELDS} } }
`;

export const SET_USER_ROLE: TypedDocumentNode<{ setUserRole: UserAccount }, { userId: string; role: Role }> = gql`
  mutation SetUserRole($userId: ID!, $role: PersonRole!) { setUserRole(userId: $userId, role: $role) { ${ACCOUNT_FIELDS} } }
`;

export const DEACTIVATE_USER: TypedDocumentNode<{ deactivateUser: UserAccount }, { userId: string }> = gql`
  mutation DeactivateUser($userId: ID!) { deactivateUser(userId: $userId) { ${ACCOUNT_FIELDS} } }
`;

export const REACTIVATE_USER: TypedDocumentNode<{ reactivateUser: UserAccount }, { userId: string }> = gql`
  mutation ReactivateUser($userId: ID!) { reactivateUser(userId: $userId) { ${ACCOUNT_FIELDS} } }
`;

export const CREATE_CI_TOKEN: TypedDocumentNode<{ createCiToken: { secret: string; token: CiToken } }, { input: { name: string; expiresAt: string | null } }> = gql`
  mutation CreateCiToken($input: CiTokenInput!) { createCiToken(input: $input) { secret token { ${TOKEN_FIELDS} } } }
`;

export const REVOKE_CI_TOKEN: TypedDocumentNode<{ revokeCiToken: CiToken }, { id: string }> = gql`
  mutation RevokeCiToken($id: ID!) { revokeCiToken(id: $id) { ${TOKEN_FIELDS} } }
`;
